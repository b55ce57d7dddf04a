import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { METHOD_LABELS, OBSERVATION_METHODS, OBSERVED_STATES, STATE_DESCRIPTIONS, STATE_LABELS } from '@shared/states';
import type { ObservationView } from '@shared/views/observation';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextArea, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { formatNumber } from '@/lib/format';
import { placeServerError } from '@/lib/form-errors';
import { useCreateObservation } from '../api/create-observation';
import { AgreementMark } from './agreement-mark';
import { AttachmentPanel } from './attachment-panel';
import { RecipeChooser } from './recipe-chooser';
import { recordOutcomeSchema, todayLocal, type RecordOutcomeInput, type RecordOutcomeValues } from './record-outcome-schema';
import { StateOptions } from '@/components/ui/state-options';

const FIELDS = ['recipeId', 'mixedAt', 'ageDays', 'observedState', 'method', 'storageModulusPa', 'yieldStressPa', 'settledHeightPct', 'sampleHeightMm', 'notes'] as const;

/** An empty box is "not measured" (null); a required one stays undefined so the schema names it. */
const optionalNumber = (raw: unknown) => (raw === '' || raw === null || raw === undefined ? null : Number(raw));
const requiredNumber = (raw: unknown) => (raw === '' || raw === null || raw === undefined ? undefined : Number(raw));

const blank = (): RecordOutcomeValues => ({
  recipeId: undefined as unknown as number,
  mixedAt: todayLocal(),
  ageDays: undefined as unknown as number,
  observedState: '' as RecordOutcomeValues['observedState'],
  method: 'visual',
  storageModulusPa: null,
  yieldStressPa: null,
  settledHeightPct: null,
  sampleHeightMm: null,
  notes: '',
});

/** Records one outcome for a recipe of the programme; once saved, files can be attached to it. */
export function RecordOutcomeForm({ programmeId }: { programmeId: number }) {
  const create = useCreateObservation();
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState<ObservationView | null>(null);
  const [round, setRound] = useState(0);
  const { register, handleSubmit, setError, control, reset, watch, formState } = useForm<RecordOutcomeValues, unknown, RecordOutcomeInput>({
    resolver: zodResolver(recordOutcomeSchema),
    defaultValues: blank(),
  });
  const state = watch('observedState');
  const submit = handleSubmit(async (values) => {
    setProblem(null);
    try {
      const { observation } = await create.mutateAsync(values);
      setSaved(observation);
    } catch (error) {
      setProblem(placeServerError(error, setError, FIELDS));
    }
  });

  if (saved) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="success" title="Outcome recorded">
          <p>
            {saved.recipeCode}: observed {STATE_LABELS[saved.observedState].toLowerCase()} at {formatNumber(saved.ageDays)} days
            {saved.predictedState ? `, predicted ${STATE_LABELS[saved.predictedState].toLowerCase()}` : ''}. <AgreementMark agrees={saved.agrees} />
          </p>
        </Notice>
        <AttachmentPanel observationId={saved.id} />
        <div>
          <Button
            variant="secondary"
            onClick={() => {
              setSaved(null);
              reset(blank());
              setRound((n) => n + 1);
            }}
          >
            Record another outcome
          </Button>
        </div>
      </div>
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-label="Record an outcome" className="flex flex-col gap-4">
      {problem && <Notice tone="error">{problem}</Notice>}
      <RecipeChooser key={round} programmeId={programmeId} control={control} />
      <div className="grid gap-4 md:grid-cols-4">
        <Field label="Mixed on" error={formState.errors.mixedAt?.message}>
          {(props) => <TextInput {...props} type="date" {...register('mixedAt')} />}
        </Field>
        <Field label="Age when observed (days)" error={formState.errors.ageDays?.message}>
          {(props) => <TextInput {...props} type="number" min={0} step="any" {...register('ageDays', { setValueAs: requiredNumber })} />}
        </Field>
        <Field label="Observed state" error={formState.errors.observedState?.message} hint={state ? <span className="text-ink-soft">{STATE_DESCRIPTIONS[state as keyof typeof STATE_DESCRIPTIONS]}</span> : undefined}>
          {(props) => (
            <SelectInput {...props} {...register('observedState')}>
              <option value="">Choose a state</option>
              <StateOptions states={OBSERVED_STATES} />
            </SelectInput>
          )}
        </Field>
        <Field label="Method" error={formState.errors.method?.message}>
          {(props) => (
            <SelectInput {...props} {...register('method')}>
              {OBSERVATION_METHODS.map((m) => (
                <option key={m} value={m}>
                  {METHOD_LABELS[m]}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
      </div>
      <fieldset className="grid gap-4 md:grid-cols-4">
        <legend className="mb-2 text-sm font-medium text-ink-soft">Measured values, if any</legend>
        <Field label="Storage modulus G′ (Pa)" error={formState.errors.storageModulusPa?.message}>
          {(props) => <TextInput {...props} type="number" min={0} step="any" {...register('storageModulusPa', { setValueAs: optionalNumber })} />}
        </Field>
        <Field label="Yield stress (Pa)" error={formState.errors.yieldStressPa?.message}>
          {(props) => <TextInput {...props} type="number" min={0} step="any" {...register('yieldStressPa', { setValueAs: optionalNumber })} />}
        </Field>
        <Field label="Settled height (% of fill)" error={formState.errors.settledHeightPct?.message}>
          {(props) => <TextInput {...props} type="number" min={0} max={100} step="any" {...register('settledHeightPct', { setValueAs: optionalNumber })} />}
        </Field>
        <Field
          label="Sample height (mm)"
          error={formState.errors.sampleHeightMm?.message}
          hint={<span className="text-ink-soft">Fill height in the vial; shelf life uses the latest given for the sample.</span>}
        >
          {(props) => <TextInput {...props} type="number" min={1} max={1000} step="any" {...register('sampleHeightMm', { setValueAs: optionalNumber })} />}
        </Field>
      </fieldset>
      <Field label="Notes" error={formState.errors.notes?.message}>
        {(props) => <TextArea {...props} {...register('notes')} />}
      </Field>
      <div>
        <Button type="submit" busy={create.isPending}>
          Save the outcome
        </Button>
      </div>
    </form>
  );
}
