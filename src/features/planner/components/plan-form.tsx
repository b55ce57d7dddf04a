import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { planInputSchema, PLAN_LIMITS, type PlanInput, type PlanRequest } from '@shared/schemas/plans';
import { GOAL_STATES, type GoalState } from '@shared/states';
import type { PlanView } from '@shared/views/plan';
import type { ProgrammeView } from '@shared/views/programme';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { useCreatePlan } from '../api/create-plan';
import { MaterialOptions, describeMaterial, useLiveMaterials } from '@/features/library';
import { RANKINGS, rankingOf } from './rankings';
import { StateOptions } from '@/components/ui/state-options';

const FIELDS = ['title', 'targetState', 'particleId', 'solventId', 'temperatureC', 'attraction.depletantId', 'attraction.saltId', 'attraction.concentrationGL.min', 'attraction.concentrationGL.max', 'attraction.concentrationMM.min', 'attraction.concentrationMM.max', 'phi.min', 'phi.max', 'minMargin', 'minShelfLifeDays', 'candidateCount', 'experimentCount', 'prices.particles', 'prices.solvent', 'prices.depletant', 'prices.salt'] as const;

const num = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) };

/** The first plan a programme's screen offers: its goal, its kind of attraction, typical ranges. */
export function defaultPlanInput(programme: ProgrammeView, ids: { particleId: number; solventId: number; depletantId: number; saltId: number }): PlanInput {
  const goal: GoalState = programme.goalState;
  return {
    programmeId: programme.id,
    targetState: goal,
    particleId: ids.particleId,
    solventId: ids.solventId,
    temperatureC: 25,
    attraction: programme.attractionSource === 'salt' ? { source: 'salt', saltId: ids.saltId, concentrationMM: { min: 20, max: 1000 } } : { source: 'depletion', depletantId: ids.depletantId, concentrationGL: { min: 0, max: 12 } },
    phi: { min: 0.05, max: 0.4 },
    minMargin: 0.1,
    candidateCount: PLAN_LIMITS.defaultCandidates,
    experimentCount: PLAN_LIMITS.defaultExperiments,
  };
}

/**
 * What to plan: the target state, the materials, the ranges to search, the smallest margin, how
 * many candidates and experiments, optional prices for this plan only, and how to rank.
 */
export function PlanForm({ initial, onPlanned }: { initial: PlanInput; onPlanned: (plan: PlanView) => void }) {
  const particles = useLiveMaterials('particles');
  const solvents = useLiveMaterials('solvents');
  const depletants = useLiveMaterials('depletants');
  const salts = useLiveMaterials('salts');
  const create = useCreatePlan();
  const [formError, setFormError] = useState<string | null>(null);
  const [ranking, setRanking] = useState(rankingOf(initial.ranking));
  const { register, handleSubmit, setError, setValue, control, formState } = useForm<PlanInput, unknown, PlanRequest>({ resolver: zodResolver(planInputSchema), defaultValues: initial, mode: 'onChange' });
  const errors = formState.errors as Record<string, Record<string, Record<string, { message?: string }> & { message?: string }> & { message?: string }>;
  const source = useWatch({ control, name: 'attraction.source' });
  const particleId = useWatch({ control, name: 'particleId' });
  const depletantId = useWatch({ control, name: 'attraction.depletantId' });
  const saltId = useWatch({ control, name: 'attraction.saltId' });
  const solventId = useWatch({ control, name: 'solventId' });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      onPlanned(await create.mutateAsync({ ...values, ranking: RANKINGS[ranking].weights }));
    } catch (error) {
      setFormError(placeServerError(error, setError, FIELDS));
    }
  });
  const switchSource = (next: 'depletion' | 'salt') =>
    setValue('attraction', next === 'depletion'
      ? { source: 'depletion', depletantId: depletants.data?.[0]?.id ?? 0, concentrationGL: { min: 0, max: 12 } }
      : { source: 'salt', saltId: salts.data?.[0]?.id ?? 0, concentrationMM: { min: 20, max: 1000 } }, { shouldValidate: true });
  const loading = particles.isPending || solvents.isPending || depletants.isPending || salts.isPending;
  const libraryPrice = (items: { id: number; pricePerKg: number | null }[] | undefined, id: unknown) => items?.find((m) => m.id === Number(id))?.pricePerKg ?? null;
  const pricePlaceholder = (price: number | null) => (price === null ? 'no library price' : `library: ${price}`);
  const a = (errors.attraction ?? {}) as Record<string, Record<string, { message?: string }> & { message?: string }>;
  const dose = source === 'depletion' ? a.concentrationGL : a.concentrationMM;
  const unit = source === 'depletion' ? 'g/L' : 'mM';
  const doseName = source === 'depletion' ? 'Polymer' : 'Salt';
  return (
    <form onSubmit={submit} noValidate aria-label="Plan" className="flex flex-col gap-4">
      {formError && <Notice tone="error">{formError}</Notice>}
      <div className="grid gap-4 lg:grid-cols-[3fr_2fr_2fr]">
        <fieldset className="grid content-start gap-4 rounded-card border border-line p-4 sm:grid-cols-2">
          <legend className="px-1 text-sm font-semibold">Target and materials</legend>
          <Field label="Target state" error={errors.targetState?.message}>
            {(p) => (
              <SelectInput {...p} {...register('targetState')}>
                <StateOptions states={GOAL_STATES} />
              </SelectInput>
            )}
          </Field>
          <Field label="Plan title (optional)" error={errors.title?.message}>
            {(p) => <TextInput {...p} placeholder="Named after the materials" {...register('title')} />}
          </Field>
          <Field label="Particle system" error={errors.particleId?.message} className="sm:col-span-2">
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
          <Field label="Temperature (°C)" error={errors.temperatureC?.message}>
            {(p) => <TextInput {...p} type="number" step="any" {...register('temperatureC', num)} />}
          </Field>
          <div role="radiogroup" aria-label="What makes the particles stick" className="flex flex-wrap gap-2 sm:col-span-2">
            {(
              [
                ['depletion', 'Non-adsorbing polymer'],
                ['salt', 'Salt'],
              ] as const
            ).map(([value, label]) => (
              <label key={value} className={`cursor-pointer rounded-md border px-3 py-1.5 text-sm ${source === value ? 'border-fjord-500 bg-fjord-50 font-medium' : 'border-line-strong'}`}>
                <input type="radio" className="sr-only" name="plan-source" value={value} checked={source === value} onChange={() => switchSource(value)} />
                {label}
              </label>
            ))}
          </div>
          {source === 'depletion' ? (
            <Field label="Polymer (depletant)" error={a.depletantId?.message} className="sm:col-span-2">
              {(p) => (
                <SelectInput {...p} disabled={loading} {...register('attraction.depletantId', num)}>
                  <MaterialOptions items={depletants.data ?? []} />
                </SelectInput>
              )}
            </Field>
          ) : (
            <Field label="Salt" error={a.saltId?.message} className="sm:col-span-2">
              {(p) => (
                <SelectInput {...p} disabled={loading} {...register('attraction.saltId', num)}>
                  <MaterialOptions items={salts.data ?? []} describe={describeMaterial.salt} />
                </SelectInput>
              )}
            </Field>
          )}
        </fieldset>
        <fieldset className="grid content-start gap-4 rounded-card border border-line p-4 sm:grid-cols-2">
          <legend className="px-1 text-sm font-semibold">Where to search</legend>
          <Field label="φ from" error={errors.phi?.min?.message}>
            {(p) => <TextInput {...p} type="number" step="any" inputMode="decimal" {...register('phi.min', num)} />}
          </Field>
          <Field label="φ to" error={errors.phi?.max?.message}>
            {(p) => <TextInput {...p} type="number" step="any" inputMode="decimal" {...register('phi.max', num)} />}
          </Field>
          <Field key={`${source}-from`} label={`${doseName} from (${unit})`} error={dose?.min?.message}>
            {(p) => <TextInput {...p} type="number" step="any" {...register(source === 'depletion' ? 'attraction.concentrationGL.min' : 'attraction.concentrationMM.min', num)} />}
          </Field>
          <Field key={`${source}-to`} label={`${doseName} to (${unit})`} error={dose?.max?.message}>
            {(p) => <TextInput {...p} type="number" step="any" {...register(source === 'depletion' ? 'attraction.concentrationGL.max' : 'attraction.concentrationMM.max', num)} />}
          </Field>
          <Field label="Smallest margin" hint="Distance to the nearest boundary that changes the state, in map units (the map is a unit square)." error={errors.minMargin?.message} className="sm:col-span-2">
            {(p) => <TextInput {...p} type="number" step="any" {...register('minMargin', num)} />}
          </Field>
          <Field label="Stays a gel for at least (days)" hint="Optional. Judged with the programme's shelf-life model (predicted median days to collapse); candidates that fall short are listed last, marked short." error={errors.minShelfLifeDays?.message} className="sm:col-span-2">
            {(p) => <TextInput {...p} type="number" step={1} min={1} {...register('minShelfLifeDays', num)} />}
          </Field>
        </fieldset>
        <fieldset className="grid content-start gap-4 rounded-card border border-line p-4 sm:grid-cols-2">
          <legend className="px-1 text-sm font-semibold">What to list</legend>
          <Field label="Ranking" hint="How candidates that meet the request are ordered." className="sm:col-span-2">
            {(p) => (
              <SelectInput {...p} value={ranking} onChange={(event) => setRanking(event.target.value as keyof typeof RANKINGS)}>
                {Object.entries(RANKINGS).map(([key, r]) => (
                  <option key={key} value={key}>
                    {r.label}
                  </option>
                ))}
              </SelectInput>
            )}
          </Field>
          <Field label="Candidates to list" error={errors.candidateCount?.message}>
            {(p) => <TextInput {...p} type="number" step={1} min={1} max={PLAN_LIMITS.candidates} {...register('candidateCount', num)} />}
          </Field>
          <Field label="Next experiments to propose" error={errors.experimentCount?.message}>
            {(p) => <TextInput {...p} type="number" step={1} min={0} max={PLAN_LIMITS.experiments} {...register('experimentCount', num)} />}
          </Field>
        </fieldset>
      </div>
      <details className="rounded-card border border-line p-4">
        <summary className="cursor-pointer text-sm font-semibold">Prices for this plan only (per kg; blank uses the library)</summary>
        <div className="mt-3 grid gap-4 sm:grid-cols-3">
          <Field label="Particles price per kg" error={errors.prices?.particles?.message}>
            {(p) => <TextInput {...p} type="number" step="any" min={0} placeholder={pricePlaceholder(libraryPrice(particles.data, particleId))} {...register('prices.particles', num)} />}
          </Field>
          <Field label="Solvent price per kg" error={errors.prices?.solvent?.message}>
            {(p) => <TextInput {...p} type="number" step="any" min={0} placeholder={pricePlaceholder(libraryPrice(solvents.data, solventId))} {...register('prices.solvent', num)} />}
          </Field>
          {source === 'depletion' ? (
            <Field label="Polymer price per kg" error={errors.prices?.depletant?.message}>
              {(p) => <TextInput {...p} type="number" step="any" min={0} placeholder={pricePlaceholder(libraryPrice(depletants.data, depletantId))} {...register('prices.depletant', num)} />}
            </Field>
          ) : (
            <Field label="Salt price per kg" error={errors.prices?.salt?.message}>
              {(p) => <TextInput {...p} type="number" step="any" min={0} placeholder={pricePlaceholder(libraryPrice(salts.data, saltId))} {...register('prices.salt', num)} />}
            </Field>
          )}
        </div>
      </details>
      <div>
        <Button type="submit" busy={formState.isSubmitting}>
          Plan compositions
        </Button>
      </div>
    </form>
  );
}
