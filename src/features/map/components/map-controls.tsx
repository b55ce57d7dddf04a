import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import type { AxisChoice, MapView } from '../geometry/map-view';

const AXIS_LABELS: Record<AxisChoice, string> = {
  polymerReservoir: 'Polymer in reservoir (free volume)',
  b2: 'Reduced B2*',
  inverseTau: 'Baxter 1/τ',
  squareWellDepth: 'Square-well U/kT at range λ',
};

/** The choices that decide what the map shows; the view lives in the URL. */
/** `onChange` receives only what changed; the route applies it to the latest view in the URL. */
export function MapControls({ view, onChange, depletion }: { view: MapView; onChange: (change: Partial<MapView>) => void; depletion: boolean }) {
  const axes: AxisChoice[] = depletion ? ['polymerReservoir', 'b2', 'inverseTau', 'squareWellDepth'] : ['b2', 'inverseTau', 'squareWellDepth'];
  const generic = view.axis !== 'polymerReservoir' || !depletion;
  return (
    <div className="flex flex-wrap items-end gap-3">
      <Field label="Attraction axis" className="w-64">
        {(p) => (
          <SelectInput {...p} value={view.axis} onChange={(e) => onChange({ axis: e.target.value as AxisChoice, zoom: null })}>
            {axes.map((a) => (
              <option key={a} value={a}>
                {AXIS_LABELS[a]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      {generic && (
        <Field label="Fluid–fluid theory" className="w-56">
          {(p) => (
            <SelectInput {...p} value={view.theory} onChange={(e) => onChange({ theory: e.target.value as MapView['theory'] })}>
              <option value="meanField">Mean field (CS + B2*)</option>
              <option value="baxterPY">Sticky spheres (Percus–Yevick)</option>
            </SelectInput>
          )}
        </Field>
      )}
      {view.axis === 'squareWellDepth' && (
        <Field label="Well range λ (1.01–3)" className="w-36">
          {(p) => (
            <TextInput
              {...p}
              type="number"
              step="0.05"
              min={1.01}
              max={3}
              defaultValue={view.lambda}
              onBlur={(e) => {
                const lambda = Number(e.target.value);
                if (Number.isFinite(lambda) && lambda >= 1.01 && lambda <= 3) onChange({ lambda, zoom: null });
              }}
            />
          )}
        </Field>
      )}
      <Field label="Glass line (mode coupling)" className="w-72">
        {(p) => (
          <SelectInput {...p} value={view.glassLine} onChange={(e) => onChange({ glassLine: e.target.value as MapView['glassLine'] })}>
            <option value="rescaled">Rescaled to observed φ_g = 0.58</option>
            <option value="computed">As computed (hard spheres 0.516)</option>
          </SelectInput>
        )}
      </Field>
      <Field label="Observed from day" className="w-32">
        {(p) => <TextInput {...p} type="number" min={0} defaultValue={view.minAge ?? ''} onBlur={(e) => onChange({ minAge: e.target.value === '' ? null : Math.max(0, Number(e.target.value)) })} />}
      </Field>
      <Field label="to day" className="w-28">
        {(p) => <TextInput {...p} type="number" min={0} defaultValue={view.maxAge ?? ''} onBlur={(e) => onChange({ maxAge: e.target.value === '' ? null : Math.max(0, Number(e.target.value)) })} />}
      </Field>
    </div>
  );
}
