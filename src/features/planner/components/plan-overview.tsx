import { STATE_LABELS } from '@shared/states';
import type { PlanPrice, PlanView } from '@shared/views/plan';
import { Badge } from '@/components/ui/page';
import { formatDate, formatDateTime, formatNumber } from '@/lib/format';

const priceText = (price: PlanPrice | null) => (price === null ? null : price.pricePerKg === null ? 'no price' : `${formatNumber(price.pricePerKg, 4)} per kg${price.source === 'plan' ? ' (this plan)' : ''}`);

/** What a plan asked, with which model and calibration, and how much it found. */
export function PlanOverview({ plan }: { plan: PlanView }) {
  const { inputs, outcome, uncertainty } = plan;
  const dose = inputs.attraction.source === 'depletion' ? inputs.attraction.concentrationGL : inputs.attraction.concentrationMM;
  const rows: [string, React.ReactNode][] = [
    ['Target', `${STATE_LABELS[plan.targetState]}, margin at least ${formatNumber(inputs.minMargin, 3)}`],
    ['Materials', `${plan.materials.particle} in ${plan.materials.solvent}, with ${plan.materials.depletant ?? plan.materials.salt} at ${formatNumber(inputs.temperatureC, 3)} °C`],
    ['Searched', `φ ${inputs.phi.min}–${inputs.phi.max}; ${plan.source === 'depletion' ? 'polymer' : 'salt'} ${dose.min}–${dose.max} ${plan.levelUnit}`],
    ['Prices', [priceText(plan.prices.particles) && `particles ${priceText(plan.prices.particles)}`, priceText(plan.prices.solvent) && `solvent ${priceText(plan.prices.solvent)}`, plan.prices.polymer && `polymer ${priceText(plan.prices.polymer)}`, plan.prices.salt && `salt ${priceText(plan.prices.salt)}`].filter(Boolean).join('; ')],
    [
      'Model',
      <span key="model" className="inline-flex flex-wrap items-center gap-2">
        {plan.calibration ? <Badge tone="amber">Calibrated</Badge> : <Badge>Uncalibrated theory</Badge>}
        <span>
          {plan.modelVersion}
          {plan.calibration ? `, calibration ${plan.calibration.id} accepted ${formatDate(plan.calibration.acceptedAt)} (shift ${formatNumber(uncertainty.shift, 2)} ± ${formatNumber(uncertainty.standardError, 2)} in B2*)` : `; boundary uncertainty taken as ±${formatNumber(uncertainty.standardError, 2)} in B2* (no calibration yet)`}
        </span>
      </span>,
    ],
    ['Found', `${outcome.counts.sampled.toLocaleString('en')} compositions sampled, ${outcome.counts.feasible.toLocaleString('en')} meet the request; ${outcome.candidates.length} listed, each re-derived exactly as its recipe would be (${outcome.elapsedMs} ms)`],
    ['Planned by', `${plan.createdBy?.name ?? 'someone'}, ${formatDateTime(plan.createdAt)}`],
  ];
  return (
    <div className="flex flex-col gap-3">
      <dl className="grid gap-x-4 gap-y-1.5 text-sm sm:grid-cols-[8rem_minmax(0,1fr)]">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-medium text-ink-soft">{term}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
      <details className="text-sm">
        <summary className="cursor-pointer font-medium">How this plan was made</summary>
        <div className="mt-2 flex flex-col gap-1.5 text-ink-soft">
          <p>{outcome.method}</p>
          <p>Cost: {outcome.costFormula}</p>
          {outcome.notes.map((note, i) => (
            <p key={i}>{note}</p>
          ))}
        </div>
      </details>
    </div>
  );
}
