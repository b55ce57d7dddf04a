import { z } from 'zod';
import { LIMITS } from '../limits';
import { OBSERVATION_METHODS, OBSERVED_STATES } from '../states';
import { decimalId, boundedNumber, idSchema, optionalText, pageQuerySchema } from './common';

const isoDate = z
  .string({ error: 'Mixing date is required' })
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})?)?$/, 'Mixing date must be a date such as 2026-03-14')
  .refine((v) => !Number.isNaN(Date.parse(v)), 'Mixing date is not a real date');

/** A composition recorded without a recipe: where it sits on the map, given directly. */
export const adhocCompositionSchema = z.object({
  programmeId: idSchema('Programme'),
  phi: boundedNumber('Volume fraction', 0.0001, 0.74, ''),
  reducedB2: boundedNumber('Reduced second virial coefficient B2*', -1000, 1, ''),
  description: optionalText('Composition description', 300),
});

export const observationFields = {
  mixedAt: isoDate,
  ageDays: boundedNumber('Age at observation', 0, 36_500, 'days'),
  observedState: z.enum(OBSERVED_STATES, { error: `observedState must be one of ${OBSERVED_STATES.join(', ')}` }),
  method: z.enum(OBSERVATION_METHODS, { error: `method must be one of ${OBSERVATION_METHODS.join(', ')}` }),
  storageModulusPa: boundedNumber('Storage modulus', 0, 1e10, 'Pa').nullable().optional(),
  yieldStressPa: boundedNumber('Yield stress', 0, 1e8, 'Pa').nullable().optional(),
  settledHeightPct: boundedNumber('Settled height', 0, 100, '%').nullable().optional(),
  /** Fill height of the sample in its vial or tube; the shelf-life model reads it (docs/shelf-life.md). */
  sampleHeightMm: boundedNumber('Sample height', 1, 1000, 'mm').nullable().optional(),
  notes: optionalText('Notes', LIMITS.notesLength),
};

export const observationInputSchema = z
  .object({
    recipeId: idSchema('Recipe').optional(),
    adhoc: adhocCompositionSchema.optional(),
    ...observationFields,
  })
  .strict()
  .refine((v) => (v.recipeId === undefined) !== (v.adhoc === undefined), {
    path: ['recipeId'],
    message: 'Give either a recipe or an ad-hoc composition, not both',
  });
export type ObservationInput = z.infer<typeof observationInputSchema>;

export const observationListQuerySchema = pageQuerySchema.extend({
  programme: decimalId('programme').optional(),
  recipe: decimalId('recipe').optional(),
  state: z.enum(OBSERVED_STATES).optional(),
  method: z.enum(OBSERVATION_METHODS).optional(),
  disagreeing: z.enum(['true', 'false']).optional(),
  minAgeDays: z.coerce.number().min(0).optional(),
  maxAgeDays: z.coerce.number().min(0).optional(),
  archived: z.enum(['true', 'false', 'all']).default('false'),
});
export type ObservationListQuery = z.infer<typeof observationListQuerySchema>;

/**
 * Columns of an observation import, in our own words. One row per observation of a recipe
 * given by its code. Blank optional cells mean "not measured".
 */
export const IMPORT_COLUMNS = [
  'recipe_code',
  'mixed_on',
  'age_days',
  'observed_state',
  'method',
  'storage_modulus_pa',
  'yield_stress_pa',
  'settled_height_pct',
  'sample_height_mm',
  'notes',
] as const;
export const REQUIRED_IMPORT_COLUMNS = ['recipe_code', 'mixed_on', 'age_days', 'observed_state', 'method'] as const;
export const IMPORT_MAX_ROWS = 5000;
