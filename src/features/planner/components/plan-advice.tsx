import type { PlanAdvice as Advice } from '@shared/planning/types';
import type { PlanInput } from '@shared/schemas/plans';
import type { PlanView } from '@shared/views/plan';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { formatNumber } from '@/lib/format';

/** The plan's request with one piece of advice applied (and its second limit, if any). */
export function relaxedInput(plan: PlanView, advice: Advice): PlanInput | null {
  if (advice.to === null || advice.constraint === 'materials') return null;
  const input: PlanInput = structuredClone(plan.inputs);
  const apply = (constraint: Advice['constraint'], to: number) => {
    if (constraint === 'minMargin') input.minMargin = to;
    if (constraint === 'phi.min') input.phi.min = to;
    if (constraint === 'phi.max') input.phi.max = to;
    const dose = input.attraction.source === 'depletion' ? input.attraction.concentrationGL : input.attraction.concentrationMM;
    if (constraint === 'level.min') dose.min = to;
    if (constraint === 'level.max') dose.max = to;
  };
  apply(advice.constraint, advice.to);
  if (advice.also) apply(advice.also.constraint, advice.also.to);
  return input;
}

/**
 * When nothing in the ranges meets the request: what to relax and by how much, each with a button
 * that plans again with that limit (for roles that may plan).
 */
export function PlanAdviceNotice({ plan, onTry, busy }: { plan: PlanView; onTry: ((input: PlanInput) => void) | null; busy: boolean }) {
  const { outcome } = plan;
  return (
    <Notice tone="warning" title="Nothing in these ranges meets the request">
      <p>
        Of {outcome.counts.placed.toLocaleString('en')} compositions sampled, {outcome.counts.inTarget.toLocaleString('en')} are predicted in the target state
        {outcome.bestInRange ? `, the best with margin ${formatNumber(outcome.bestInRange.margin, 2)}` : ''}; none has the margin asked.
      </p>
      <ul className="mt-2 flex flex-col gap-2" aria-label="What to relax">
        {outcome.advice.map((a, i) => {
          const relaxed = relaxedInput(plan, a);
          return (
            <li key={i} className="flex flex-wrap items-center gap-3" data-advice={a.constraint}>
              <span>{a.message}</span>
              {onTry && relaxed && (
                <Button size="sm" variant="secondary" busy={busy} onClick={() => onTry(relaxed)}>
                  Plan again with this
                </Button>
              )}
            </li>
          );
        })}
      </ul>
    </Notice>
  );
}
