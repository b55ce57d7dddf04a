import { AgreementTick, StateName } from '@/components/ui/state-badge';
import { formatDate, formatNumber } from '@/lib/format';
import { useRecentRecipeObservations } from '@/features/bench';

/** What the bench observed for one recipe, newest first, each with whether it agreed with the prediction. */
export function RecipeEvidence({ recipeId, code }: { recipeId: number; code: string }) {
  const observations = useRecentRecipeObservations(recipeId);
  if (observations.isPending) return <p className="text-xs text-ink-soft">Loading the bench record…</p>;
  if (observations.isError) return <p className="text-xs text-brick-700">The bench record of {code} could not be loaded.</p>;
  const { items, total } = observations.data;
  if (items.length === 0) return <p className="text-xs text-ink-soft">Not observed on the bench yet.</p>;
  const disagreeing = items.filter((o) => o.agrees === false).length;
  return (
    <div className="text-xs">
      <p className="font-medium text-ink">
        {total} {total === 1 ? 'observation' : 'observations'} on the bench
        {disagreeing > 0 ? `, ${disagreeing} disagreeing with the prediction` : ', none disagreeing with the prediction'}
        {total > items.length ? ` (newest ${items.length} shown)` : ''}
      </p>
      <ul className="mt-1 flex flex-col gap-0.5" aria-label={`Bench observations of ${code}`}>
        {items.map((o) => (
          <li key={o.id} className="text-ink-soft">
            <AgreementTick agrees={o.agrees} /> <StateName state={o.observedState} /> at {formatNumber(o.ageDays)} days, mixed {formatDate(o.mixedAt)}
            {o.agrees === true ? ' (agrees)' : o.agrees === false ? ' (disagrees)' : ' (not compared)'}
          </li>
        ))}
      </ul>
    </div>
  );
}
