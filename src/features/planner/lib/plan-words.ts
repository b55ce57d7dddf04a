import type { ShelfLifeVerdict } from '@shared/shelf-life/shelf-life-requirement';
import { STATE_LABELS } from '@shared/states';
import type { CostPerLitre, NearestEvidence } from '@shared/planning/types';
import type { PlanView } from '@shared/views/plan';
import { formatNumber } from '@/lib/format';

/** "Polymer (g/L)" or "Salt (mM)": the dose column of a plan. */
export const doseHeading = (plan: PlanView) => `${plan.source === 'depletion' ? 'Polymer' : 'Salt'} (${plan.levelUnit})`;

/** The dose as written on a recipe: "8.46 g/L PEG 20 kg/mol". */
export const doseText = (plan: PlanView, level: number) => `${formatNumber(level, 3)} ${plan.levelUnit} ${plan.materials.depletant ?? plan.materials.salt ?? ''}`.trim();

/** Cost per litre with the materials that had no price. */
export function costText(cost: CostPerLitre): string {
  const total = formatNumber(cost.total, 3);
  return cost.unpriced.length ? `${total} (no price: ${cost.unpriced.join(', ')})` : total;
}

/** The nearest bench evidence in words. */
export function evidenceText(evidence: NearestEvidence | null): string {
  if (!evidence) return 'No bench samples yet';
  return `${evidence.label}: ${STATE_LABELS[evidence.observedState].toLowerCase()} at ${formatNumber(evidence.ageDays, 3)} d, ${formatNumber(evidence.distance, 2)} away`;
}

/**
 * A candidate's shelf-life column: the predicted median days to collapse ("beyond N d" past the
 * bench's longest watch), the chance of still standing at the asked minimum, and "short" when it
 * falls short of it; "—" when the model was refused or the plan predates the column.
 */
export function shelfLifeText(verdict: ShelfLifeVerdict | null | undefined, lastWatchedDays: number | null, minimumDays: number | null): string {
  if (!verdict) return '—';
  const median = verdict.medianDays === null ? `median beyond ${lastWatchedDays ?? 'the bench\'s'} d` : `median ${verdict.medianDays} d`;
  const chance = minimumDays !== null && verdict.survivalAtMinimum !== null ? `; ${Math.round(100 * verdict.survivalAtMinimum)} % standing at ${minimumDays} d` : '';
  const mark = verdict.meets === false ? 'short: ' : '';
  return `${mark}${median}${chance}`;
}
