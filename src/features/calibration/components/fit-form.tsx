import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { MIN_IN_BAND, MIN_PER_SIDE } from '@shared/calibration/calibration-readiness';
import { calibrationFitSchema, CALIBRATION_FOLDS } from '@shared/schemas/calibrations';
import type { CalibrationView } from '@shared/views/calibration';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { SelectInput, TextArea } from '@/components/ui/inputs';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { placeServerError } from '@/lib/form-errors';
import { useFitCalibration } from '../api/fit-calibration';

/** The form's own fields, turned into the API's body and checked with the shared schema. */
const formSchema = z
  .object({ fitThreshold: z.boolean(), folds: z.coerce.number(), note: z.string() })
  .transform((v): z.input<typeof calibrationFitSchema> => ({ parameters: v.fitThreshold ? ['attractionShift', 'gelB2Threshold'] : ['attractionShift'], folds: v.folds, note: v.note }))
  .pipe(calibrationFitSchema);

const FOLD_CHOICES = [5, 10, CALIBRATION_FOLDS.min];

/** "Fit to the bench": what to fit and how to check it; the fit is kept as a proposal. */
export function FitForm({ programmeId, onFitted }: { programmeId: number; onFitted: (calibration: CalibrationView) => void }) {
  const fit = useFitCalibration(programmeId);
  const [problem, setProblem] = useState<{ tone: 'warning' | 'error'; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof formSchema>, unknown, z.output<typeof formSchema>>({
    resolver: zodResolver(formSchema),
    defaultValues: { fitThreshold: true, folds: CALIBRATION_FOLDS.default, note: '' },
  });
  const submit = handleSubmit(async (values) => {
    setProblem(null);
    try {
      const { calibration } = await fit.mutateAsync(values);
      onFitted(calibration);
    } catch (error) {
      // A refused fit is not a fault: it says what the bench still needs.
      if (error instanceof ApiError && error.status === 422) setProblem({ tone: 'warning', text: error.message });
      else {
        const text = placeServerError(error, setError, ['folds', 'note']);
        if (text) setProblem({ tone: 'error', text });
      }
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Fit to the bench" className="flex flex-col gap-3 text-sm">
      <p className="text-ink-soft">
        Uses the programme's bench observations: gel and collapsed gels on one side, fluid, phase-separated, crystal and glass on the other; unclear ones are left out. A fit needs at least {MIN_PER_SIDE} on each side.
      </p>
      <label className="flex items-start gap-2">
        <input type="checkbox" className="mt-0.5 h-4 w-4 accent-fjord-500" {...register('fitThreshold')} />
        <span>
          Fit the gel threshold as well as the attraction shift
          <span className="block text-xs text-ink-faint">Needs at least {MIN_IN_BAND} observations inside the binodal but outside the spinodal, where the threshold decides between gel and separated.</span>
        </span>
      </label>
      <Field label="Cross-validation folds" className="w-56" error={formState.errors.folds?.message}>
        {(props) => (
          <SelectInput {...props} {...register('folds')}>
            {FOLD_CHOICES.map((folds) => (
              <option key={folds} value={folds}>
                {folds} folds
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <Field label="Note (optional)" error={formState.errors.note?.message}>
        {(props) => <TextArea {...props} rows={2} {...register('note')} />}
      </Field>
      {problem && <Notice tone={problem.tone} title={problem.tone === 'warning' ? 'Not enough to fit yet' : undefined}>{problem.text}</Notice>}
      <div>
        <Button type="submit" busy={fit.isPending}>
          Fit to the bench
        </Button>
      </div>
    </form>
  );
}
