import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { CHECK_SCHEDULE_LIMITS, SUGGESTED_CHECK_AGES, checkScheduleInputSchema, parseCheckAges } from '@shared/schemas/check-schedules';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { ErrorState, Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { placeServerError } from '@/lib/form-errors';
import { useCheckSchedule } from '../api/get-check-schedule';
import { useSetCheckSchedule } from '../api/set-check-schedule';

type FormValues = { ages: string };

/**
 * The recipe's check schedule: the ages (days after mixing) at which each of its samples is looked
 * at again. Samples past their next age appear under "Due checks" on the bench log. Those who
 * record bench outcomes may change it; everyone else reads it.
 */
export function CheckScheduleForm({ recipeId, canWrite }: { recipeId: number; canWrite: boolean }) {
  const schedule = useCheckSchedule(recipeId);
  const save = useSetCheckSchedule();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const { register, handleSubmit, setError, reset, formState } = useForm<FormValues>({ defaultValues: { ages: '' } });
  useEffect(() => {
    if (schedule.data) reset({ ages: schedule.data.agesDays.join(', ') });
  }, [schedule.data, reset]);

  const submit = handleSubmit(async ({ ages }) => {
    setFormError(null);
    setSaved(false);
    // The shared schema checks the typed ages, so the form and the server say the same thing.
    const parsed = checkScheduleInputSchema.safeParse({ agesDays: parseCheckAges(ages) });
    if (!parsed.success) {
      setError('ages', { type: 'schema', message: parsed.error.issues[0].message });
      return;
    }
    try {
      await save.mutateAsync({ recipeId, input: parsed.data });
      setSaved(true);
    } catch (error) {
      // The server names agesDays (or one of its entries); the form shows them under its one field.
      if (error instanceof ApiError && error.field?.startsWith('agesDays')) setError('ages', { type: 'server', message: error.message.replace(/^[\w.]+: /, '') });
      else setFormError(placeServerError(error, setError, []));
    }
  });

  if (schedule.isPending) return <Loading label="Loading the check schedule…" />;
  if (schedule.isError) return <ErrorState error={schedule.error} retry={() => schedule.refetch()} />;
  const current = schedule.data;
  const summary = current.agesDays.length === 0 ? 'No check schedule: no sample of this recipe is ever listed as due.' : `Each sample is checked at ${current.agesDays.join(', ')} days after mixing.`;
  return (
    <div className="flex flex-col gap-3 text-sm" data-testid="check-schedule">
      <p>
        {summary}
        {current.updatedBy && current.updatedAt && <span className="text-ink-soft"> Set by {current.updatedBy.name}, {formatDateTime(current.updatedAt)}.</span>}
      </p>
      {canWrite && (
        <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Check schedule">
          {formError && <Notice tone="error">{formError}</Notice>}
          {saved && !save.isPending && <Notice tone="success">Check schedule saved.</Notice>}
          <Field
            label="Check ages (days after mixing)"
            hint={`Whole days, increasing, up to ${CHECK_SCHEDULE_LIMITS.maxAges} of them, such as ${SUGGESTED_CHECK_AGES.join(', ')}. Leave empty to stop scheduling checks.`}
            error={formState.errors.ages?.message}
          >
            {(props) => <TextInput {...props} inputMode="numeric" placeholder={SUGGESTED_CHECK_AGES.join(', ')} {...register('ages')} />}
          </Field>
          <div>
            <Button type="submit" variant="secondary" busy={formState.isSubmitting}>
              Save check schedule
            </Button>
          </div>
        </form>
      )}
    </div>
  );
}
