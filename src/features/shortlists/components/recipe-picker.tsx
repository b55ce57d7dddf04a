import { useState } from 'react';
import { LIMITS } from '@shared/limits';
import { STATE_LABELS } from '@shared/states';
import type { RecipeView } from '@shared/views/recipe';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { ErrorState, Loading } from '@/components/ui/states';
import { formatNumber } from '@/lib/format';
import { useRecipes } from '@/features/recipes';

const SHOWN = 12;

const matches = (recipe: RecipeView, text: string) => {
  const needle = text.trim().toLowerCase();
  return !needle || recipe.code.toLowerCase().includes(needle) || recipe.name.toLowerCase().includes(needle);
};

/** The programme's recipes not yet on the shortlist, narrowed by code or name, each with an Add button. */
export function RecipePicker({ programmeId, chosen, onAdd }: { programmeId: number; chosen: Set<number>; onAdd: (recipe: RecipeView) => void }) {
  const [text, setText] = useState('');
  const recipes = useRecipes({ programme: programmeId, pageSize: LIMITS.pageSizeMax, sort: 'code' });
  if (recipes.isPending) return <Loading label="Loading the programme's recipes…" />;
  if (recipes.isError) return <ErrorState error={recipes.error} retry={() => recipes.refetch()} />;
  const open = recipes.data.items.filter((r) => !chosen.has(r.id) && matches(r, text));
  return (
    <div className="flex flex-col gap-2">
      <Field label="Find recipes to add" hint={<span className="text-ink-soft">Code or part of the name</span>}>
        {(props) => <TextInput {...props} type="search" value={text} onChange={(event) => setText(event.target.value)} />}
      </Field>
      {recipes.data.items.length === 0 ? (
        <p className="text-sm text-ink-soft">This programme has no recipes yet. A formulator creates them on the Recipes screen.</p>
      ) : open.length === 0 ? (
        <p className="text-sm text-ink-soft">{text ? 'No other recipe matches.' : 'Every recipe of the programme is on the shortlist.'}</p>
      ) : (
        <ul className="divide-y divide-line rounded-md border border-line" aria-label="Recipes you can add">
          {open.slice(0, SHOWN).map((recipe) => (
            <li key={recipe.id} className="flex items-center justify-between gap-3 px-3 py-1.5 text-sm">
              <span className="min-w-0">
                <span className="font-medium">{recipe.code}</span> <span className="text-ink-soft">{recipe.name}</span>
                <span className="block text-xs text-ink-soft">
                  {recipe.derived.predictedState ? `Predicted ${STATE_LABELS[recipe.derived.predictedState].toLowerCase()}` : 'No prediction'} · φ {formatNumber(recipe.derived.phi)}
                  {recipe.derived.margin !== null ? ` · margin ${formatNumber(recipe.derived.margin * 100, 2)} % of the map` : ''}
                </span>
              </span>
              <Button variant="secondary" size="sm" aria-label={`Add ${recipe.code}`} onClick={() => onAdd(recipe)}>
                Add
              </Button>
            </li>
          ))}
          {open.length > SHOWN && <li className="px-3 py-1.5 text-xs text-ink-soft">{open.length - SHOWN} more: type part of a code or name to narrow the list.</li>}
        </ul>
      )}
    </div>
  );
}
