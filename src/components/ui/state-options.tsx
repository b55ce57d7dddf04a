import { STATE_LABELS, type ObservedState } from '@shared/states';

/** The <option>s of a select over states, named as everywhere else. */
export function StateOptions({ states }: { states: readonly ObservedState[] }) {
  return (
    <>
      {states.map((state) => (
        <option key={state} value={state}>
          {STATE_LABELS[state]}
        </option>
      ))}
    </>
  );
}
