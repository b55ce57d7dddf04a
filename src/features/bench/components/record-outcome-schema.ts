import { z } from 'zod';
import { observationFields } from '@shared/schemas/observations';
import { OBSERVATION_METHODS, OBSERVED_STATES } from '@shared/states';

/**
 * The form's schema: the shared observation fields for an outcome of a recipe (the server's
 * observationInputSchema also takes ad-hoc compositions; this form records recipes only),
 * with messages that speak to the person filling it in.
 */
export const recordOutcomeSchema = z
  .object({
    ...observationFields,
    recipeId: z.number({ error: 'Choose the recipe you observed' }).int().positive('Choose the recipe you observed'),
    observedState: z.enum(OBSERVED_STATES, { error: 'Choose the state you observed' }),
    method: z.enum(OBSERVATION_METHODS, { error: 'Choose how you observed it' }),
  })
  .strict();

export type RecordOutcomeValues = z.input<typeof recordOutcomeSchema>;
export type RecordOutcomeInput = z.output<typeof recordOutcomeSchema>;

/** Today as YYYY-MM-DD in the bench's own time zone (what a date box shows). */
export function todayLocal(): string {
  const now = new Date();
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
