import { useEffect, useRef, useState } from 'react';
import { METHOD_LABELS, OBSERVATION_METHODS, OBSERVED_STATES } from '@shared/states';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import type { BenchFilterValues } from '../hooks/use-bench-filters';
import { StateOptions } from '@/components/ui/state-options';

export function BenchFilters({ values, onChange, onClear }: { values: BenchFilterValues; onChange: (patch: Partial<BenchFilterValues>) => void; onClear: () => void }) {
  const any = values.state || values.method || values.disagreeing || values.minAge || values.maxAge;
  return (
    <fieldset className="flex flex-wrap items-end gap-3 rounded-card border border-line bg-panel px-4 py-3">
      <legend className="sr-only">Filter the bench log</legend>
      <Field label="Observed state" className="w-44">
        {(props) => (
          <SelectInput {...props} value={values.state} onChange={(event) => onChange({ state: event.target.value as BenchFilterValues['state'] })}>
            <option value="">Any state</option>
            <StateOptions states={OBSERVED_STATES} />
          </SelectInput>
        )}
      </Field>
      <Field label="Method" className="w-44">
        {(props) => (
          <SelectInput {...props} value={values.method} onChange={(event) => onChange({ method: event.target.value as BenchFilterValues['method'] })}>
            <option value="">Any method</option>
            {OBSERVATION_METHODS.map((method) => (
              <option key={method} value={method}>
                {METHOD_LABELS[method]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <Field label="Age from (days)" className="w-32">
        {(props) => <AgeInput {...props} value={values.minAge} onValue={(minAge) => onChange({ minAge })} />}
      </Field>
      <Field label="Age up to (days)" className="w-32">
        {(props) => <AgeInput {...props} value={values.maxAge} onValue={(maxAge) => onChange({ maxAge })} />}
      </Field>
      <label className="inline-flex items-center gap-2 pb-2 text-sm">
        <input type="checkbox" className="h-4 w-4 accent-fjord-500" checked={values.disagreeing} onChange={(event) => onChange({ disagreeing: event.target.checked })} />
        Only outcomes that disagree with the prediction
      </label>
      {any && (
        <Button variant="quiet" size="sm" className="mb-1.5" onClick={onClear}>
          Clear filters
        </Button>
      )}
    </fieldset>
  );
}

/**
 * A number box whose text lives here while it has focus. The URL it writes to updates inside a
 * router transition, a moment later; reading the box back from the URL while typing would drop keys.
 */
function AgeInput({ value, onValue, ...props }: { value: string; onValue: (text: string) => void; id: string; 'aria-invalid': boolean; 'aria-describedby'?: string }) {
  const [text, setText] = useState(value);
  const focused = useRef(false);
  useEffect(() => {
    if (!focused.current) setText(value);
  }, [value]);
  return (
    <TextInput
      {...props}
      type="number"
      min={0}
      step="any"
      value={text}
      onFocus={() => (focused.current = true)}
      onBlur={() => {
        focused.current = false;
        setText(value);
      }}
      onChange={(event) => {
        setText(event.target.value);
        onValue(event.target.value);
      }}
    />
  );
}
