import { Link } from 'react-router-dom';
import { STATE_LABELS } from '@shared/states';
import type { RecipeView } from '@shared/views/recipe';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { useRecipeSearch } from '../api/search-recipes';

/** A short excerpt of the notes around the words searched for, so a person sees why a recipe matched. */
function excerpt(notes: string | null, q: string): string | null {
  if (!notes) return null;
  const at = notes.toLowerCase().indexOf(q.toLowerCase());
  if (at < 0) return null;
  const start = Math.max(0, at - 40);
  return `${start > 0 ? '…' : ''}${notes.slice(start, at + q.length + 60)}${at + q.length + 60 < notes.length ? '…' : ''}`;
}

export function ResultList({ q, selected, hrefFor, programmeName }: { q: string; selected: string | null; hrefFor: (recipe: RecipeView) => string; programmeName: (id: number) => string | null }) {
  const results = useRecipeSearch(q);
  if (!q) return <p className="text-sm text-ink-soft">Type a code such as HB-0012, part of a name, or a word from the notes.</p>;
  if (results.isPending) return <Loading label="Searching…" />;
  if (results.isError) return <ErrorState error={results.error} retry={() => results.refetch()} />;
  if (results.data.items.length === 0) return <EmptyState title={`No recipe matches “${q}”`}>Check the code, or try a shorter part of the name.</EmptyState>;
  const { items, total } = results.data;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm text-ink-soft" role="status">
        {total === 1 ? '1 recipe matches' : `${total} recipes match`}
        {total > items.length ? `; the first ${items.length} by code are shown` : ''}.
      </p>
      <ul className="divide-y divide-line overflow-hidden rounded-card border border-line bg-panel" aria-label="Matching recipes">
        {items.map((recipe) => {
          const current = selected === recipe.code;
          const note = excerpt(recipe.notes, q);
          return (
            <li key={recipe.id}>
              <Link
                to={hrefFor(recipe)}
                aria-current={current || undefined}
                className={`block px-4 py-2.5 no-underline hover:bg-fjord-50 hover:no-underline ${current ? 'border-l-4 border-fjord-500 bg-fjord-50' : 'border-l-4 border-transparent'}`}
              >
                <span className="block text-sm">
                  <span className="font-semibold text-fjord-700">{recipe.code}</span> <span className="text-ink">{recipe.name}</span>
                </span>
                <span className="block text-xs text-ink-soft">
                  {programmeName(recipe.programmeId) ?? 'Programme'} · {recipe.derived.predictedState ? `predicted ${STATE_LABELS[recipe.derived.predictedState].toLowerCase()}` : 'no prediction'}
                  {recipe.archived ? ' · archived' : ''}
                </span>
                {note && <span className="mt-0.5 block truncate text-xs italic text-ink-soft">{note}</span>}
              </Link>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
