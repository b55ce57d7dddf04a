import { STATE_LABELS } from '@shared/states';
import { StateGlyph } from '@/components/ui/state-badge';
import { formatNumber } from '@/lib/format';
import { SymbolText } from '@/components/ui/symbol-text';
import type { MapPoint } from '../geometry/types';

/** The card shown next to the point under the pointer. */
export function HoverCard({ point, x, y, width, yLabel, displayY }: { point: MapPoint; x: number; y: number; width: number; yLabel: string; displayY: (y: number) => number }) {
  const left = x > width - 260 ? x - 250 : x + 14;
  return (
    <div role="status" className="pointer-events-none absolute z-20 w-60 rounded-md border border-line bg-panel px-3 py-2 text-xs shadow-card" style={{ left, top: Math.max(0, y - 20) }}>
      <p className="text-sm font-semibold">
        {point.code ?? 'Ad-hoc sample'} <span className="font-normal text-ink-soft">{point.kind === 'recipe' ? 'recipe' : 'observation'}</span>
      </p>
      {point.name && <p className="mb-1 text-ink-soft">{point.name}</p>}
      <p>
        φ {formatNumber(point.x, 3)} · <SymbolText text={yLabel} /> {formatNumber(displayY(point.y), 3)}
      </p>
      {point.predicted && <p>Predicted: {STATE_LABELS[point.predicted]}</p>}
      {point.kind === 'observation' && (
        <p className="flex items-center gap-1">
          Observed: <StateGlyph state={point.state} size={10} /> {STATE_LABELS[point.state]}
          {point.ageDays !== null ? ` at day ${point.ageDays}` : ''}
        </p>
      )}
      {point.agrees === false && <p className="font-semibold text-brick-700">Differs from the prediction</p>}
      <p className="mt-1 text-ink-faint">Click to open</p>
    </div>
  );
}
