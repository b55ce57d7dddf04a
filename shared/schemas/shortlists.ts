import { z } from 'zod';
import { LIMITS } from '../limits';
import { GOAL_STATES, SHORTLIST_STATUSES } from '../states';
import { decimalId, idSchema, optionalText, pageQuerySchema, requiredText } from './common';

export const shortlistItemSchema = z.object({
  recipeId: idSchema('Recipe'),
  reason: requiredText('Reason', 1000),
});

export const shortlistInputSchema = z
  .object({
    programmeId: idSchema('Programme'),
    title: requiredText('Title', LIMITS.nameLength),
    purpose: optionalText('Purpose', LIMITS.notesLength),
    targetState: z.enum(GOAL_STATES, { error: `targetState must be one of ${GOAL_STATES.join(', ')}` }),
    items: z
      .array(shortlistItemSchema, { error: 'items must be a list' })
      .max(100, 'A shortlist holds at most 100 recipes')
      .refine((items) => new Set(items.map((i) => i.recipeId)).size === items.length, 'A recipe appears twice in the shortlist'),
  })
  .strict();
export type ShortlistInput = z.infer<typeof shortlistInputSchema>;

export const shortlistDecisionSchema = z
  .object({ comment: optionalText('Comment', LIMITS.commentLength) })
  .strict();
export const shortlistReturnSchema = z
  .object({ comment: requiredText('Comment', LIMITS.commentLength) })
  .strict();

export const shortlistListQuerySchema = pageQuerySchema.extend({
  programme: decimalId('programme').optional(),
  status: z.enum(SHORTLIST_STATUSES).optional(),
});
export type ShortlistListQuery = z.infer<typeof shortlistListQuerySchema>;
