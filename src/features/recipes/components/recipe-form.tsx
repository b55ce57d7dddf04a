import { useForm, useWatch, type Control } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState, type ReactNode } from 'react';
import type { z } from 'zod';
import { recipeInputSchema, type RecipeInput } from '@shared/schemas/recipes';

/** What the form holds while typing (before zod's transforms), and what it submits. */
type RecipeFormValues = z.input<typeof recipeInputSchema>;
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextArea, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { MaterialOptions, describeMaterial, useLiveMaterials } from '@/features/library';

const FIELDS = ['name', 'particleId', 'solventId', 'fraction.kind', 'fraction.value', 'temperatureC', 'attraction', 'attraction.depletantId', 'attraction.concentrationGL', 'attraction.saltId', 'attraction.concentrationMM', 'attraction.contactEnergyKT', 'attraction.rangeSigma', 'notes'] as const;

const num = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) };

export interface RecipeFormProps {
  initial: RecipeInput;
  submitLabel: string;
  onSubmit: (input: RecipeInput) => Promise<void>;
  /** Renders the live derivation (state, margin, small map) of the values being typed. */
  renderPreview: (values: RecipeInput) => ReactNode;
}

/** Compose a recipe: particles, how crowded, in what, and what makes them stick. */
export function RecipeForm({ initial, submitLabel, onSubmit, renderPreview }: RecipeFormProps) {
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  const depletants = useLiveMaterials('depletants');
  const salts = useLiveMaterials('salts');
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, setValue, control, formState } = useForm<RecipeFormValues, unknown, RecipeInput>({
    resolver: zodResolver(recipeInputSchema),
    defaultValues: initial,
    mode: 'onChange',
  });
  const errors = formState.errors as Record<string, { message?: string } & Record<string, { message?: string }>>;
  const source = useWatch({ control, name: 'attraction.source' });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values);
    } catch (error) {
      setFormError(placeServerError(error, setError, FIELDS));
    }
  });
  const changeSource = (next: RecipeInput['attraction']['source']) => {
    const defaults: Record<string, RecipeInput['attraction']> = {
      depletion: { source: 'depletion', depletantId: depletants.data?.[0]?.id ?? 0, concentrationGL: 5 },
      salt: { source: 'salt', saltId: salts.data?.[0]?.id ?? 0, concentrationMM: 100 },
      direct: { source: 'direct', contactEnergyKT: 4, rangeSigma: 0.05 },
      none: { source: 'none' },
    };
    setValue('attraction', defaults[next], { shouldValidate: true, shouldDirty: true });
  };
  const loading = particles.isPending || solvents.isPending || depletants.isPending || salts.isPending;
  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(22rem,28rem)]">
      <form onSubmit={submit} noValidate aria-label="Recipe" className="flex flex-col gap-5">
        {formError && <Notice tone="error">{formError}</Notice>}
        <Field label="Name" error={errors.name?.message}>
          {(p) => <TextInput {...p} {...register('name')} />}
        </Field>
        <fieldset className="grid gap-4 rounded-card border border-line p-4 sm:grid-cols-2">
          <legend className="px-1 text-sm font-semibold">Particles and solvent</legend>
          <Field label="Particle system" error={errors.particleId?.message}>
            {(p) => (
              <SelectInput {...p} disabled={loading} {...register('particleId', num)}>
                <MaterialOptions items={particles.data ?? []} describe={describeMaterial.particle} />
              </SelectInput>
            )}
          </Field>
          <Field label="Solvent" error={errors.solventId?.message}>
            {(p) => (
              <SelectInput {...p} disabled={loading} {...register('solventId', num)}>
                <MaterialOptions items={solvents.data ?? []} />
              </SelectInput>
            )}
          </Field>
          <Field label="Particle fraction given as" error={errors.fraction?.kind?.message}>
            {(p) => (
              <SelectInput {...p} {...register('fraction.kind')}>
                <option value="volume">Volume fraction φ</option>
                <option value="mass">Mass fraction w</option>
              </SelectInput>
            )}
          </Field>
          <Field label="Fraction (0 to 0.74)" error={errors.fraction?.value?.message}>
            {(p) => <TextInput {...p} inputMode="decimal" type="number" step="any" {...register('fraction.value', num)} />}
          </Field>
          <Field label="Temperature (°C)" error={errors.temperatureC?.message}>
            {(p) => <TextInput {...p} type="number" step="any" {...register('temperatureC', num)} />}
          </Field>
        </fieldset>
        <fieldset className="flex flex-col gap-4 rounded-card border border-line p-4">
          <legend className="px-1 text-sm font-semibold">What makes the particles stick</legend>
          <div role="radiogroup" aria-label="Attraction source" className="flex flex-wrap gap-2">
            {(
              [
                ['depletion', 'Non-adsorbing polymer (depletion)'],
                ['salt', 'Salt screening the charge'],
                ['direct', 'Known attraction (U/kT and range)'],
                ['none', 'None (hard spheres)'],
              ] as const
            ).map(([value, label]) => (
              <label key={value} className={`cursor-pointer rounded-md border px-3 py-1.5 text-sm ${source === value ? 'border-fjord-500 bg-fjord-50 font-medium' : 'border-line-strong'}`}>
                <input type="radio" className="sr-only" name="attraction-source" value={value} checked={source === value} onChange={() => changeSource(value)} />
                {label}
              </label>
            ))}
          </div>
          <AttractionFields control={control} register={register} errors={errors} depletants={depletants.data ?? []} salts={salts.data ?? []} />
        </fieldset>
        <Field label="Notes" error={errors.notes?.message}>
          {(p) => <TextArea {...p} rows={3} {...register('notes')} />}
        </Field>
        <div>
          <Button type="submit" busy={formState.isSubmitting}>
            {submitLabel}
          </Button>
        </div>
      </form>
      <LivePreview control={control} render={renderPreview} />
    </div>
  );
}

function LivePreview({ control, render }: { control: Control<RecipeFormValues, unknown, RecipeInput>; render: RecipeFormProps['renderPreview'] }) {
  const values = useWatch({ control }) as RecipeInput;
  return (
    <aside aria-label="Live prediction" className="flex flex-col gap-4 xl:sticky xl:top-6 xl:self-start">
      {render(values)}
    </aside>
  );
}

type Register = ReturnType<typeof useForm<RecipeFormValues, unknown, RecipeInput>>['register'];

function AttractionFields({ control, register, errors, depletants, salts }: { control: Control<RecipeFormValues, unknown, RecipeInput>; register: Register; errors: Record<string, Record<string, { message?: string }>>; depletants: { id: number; name: string }[]; salts: { id: number; name: string; valence: number }[] }) {
  const source = useWatch({ control, name: 'attraction.source' });
  const e = (errors.attraction ?? {}) as Record<string, { message?: string }>;
  if (source === 'depletion') {
    return (
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Polymer (depletant)" error={e.depletantId?.message}>
          {(p) => (
            <SelectInput {...p} {...register('attraction.depletantId', num)}>
              <MaterialOptions items={depletants} />
            </SelectInput>
          )}
        </Field>
        <Field label="Polymer concentration (g per litre of solvent)" error={e.concentrationGL?.message}>
          {(p) => <TextInput {...p} type="number" step="any" {...register('attraction.concentrationGL', num)} />}
        </Field>
      </div>
    );
  }
  if (source === 'salt') {
    return (
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Salt" error={e.saltId?.message}>
          {(p) => (
            <SelectInput {...p} {...register('attraction.saltId', num)}>
              <MaterialOptions items={salts} describe={describeMaterial.salt} />
            </SelectInput>
          )}
        </Field>
        <Field label="Salt concentration (mM)" error={e.concentrationMM?.message}>
          {(p) => <TextInput {...p} type="number" step="any" {...register('attraction.concentrationMM', num)} />}
        </Field>
      </div>
    );
  }
  if (source === 'direct') {
    return (
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Contact attraction U/kT" hint="Depth of the well at contact, positive." error={e.contactEnergyKT?.message}>
          {(p) => <TextInput {...p} type="number" step="any" {...register('attraction.contactEnergyKT', num)} />}
        </Field>
        <Field label="Range (fraction of diameter)" hint="Square-well width: λ = 1 + range." error={e.rangeSigma?.message}>
          {(p) => <TextInput {...p} type="number" step="any" {...register('attraction.rangeSigma', num)} />}
        </Field>
      </div>
    );
  }
  return <p className="text-sm text-ink-soft">Without attraction the particles behave as hard spheres: fluid, crystal or glass depending on φ alone.</p>;
}
