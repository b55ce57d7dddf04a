import { z } from 'zod';
import { LIMITS } from '../limits';
import { PREDICTED_STATES } from '../states';
import { decimalId, boundedNumber, idSchema, optionalText, pageQuerySchema, requiredText } from './common';

/** What makes the particles stick, one source per recipe. */
export const recipeAttractionSchema = z.discriminatedUnion(
  'source',
  [
    z.object({
      source: z.literal('depletion'),
      depletantId: idSchema('Depletant'),
      /** Polymer concentration in grams per litre of solvent (the free volume around the particles). */
      concentrationGL: boundedNumber('Depletant concentration', 0, 1000, 'g/L'),
    }),
    z.object({
      source: z.literal('salt'),
      saltId: idSchema('Salt'),
      concentrationMM: boundedNumber('Salt concentration', 0, 5000, 'mM'),
    }),
    z.object({
      source: z.literal('direct'),
      /** Depth of the contact attraction in kT (positive = attractive). */
      contactEnergyKT: boundedNumber('Contact attraction', 0, 50, 'kT'),
      /** Width of the attraction as a fraction of the particle diameter (square well λ = 1 + width). */
      rangeSigma: boundedNumber('Attraction range', 0.005, 1, 'σ'),
    }),
    z.object({ source: z.literal('none') }),
  ],
  { error: 'attraction.source must be depletion, salt, direct or none' },
);
export type RecipeAttraction = z.infer<typeof recipeAttractionSchema>;

export const recipeInputSchema = z
  .object({
    programmeId: idSchema('Programme'),
    name: requiredText('Name', LIMITS.nameLength),
    particleId: idSchema('Particle system'),
    solventId: idSchema('Solvent'),
    fraction: z.object({
      kind: z.enum(['mass', 'volume'], { error: 'fraction.kind must be mass or volume' }),
      value: boundedNumber('Particle fraction', 0.0001, 0.74, ''),
    }),
    temperatureC: boundedNumber('Temperature', -20, 150, '°C'),
    attraction: recipeAttractionSchema,
    notes: optionalText('Notes', LIMITS.notesLength),
  })
  .strict();
export type RecipeInput = z.infer<typeof recipeInputSchema>;

export const RECIPE_SORTS = ['code', 'name', 'phi', 'margin', 'updatedAt', 'predictedState'] as const;

export const recipeListQuerySchema = pageQuerySchema.extend({
  programme: decimalId('programme').optional(),
  state: z.enum(PREDICTED_STATES).optional(),
  q: z.string().trim().max(120).optional(),
  archived: z.enum(['true', 'false', 'all']).default('false'),
  sort: z.enum(RECIPE_SORTS).default('code'),
  order: z.enum(['asc', 'desc']).default('asc'),
});
export type RecipeListQuery = z.infer<typeof recipeListQuerySchema>;
