import { z } from 'zod';
import { ATTRACTION_SOURCES, GOAL_STATES } from '../states';
import { LIMITS } from '../limits';
import { optionalText, requiredText } from './common';

export const programmeInputSchema = z
  .object({
    name: requiredText('Name', LIMITS.nameLength),
    goalState: z.enum(GOAL_STATES, { error: `goalState must be one of ${GOAL_STATES.join(', ')}` }),
    attractionSource: z.enum(ATTRACTION_SOURCES, { error: `attractionSource must be one of ${ATTRACTION_SOURCES.join(', ')}` }),
    codePrefix: z
      .string({ error: 'Code prefix is required' })
      .trim()
      .toUpperCase()
      .regex(/^[A-Z]{2,5}$/, 'Code prefix must be 2 to 5 letters'),
    notes: optionalText('Notes', LIMITS.notesLength),
  })
  .strict();
export type ProgrammeInput = z.infer<typeof programmeInputSchema>;

export const programmeUpdateSchema = programmeInputSchema.omit({ codePrefix: true }).partial().strict();
export type ProgrammeUpdate = z.infer<typeof programmeUpdateSchema>;
