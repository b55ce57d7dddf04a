import { useState } from 'react';
import type { PlanView } from '@shared/views/plan';
import { CandidateTable } from './candidate-table';
import { MakeRecipesPanel } from './make-recipes-panel';

/** The ranked list with its choice boxes and, for roles that may plan, the one-step recipes-and-shortlist panel. */
export function PlanCandidates({ plan, canMake }: { plan: PlanView; canMake: boolean }) {
  const [chosen, setChosen] = useState<Set<number>>(new Set());
  const toggle = (index: number) =>
    setChosen((previous) => {
      const next = new Set(previous);
      if (next.has(index)) next.delete(index);
      else next.add(index);
      return next;
    });
  return (
    <div className="flex flex-col gap-4">
      <CandidateTable plan={plan} chosen={chosen} onToggle={toggle} canChoose={canMake} />
      {canMake && <MakeRecipesPanel plan={plan} chosen={[...chosen].sort((a, b) => a - b)} onDone={() => setChosen(new Set())} />}
    </div>
  );
}
