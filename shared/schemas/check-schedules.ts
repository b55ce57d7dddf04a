import { z } from 'zod';
import { decimalId } from './common';

/** Limits of a check schedule: ages in whole days after mixing. */
export const CHECK_SCHEDULE_LIMITS = { maxAges: 20, minAgeDays: 1, maxAgeDays: 3650 } as const;

/** A typical ageing schedule, offered as the form's suggestion (roughly doubling intervals; common bench practice). */
export const SUGGESTED_CHECK_AGES = [1, 3, 7, 14, 28, 56] as const;

const checkAge = z
  .number({ error: 'Each check age must be a number of days' })
  .int('Each check age must be a whole number of days')
  .min(CHECK_SCHEDULE_LIMITS.minAgeDays, `Each check age must be at least ${CHECK_SCHEDULE_LIMITS.minAgeDays} day`)
  .max(CHECK_SCHEDULE_LIMITS.maxAgeDays, `Each check age must be at most ${CHECK_SCHEDULE_LIMITS.maxAgeDays} days`);

/**
 * PUT /api/recipes/:id/check-schedule: the ages (days after mixing) at which each sample of the
 * recipe is checked, strictly increasing. An empty list removes the schedule.
 */
export const checkScheduleInputSchema = z
  .object({
    agesDays: z
      .array(checkAge, { error: 'agesDays must be a list of ages in days, such as [1, 3, 7, 14, 28, 56]' })
      .max(CHECK_SCHEDULE_LIMITS.maxAges, `A schedule holds at most ${CHECK_SCHEDULE_LIMITS.maxAges} check ages`)
      .refine((ages) => ages.every((age, i) => i === 0 || age > ages[i - 1]), 'Check ages must increase from one to the next, each age once'),
  })
  .strict();
export type CheckScheduleInput = z.infer<typeof checkScheduleInputSchema>;

/** GET /api/due-checks: one programme's samples due for a check, most overdue first. */
export const dueChecksQuerySchema = z.object({
  programme: decimalId('programme'),
  limit: z.coerce.number({ error: 'limit must be a number' }).int('limit must be a whole number').min(1, 'limit must be at least 1').max(200, 'limit must be at most 200').default(50),
});
export type DueChecksQuery = z.infer<typeof dueChecksQuerySchema>;

/**
 * Check ages typed as text ("1, 3, 7, 14") → numbers for the schema; anything that is not a
 * number stays NaN so the schema names it.
 */
export function parseCheckAges(text: string): number[] {
  const parts = text.split(/[\s,;]+/).filter((part) => part !== '');
  return parts.map((part) => (/^[+-]?\d+(\.\d+)?$/.test(part) ? Number(part) : Number.NaN));
}
