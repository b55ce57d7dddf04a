import { z } from 'zod';
import { LIMITS } from '../limits';
import { GOAL_STATES } from '../states';
import { decimalId, boundedNumber, idSchema, optionalPrice, optionalText, pageQuerySchema, requiredText } from './common';

/** Most candidates and next experiments one plan lists. */
export const PLAN_LIMITS = { candidates: 30, experiments: 12, defaultCandidates: 10, defaultExperiments: 4 } as const;

/** A range [from, to] of one composition axis; `to` must lie above `from`. */
const rangeOf = (label: string, min: number, max: number, unit: string) =>
  z
    .object({ min: boundedNumber(`${label} (from)`, min, max, unit), max: boundedNumber(`${label} (to)`, min, max, unit) }, { error: `${label} must be a range { min, max }` })
    .strict()
    .refine((r) => r.max > r.min, { path: ['max'], message: `${label}: the upper end must be above the lower end` });

const weight = (label: string) => boundedNumber(`${label} weight`, 0, 1, '');

/** What a planner run asks for: materials, target, ranges, the smallest margin, how many. */
export const planInputSchema = z
  .object({
    programmeId: idSchema('Programme'),
    title: optionalText('Title', LIMITS.nameLength),
    particleId: idSchema('Particle system'),
    solventId: idSchema('Solvent'),
    temperatureC: boundedNumber('Temperature', -20, 150, '°C'),
    attraction: z.discriminatedUnion(
      'source',
      [
        z.object({ source: z.literal('depletion'), depletantId: idSchema('Depletant'), concentrationGL: rangeOf('Polymer concentration', 0, 1000, 'g/L') }).strict(),
        z.object({ source: z.literal('salt'), saltId: idSchema('Salt'), concentrationMM: rangeOf('Salt concentration', 0, 5000, 'mM') }).strict(),
      ],
      { error: 'attraction.source must be depletion or salt' },
    ),
    phi: rangeOf('Volume fraction φ', 0.005, 0.7, ''),
    targetState: z.enum(GOAL_STATES, { error: `targetState must be one of ${GOAL_STATES.join(', ')}` }),
    minMargin: boundedNumber('Smallest margin', 0, 2, '(map units)'),
    candidateCount: z.number({ error: 'candidateCount must be a number' }).int('candidateCount must be a whole number').min(1, 'candidateCount must be at least 1').max(PLAN_LIMITS.candidates, `candidateCount must be at most ${PLAN_LIMITS.candidates}`).default(PLAN_LIMITS.defaultCandidates),
    experimentCount: z.number({ error: 'experimentCount must be a number' }).int('experimentCount must be a whole number').min(0, 'experimentCount must be at least 0').max(PLAN_LIMITS.experiments, `experimentCount must be at most ${PLAN_LIMITS.experiments}`).default(PLAN_LIMITS.defaultExperiments),
    /** Price per kg for this plan only; an absent one comes from the library. */
    prices: z.object({ particles: optionalPrice, solvent: optionalPrice, depletant: optionalPrice, salt: optionalPrice }).strict().optional(),
    /** "Stays a gel for at least N days": judged with the programme's shelf-life model (shared/shelf-life). */
    minShelfLifeDays: z.number({ error: 'minShelfLifeDays must be a number of days' }).int('minShelfLifeDays must be a whole number of days').min(1, 'minShelfLifeDays must be at least 1 day').max(3650, 'minShelfLifeDays must be at most 3650 days').optional(),
    ranking: z
      .object({ margin: weight('Margin'), cost: weight('Cost'), evidence: weight('Evidence') })
      .strict()
      .refine((w) => w.margin + w.cost + w.evidence > 0, { path: ['margin'], message: 'At least one ranking weight must be above 0' })
      .optional(),
  })
  .strict();
export type PlanInput = z.input<typeof planInputSchema>;
export type PlanRequest = z.output<typeof planInputSchema>;

const indices = (label: string, max: number) =>
  z
    .array(z.number({ error: `${label} must be numbers` }).int(`${label} must be whole numbers`).min(0, `${label} start at 0`), { error: `${label} must be a list` })
    .min(1, `Choose at least one of the ${label}`)
    .max(max, `At most ${max} ${label} at once`)
    .refine((list) => new Set(list).size === list.length, `The same one appears twice in ${label}`);

/** Turn chosen candidates into recipes, optionally onto a new or an existing draft shortlist. */
export const planRecipesSchema = z
  .object({
    candidates: indices('candidates', PLAN_LIMITS.candidates),
    shortlist: z
      .discriminatedUnion(
        'mode',
        [
          z.object({ mode: z.literal('new'), title: requiredText('Shortlist title', LIMITS.nameLength), purpose: optionalText('Purpose', LIMITS.notesLength) }).strict(),
          z.object({ mode: z.literal('existing'), shortlistId: idSchema('Shortlist') }).strict(),
        ],
        { error: 'shortlist.mode must be new or existing' },
      )
      .optional(),
  })
  .strict();
export type PlanRecipesInput = z.infer<typeof planRecipesSchema>;

/** Send proposed experiments to the bench as draft recipes, with a note for whoever mixes them. */
export const planExperimentRecipesSchema = z
  .object({
    experiments: indices('experiments', PLAN_LIMITS.experiments),
    note: optionalText('Note', 1000),
  })
  .strict();
export type PlanExperimentRecipesInput = z.infer<typeof planExperimentRecipesSchema>;

export const planListQuerySchema = pageQuerySchema.extend({
  programme: decimalId('programme'),
});
export type PlanListQuery = z.infer<typeof planListQuerySchema>;
