import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { shortlistInputSchema } from '@shared/schemas/shortlists';
import { GOAL_STATES, STATE_LABELS, type GoalState } from '@shared/states';
import type { RecipeView } from '@shared/views/recipe';
import type { ShortlistView } from '@shared/views/shortlist';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextArea, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { useCreateShortlist } from '../api/create-shortlist';
import { useReplaceShortlist } from '../api/replace-shortlist';
import { RecipePicker } from './recipe-picker';
import { StateOptions } from '@/components/ui/state-options';

type Values = z.input<typeof shortlistInputSchema>;
type Output = z.output<typeof shortlistInputSchema>;
type RecipeInfo = Pick<RecipeView, 'id' | 'code' | 'name' | 'derived'>;

/**
 * Assembles a new shortlist, or replaces a draft (PUT sends the whole list, in order).
 * `defaultTargetState` is the programme's goal, which a new shortlist usually shares.
 */
export function ShortlistForm({
  programmeId,
  defaultTargetState,
  shortlist,
  onSaved,
  onCancel,
}: {
  programmeId: number;
  defaultTargetState: GoalState;
  shortlist?: ShortlistView;
  onSaved: (shortlist: ShortlistView) => void;
  onCancel: () => void;
}) {
  const create = useCreateShortlist();
  const replace = useReplaceShortlist(shortlist?.id ?? 0);
  const [problem, setProblem] = useState<string | null>(null);
  const [known, setKnown] = useState<Map<number, RecipeInfo>>(() => new Map((shortlist?.items ?? []).map((i) => [i.recipeId, i.recipe])));
  const { register, handleSubmit, setError, control, formState } = useForm<Values, unknown, Output>({
    resolver: zodResolver(shortlistInputSchema),
    defaultValues: shortlist
      ? { programmeId, title: shortlist.title, purpose: shortlist.purpose ?? '', targetState: shortlist.targetState, items: shortlist.items.map((i) => ({ recipeId: i.recipeId, reason: i.reason })) }
      : { programmeId, title: '', purpose: '', targetState: defaultTargetState, items: [] },
  });
  const items = useFieldArray({ control, name: 'items' });

  const add = (recipe: RecipeView) => {
    setKnown((previous) => new Map(previous).set(recipe.id, recipe));
    items.append({ recipeId: recipe.id, reason: '' }, { focusName: `items.${items.fields.length}.reason` });
  };

  const submit = handleSubmit(async (values) => {
    setProblem(null);
    try {
      const { shortlist: saved } = shortlist ? await replace.mutateAsync(values) : await create.mutateAsync(values);
      onSaved(saved);
    } catch (error) {
      const itemFields = items.fields.flatMap((_, i) => [`items.${i}.reason`, `items.${i}.recipeId`]);
      setProblem(placeServerError(error, setError, ['title', 'purpose', 'targetState', 'items', ...itemFields]));
    }
  });

  const label = shortlist ? `Edit ${shortlist.title}` : 'New shortlist';
  return (
    <form onSubmit={submit} noValidate aria-label={label} className="flex flex-col gap-5">
      {problem && <Notice tone="error">{problem}</Notice>}
      <div className="grid gap-4 md:grid-cols-[1fr_14rem]">
        <Field label="Title" error={formState.errors.title?.message}>
          {(props) => <TextInput {...props} {...register('title')} />}
        </Field>
        <Field label="Target state" error={formState.errors.targetState?.message}>
          {(props) => (
            <SelectInput {...props} {...register('targetState')}>
              <StateOptions states={GOAL_STATES} />
            </SelectInput>
          )}
        </Field>
        <Field label="Purpose" className="md:col-span-2" hint={<span className="text-ink-soft">What these recipes are for, and what the manager should weigh</span>} error={formState.errors.purpose?.message}>
          {(props) => <TextArea {...props} {...register('purpose')} />}
        </Field>
      </div>

      <div className="grid gap-5 lg:grid-cols-[1fr_22rem]">
        <section aria-labelledby="chosen-recipes" className="flex flex-col gap-2">
          <h3 id="chosen-recipes" className="text-base">
            Recipes on the shortlist ({items.fields.length})
          </h3>
          {formState.errors.items?.message && <p className="text-xs font-medium text-brick-700" role="alert">{formState.errors.items.message}</p>}
          {items.fields.length === 0 ? (
            <p className="rounded-md border border-dashed border-line-strong px-3 py-4 text-sm text-ink-soft">Add recipes from the list. A draft may be saved empty; submitting needs at least one recipe.</p>
          ) : (
            <ol className="flex flex-col gap-3">
              {items.fields.map((field, index) => {
                const recipe = known.get(field.recipeId);
                const code = recipe?.code ?? `recipe ${field.recipeId}`;
                const errors = formState.errors.items?.[index];
                return (
                  <li key={field.id} className="rounded-md border border-line bg-paper p-3">
                    <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
                      <p className="text-sm">
                        <span className="mr-1 text-ink-soft">{index + 1}.</span>
                        <span className="font-medium">{code}</span> {recipe?.name}
                        {recipe?.derived.predictedState && <span className="text-ink-soft"> · predicted {STATE_LABELS[recipe.derived.predictedState].toLowerCase()}</span>}
                      </p>
                      <div className="flex gap-1">
                        <Button variant="quiet" size="sm" disabled={index === 0} aria-label={`Move up ${code}`} onClick={() => items.move(index, index - 1)}>
                          Move up
                        </Button>
                        <Button variant="quiet" size="sm" aria-label={`Remove ${code}`} onClick={() => items.remove(index)}>
                          Remove
                        </Button>
                      </div>
                    </div>
                    {errors?.recipeId?.message && <p className="mb-1 text-xs font-medium text-brick-700" role="alert">{errors.recipeId.message}</p>}
                    <Field label={`Reason for ${code}`} error={errors?.reason?.message}>
                      {(props) => <TextArea {...props} className="min-h-14" {...register(`items.${index}.reason`)} />}
                    </Field>
                  </li>
                );
              })}
            </ol>
          )}
        </section>
        <RecipePicker programmeId={programmeId} chosen={new Set(items.fields.map((f) => f.recipeId))} onAdd={add} />
      </div>

      <div className="flex gap-2">
        <Button type="submit" busy={create.isPending || replace.isPending}>
          {shortlist ? 'Save the draft' : 'Create the draft'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
