import { z } from 'zod';
import { CALIBRATION_PARAMETERS } from '../calibration/types';
import { LIMITS } from '../limits';
import { decimalId, optionalText } from './common';

/** Cross-validation folds a fit may use (capped further by the smaller outcome count). */
export const CALIBRATION_FOLDS = { min: 2, max: 20, default: 5 } as const;

/** What to fit: the attraction shift always; the gel threshold too when listed. */
export const calibrationFitSchema = z
  .object({
    parameters: z
      .array(z.enum(CALIBRATION_PARAMETERS, { error: `parameters may list ${CALIBRATION_PARAMETERS.join(', ')}` }), { error: 'parameters must be a list' })
      .min(1, 'parameters must list at least attractionShift')
      .refine((list) => list.includes('attractionShift'), 'parameters must include attractionShift: the gel threshold is fitted together with the shift')
      .refine((list) => new Set(list).size === list.length, 'parameters lists a parameter twice')
      .default(['attractionShift', 'gelB2Threshold']),
    folds: z
      .number({ error: 'folds must be a number' })
      .int('folds must be a whole number')
      .min(CALIBRATION_FOLDS.min, `folds must be at least ${CALIBRATION_FOLDS.min}`)
      .max(CALIBRATION_FOLDS.max, `folds must be at most ${CALIBRATION_FOLDS.max}`)
      .default(CALIBRATION_FOLDS.default),
    note: optionalText('Note', LIMITS.commentLength),
  })
  .strict();
export type CalibrationFitInput = z.infer<typeof calibrationFitSchema>;

const positiveId = decimalId;

export const programmeIdParamSchema = z.object({ id: positiveId('id') });
export const calibrationParamSchema = z.object({ id: positiveId('id'), calibrationId: positiveId('calibrationId') });
