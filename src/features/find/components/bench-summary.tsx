import { STATE_LABELS, type ObservedState } from '@shared/states';
import type { ObservationView } from '@shared/views/observation';
import { ErrorState, Loading } from '@/components/ui/states';
import { AgreementTick, StateName } from '@/components/ui/state-badge';
import { formatDate, formatNumber } from '@/lib/format';
import { useRecentRecipeObservations } from '@/features/bench';

function countStates(items: ObservationView[]) {
  const counts = new Map<ObservedState, number>();
  for (const o of items) counts.set(o.observedState, (counts.get(o.observedState) ?? 0) + 1);
  return [...counts.entries()].sort((a, b) => b[1] - a[1]);
}

/** What the bench saw for this recipe, in a sentence first and then one line per outcome. */
export function BenchSummary({ recipeId }: { recipeId: number }) {
  const observations = useRecentRecipeObservations(recipeId);
  if (observations.isPending) return <Loading label="Loading the bench record…" />;
  if (observations.isError) return <ErrorState error={observations.error} retry={() => observations.refetch()} />;
  const { items, total } = observations.data;
  if (total === 0) return <p>Nobody has recorded an outcome for this recipe yet, so the prediction is untested.</p>;
  const agree = items.filter((o) => o.agrees === true).length;
  const disagree = items.filter((o) => o.agrees === false).length;
  const states = countStates(items)
    .map(([state, n]) => `${n} ${STATE_LABELS[state].toLowerCase()}`)
    .join(', ');
  return (
    <div className="flex flex-col gap-2">
      <p data-testid="bench-summary">
        Observed {total === 1 ? 'once' : `${total} times`}
        {total > items.length ? ` (the newest ${items.length} counted here)` : ''}: {states}. {agree} {agree === 1 ? 'agrees' : 'agree'} with the prediction, {disagree}{' '}
        {disagree === 1 ? 'disagrees' : 'disagree'}
        {items.length - agree - disagree > 0 ? `, ${items.length - agree - disagree} could not be compared` : ''}.
      </p>
      <ul className="flex flex-col gap-0.5 text-sm text-ink-soft" aria-label="Bench outcomes">
        {items.map((o) => (
          <li key={o.id}>
            <AgreementTick agrees={o.agrees} /> <StateName state={o.observedState} /> after {formatNumber(o.ageDays)} days (mixed {formatDate(o.mixedAt)}, {o.method})
            {o.agrees === true ? ', agrees' : o.agrees === false ? ', disagrees' : ', not compared'}
          </li>
        ))}
      </ul>
    </div>
  );
}
