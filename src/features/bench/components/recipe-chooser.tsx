import { useState } from 'react';
import { useController, type Control } from 'react-hook-form';
import { STATE_LABELS } from '@shared/states';
import type { RecipeView } from '@shared/views/recipe';
import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import { useRecipes } from '@/features/recipes';
import { useDebounced } from '../hooks/use-debounced';
import type { RecordOutcomeValues } from './record-outcome-schema';

const optionText = (r: RecipeView) => `${r.code} · ${r.name}${r.derived.predictedState ? ` (predicted ${STATE_LABELS[r.derived.predictedState].toLowerCase()})` : ''}`;

/**
 * Narrow the programme's recipes by code or name, then pick one. The chosen recipe stays in
 * the list while the search text changes, so the select never silently shows another one.
 */
export function RecipeChooser({ programmeId, control, onChosen }: { programmeId: number; control: Control<RecordOutcomeValues>; onChosen?: (recipe: RecipeView | null) => void }) {
  const [text, setText] = useState('');
  const [chosen, setChosen] = useState<RecipeView | null>(null);
  const q = useDebounced(text);
  const choices = useRecipes({ programme: programmeId, q: q.trim(), pageSize: 50, sort: 'code' });
  const { field, fieldState } = useController({ control, name: 'recipeId' });
  const found = choices.data?.items ?? [];
  const options = chosen && !found.some((r) => r.id === chosen.id) ? [chosen, ...found] : found;
  const more = choices.data && choices.data.total > found.length ? choices.data.total - found.length : 0;
  const chooserHint = choices.isError ? 'The recipes could not be loaded; try again.' : more ? `${more} more match; type more of the code or name` : found.length === 0 && choices.data ? 'No recipe matches this text' : null;
  return (
    <div className="grid gap-4 md:grid-cols-[14rem_1fr]">
      <Field label="Find the recipe" hint={<span className="text-ink-soft">Code, or part of the name or notes</span>}>
        {(props) => <TextInput {...props} type="search" value={text} onChange={(event) => setText(event.target.value)} placeholder="e.g. HB-0012" />}
      </Field>
      <Field
        label="Recipe"
        error={fieldState.error?.message}
        hint={chooserHint && <span className="text-ink-soft">{chooserHint}</span>}
      >
        {(props) => (
          <SelectInput
            {...props}
            ref={field.ref}
            name={field.name}
            onBlur={field.onBlur}
            value={field.value === undefined || field.value === null ? '' : String(field.value)}
            onChange={(event) => {
              const recipe = options.find((r) => String(r.id) === event.target.value) ?? null;
              setChosen(recipe);
              field.onChange(recipe ? recipe.id : undefined);
              onChosen?.(recipe);
            }}
          >
            <option value="">{choices.isPending ? 'Loading recipes…' : 'Choose a recipe'}</option>
            {options.map((recipe) => (
              <option key={recipe.id} value={recipe.id}>
                {optionText(recipe)}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
    </div>
  );
}
