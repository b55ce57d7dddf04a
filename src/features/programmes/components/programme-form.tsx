import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { programmeInputSchema } from '@shared/schemas/programmes';
import { ATTRACTION_SOURCES, GOAL_STATES } from '@shared/states';
import type { ProgrammeView } from '@shared/views/programme';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextArea, TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { placeServerError } from '@/lib/form-errors';
import { useCreateProgramme } from '../api/create-programme';
import { ATTRACTION_SOURCE_LABELS } from './attraction-source-labels';
import { StateOptions } from '@/components/ui/state-options';

const FIELDS = ['name', 'goalState', 'attractionSource', 'codePrefix', 'notes'] as const;

/** Starts a programme; for the roles with `programmes.write`. */
export function ProgrammeForm({ onCreated }: { onCreated?: (programme: ProgrammeView) => void }) {
  const create = useCreateProgramme();
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof programmeInputSchema>, unknown, z.output<typeof programmeInputSchema>>({
    resolver: zodResolver(programmeInputSchema),
    defaultValues: { name: '', goalState: 'gel', attractionSource: 'depletion', codePrefix: '', notes: '' },
  });
  const submit = handleSubmit(async (values) => {
    setProblem(null);
    try {
      const { programme } = await create.mutateAsync(values);
      onCreated?.(programme);
    } catch (error) {
      setProblem(placeServerError(error, setError, FIELDS));
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Start a programme" className="grid gap-4 md:grid-cols-2">
      {problem && <Notice tone="error" className="md:col-span-2">{problem}</Notice>}
      <Field label="Name" error={formState.errors.name?.message}>
        {(props) => <TextInput {...props} {...register('name')} />}
      </Field>
      <Field label="Code prefix" hint={<span className="text-ink-soft">2 to 5 letters; recipe codes start with it</span>} error={formState.errors.codePrefix?.message}>
        {(props) => <TextInput {...props} className="uppercase" {...register('codePrefix')} />}
      </Field>
      <Field label="Goal state" error={formState.errors.goalState?.message}>
        {(props) => (
          <SelectInput {...props} {...register('goalState')}>
            <StateOptions states={GOAL_STATES} />
          </SelectInput>
        )}
      </Field>
      <Field label="What makes the particles stick" error={formState.errors.attractionSource?.message}>
        {(props) => (
          <SelectInput {...props} {...register('attractionSource')}>
            {ATTRACTION_SOURCES.map((source) => (
              <option key={source} value={source}>
                {ATTRACTION_SOURCE_LABELS[source]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <Field label="Notes" className="md:col-span-2" error={formState.errors.notes?.message}>
        {(props) => <TextArea {...props} {...register('notes')} />}
      </Field>
      <div className="md:col-span-2">
        <Button type="submit" busy={create.isPending}>
          Start the programme
        </Button>
      </div>
    </form>
  );
}
