import { Link } from 'react-router-dom';
import { STATE_LABELS, type GoalState, type ShortlistStatus } from '@shared/states';
import type { RecipeDifference } from '@shared/views/recipe';
import type { ShortlistItemView } from '@shared/views/shortlist';
import { Badge } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { StateBadge } from '@/components/ui/state-badge';
import { EmptyState } from '@/components/ui/states';
import { formatNumber } from '@/lib/format';
import { RecipeEvidence } from './recipe-evidence';
import { SymbolText } from '@/components/ui/symbol-text';

/** The shortlisted recipes in the author's order: prediction, margin, the author's reason and the bench evidence. */
export function ShortlistItems({ items, targetState, status }: { items: ShortlistItemView[]; targetState: GoalState; status: ShortlistStatus }) {
  if (items.length === 0) return <EmptyState title="No recipe on this shortlist yet">Its author adds recipes while it is a draft.</EmptyState>;
  return (
    <ol className="flex flex-col gap-3" aria-label="Recipes on the shortlist">
      {items.map((item, index) => {
        const { recipe } = item;
        const predicted = recipe.derived.predictedState;
        const offTarget = predicted !== null && predicted !== targetState;
        return (
          <li key={item.recipeId} className="rounded-card border border-line bg-panel p-4 shadow-card">
            <div className="grid gap-4 md:grid-cols-[1fr_18rem]">
              <div>
                <p className="flex flex-wrap items-center gap-2">
                  <span className="text-ink-soft">{index + 1}.</span>
                  <Link to={`/recipes/${recipe.code}`} className="font-semibold">
                    {recipe.code}
                  </Link>
                  <span>{recipe.name}</span>
                  {recipe.archived && <Badge>Archived recipe</Badge>}
                  {item.frozen && <span className="text-xs text-ink-soft">version {recipe.version} as submitted</span>}
                </p>
                {item.changed && <ChangedSince changed={item.changed} status={status} />}
                <dl className="mt-2 grid grid-cols-[8rem_1fr] gap-x-3 gap-y-1 text-sm">
                  <dt className="text-ink-soft">Predicted state</dt>
                  <dd>
                    {predicted ? <StateBadge state={predicted} /> : <span className="text-ink-soft">No prediction</span>}
                    {offTarget && <span className="ml-2 font-medium text-brick-700">⚠ not the target ({STATE_LABELS[targetState]})</span>}
                  </dd>
                  <dt className="text-ink-soft">Margin</dt>
                  <dd>
                    {recipe.derived.margin !== null && recipe.derived.nearestBoundary
                      ? `${formatNumber(recipe.derived.margin * 100, 2)} % of the map from ${recipe.derived.nearestBoundary.label}`
                      : 'No boundary named'}
                    {recipe.derived.marginDescription && <span className="block text-xs text-ink-soft"><SymbolText text={recipe.derived.marginDescription} /></span>}
                  </dd>
                  <dt className="text-ink-soft">Reason</dt>
                  <dd className="whitespace-pre-line">{item.reason}</dd>
                </dl>
              </div>
              <div className="border-t border-line pt-3 md:border-l md:border-t-0 md:pl-4 md:pt-0">
                <RecipeEvidence recipeId={recipe.id} code={recipe.code} />
              </div>
            </div>
          </li>
        );
      })}
    </ol>
  );
}

const show = (value: RecipeDifference['before']) => (value === null ? '—' : typeof value === 'number' ? formatNumber(value, 4) : value);

/** The recipe was edited or re-predicted after submission: the shortlist keeps its version, this says what moved. */
function ChangedSince({ changed, status }: { changed: NonNullable<ShortlistItemView['changed']>; status: ShortlistStatus }) {
  const since = status === 'approved' ? 'approval' : 'submission';
  return (
    <Notice tone="warning" title={`Changed since ${since}`} className="mt-2">
      <p>This shortlist keeps the version that was submitted. The recipe is now at version {changed.currentVersion}{changed.differences.length === 0 ? ', with the same values.' : ':'}</p>
      {changed.differences.length > 0 && (
        <ul className="mt-1" aria-label="Differences from the submitted version">
          {changed.differences.map((d) => (
            <li key={d.field}>
              <SymbolText text={d.label} />: {show(d.before)} → {show(d.after)}
            </li>
          ))}
        </ul>
      )}
    </Notice>
  );
}
