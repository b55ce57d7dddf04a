import { OBSERVED_STATES, STATE_LABELS } from '@shared/states';
import { StateGlyph } from '@/components/ui/state-badge';
import type { Layer } from '../geometry/map-view';

const LAYER_LABELS: Record<Layer, string> = {
  regions: 'Shaded regions',
  lines: 'Boundaries and markers',
  labels: 'Labels',
  recipes: 'Recipes (outlined)',
  observations: 'Observations (filled)',
  mismatches: 'Ring predicted ≠ observed',
  calibrated: 'Calibrated boundary',
};

/** Layer switches and the key to the state shapes. */
export function MapLegend({ layers, onToggle, available }: { layers: Set<Layer>; onToggle: (layer: Layer) => void; available: Layer[] }) {
  return (
    <div className="flex flex-col gap-4 text-sm">
      <fieldset>
        <legend className="mb-1.5 text-xs font-semibold uppercase tracking-wide text-ink-soft">Show</legend>
        <ul className="flex flex-col gap-1">
          {available.map((layer) => (
            <li key={layer}>
              <label className="flex cursor-pointer items-center gap-2">
                <input type="checkbox" checked={layers.has(layer)} onChange={() => onToggle(layer)} className="h-4 w-4 accent-fjord-500" />
                {LAYER_LABELS[layer]}
              </label>
            </li>
          ))}
        </ul>
      </fieldset>
      <div>
        <p className="mb-1.5 text-xs font-semibold uppercase tracking-wide text-ink-soft">States</p>
        <ul className="grid grid-cols-2 gap-x-3 gap-y-1">
          {OBSERVED_STATES.map((state) => (
            <li key={state} className="flex items-center gap-1.5">
              <StateGlyph state={state} />
              {STATE_LABELS[state]}
            </li>
          ))}
        </ul>
        <p className="mt-2 text-xs text-ink-faint">Outlined shapes are recipes (their predicted state); filled shapes are what the bench observed.</p>
      </div>
    </div>
  );
}
