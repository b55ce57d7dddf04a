import { useState } from 'react';
import { Link } from 'react-router-dom';
import { STATE_LABELS } from '@shared/states';
import { formatNumber } from '@/lib/format';
import { SymbolText } from '@/components/ui/symbol-text';
import type { MapPoint } from '../geometry/types';

const LIMIT = 500;

/**
 * The points of the map as a table, for screen readers and for anyone who wants the numbers:
 * the canvas that draws them cannot be read aloud.
 */
export function PointsTable({ points, yLabel, displayY }: { points: MapPoint[]; yLabel: string; displayY: (y: number) => number }) {
  // Rows are only rendered while the list is open: the map redraws far more often than anyone reads it.
  const [open, setOpen] = useState(false);
  return (
    <details className="rounded-card border border-line bg-panel px-4 py-3 text-sm" onToggle={(event) => setOpen((event.target as HTMLDetailsElement).open)}>
      <summary className="cursor-pointer font-medium">List the {points.length} point{points.length === 1 ? '' : 's'} on this map</summary>
      {open && (
      <div className="mt-3 max-h-96 overflow-auto">
        <table className="w-full border-collapse">
          <caption className="sr-only">Points on the state map</caption>
          <thead>
            <tr className="border-b border-line text-left text-xs uppercase tracking-wide text-ink-soft">
              <th scope="col" className="py-1 pr-3">Code</th>
              <th scope="col" className="py-1 pr-3">Kind</th>
              <th scope="col" className="py-1 pr-3 text-right">φ</th>
              <th scope="col" className="py-1 pr-3 text-right"><SymbolText text={yLabel} /></th>
              <th scope="col" className="py-1 pr-3">State</th>
              <th scope="col" className="py-1 pr-3">Predicted</th>
              <th scope="col" className="py-1">Day</th>
            </tr>
          </thead>
          <tbody>
            {points.slice(0, LIMIT).map((p) => (
              <tr key={p.key} className="border-b border-line/60" data-point={p.key}>
                <td className="py-1 pr-3">{p.code ? <Link to={`/recipes/${p.code}`}>{p.code}</Link> : 'ad-hoc'}</td>
                <td className="py-1 pr-3">{p.kind}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(p.x, 3)}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(displayY(p.y), 3)}</td>
                <td className="py-1 pr-3">{p.kind === 'recipe' ? '—' : STATE_LABELS[p.state]}</td>
                <td className="py-1 pr-3">{p.predicted ? STATE_LABELS[p.predicted] : '—'}{p.agrees === false ? ' (differs)' : ''}</td>
                <td className="py-1">{p.ageDays ?? ''}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {points.length > LIMIT && <p className="mt-2 text-xs text-ink-soft">The first {LIMIT} are listed; export the points as CSV for all of them.</p>}
      </div>
      )}
    </details>
  );
}
