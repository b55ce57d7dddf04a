import type { ProgrammeView } from '@shared/views/programme';
import { Field } from '@/components/ui/field';
import { SelectInput } from '@/components/ui/inputs';

/**
 * A labelled select of live programmes. Controlled: give it `useProgrammeParam()`'s
 * `programmes`, `programmeId` and `setProgrammeId`, and the choice lives in the URL.
 */
export function ProgrammePicker({
  programmes,
  value,
  onChange,
  label = 'Programme',
  className = 'w-72',
}: {
  programmes: ProgrammeView[];
  value: number | null;
  onChange: (id: number) => void;
  label?: string;
  className?: string;
}) {
  return (
    <Field label={label} className={className}>
      {(props) => (
        <SelectInput {...props} value={value ?? ''} disabled={programmes.length === 0} onChange={(event) => onChange(Number(event.target.value))}>
          {value === null && <option value="">No programme yet</option>}
          {programmes.map((programme) => (
            <option key={programme.id} value={programme.id}>
              {programme.name} ({programme.codePrefix})
            </option>
          ))}
        </SelectInput>
      )}
    </Field>
  );
}
