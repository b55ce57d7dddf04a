import { Link } from 'react-router-dom';
import { StateBadge } from '@/components/ui/state-badge';
import { Table, Td, Th } from '@/components/ui/table';
import { formatNumber } from '@/lib/format';
import type { PlanView } from '@shared/views/plan';
import { costText, doseHeading, evidenceText, shelfLifeText } from '../lib/plan-words';

/**
 * The ranked candidates of a plan: φ, dose, predicted state, margin, cost per litre and the
 * nearest bench evidence; a box to choose each for recipes (when the role may), or the recipe
 * it already became.
 */
export function CandidateTable({ plan, chosen, onToggle, canChoose }: { plan: PlanView; chosen: Set<number>; onToggle: (index: number) => void; canChoose: boolean }) {
  const minimumDays = plan.outcome.shelfLife?.minimumDays ?? null;
  const lastWatched = plan.outcome.shelfLife?.lastTimeDays ?? null;
  return (
    <>
    <Table caption={`Ranked candidates of plan ${plan.id}`}>
      <thead>
        <tr>
          {canChoose && <Th className="w-10"><span className="sr-only">Choose</span></Th>}
          <Th>#</Th>
          <Th>φ</Th>
          <Th>{doseHeading(plan)}</Th>
          <Th>Predicted</Th>
          <Th>Margin</Th>
          <Th>Cost per litre</Th>
          <Th>Nearest bench evidence</Th>
          <Th>Shelf life (predicted)</Th>
          <Th>Recipe</Th>
        </tr>
      </thead>
      <tbody>
        {plan.outcome.candidates.map((c) => (
          <tr key={c.index} data-candidate={c.index}>
            {canChoose && (
              <Td>
                <input type="checkbox" aria-label={`Choose candidate ${c.index + 1}`} disabled={c.recipe !== null} checked={chosen.has(c.index)} onChange={() => onToggle(c.index)} className="h-4 w-4 accent-fjord-500" />
              </Td>
            )}
            <Td className="font-medium">{c.index + 1}</Td>
            <Td>{c.phi.toFixed(3)}</Td>
            <Td>{formatNumber(c.level, 3)}</Td>
            <Td>
              <StateBadge state={c.derived.predictedState} />
            </Td>
            <Td>{formatNumber(c.derived.margin, 2)}</Td>
            <Td>{costText(c.costPerLitre)}</Td>
            <Td className="text-ink-soft">{evidenceText(c.evidence)}</Td>
            <Td className={c.shelfLife?.meets === false ? 'text-brick-700' : undefined}>{shelfLifeText(c.shelfLife, lastWatched, minimumDays)}</Td>
            <Td>{c.recipe ? <Link to={`/recipes/${c.recipe.code}`}>{c.recipe.code}</Link> : <span className="text-ink-faint">—</span>}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
    {plan.outcome.shelfLife && <p className="mt-2 text-xs text-ink-soft" data-testid="plan-shelf-life-note">{plan.outcome.shelfLife.note}</p>}
    </>
  );
}
