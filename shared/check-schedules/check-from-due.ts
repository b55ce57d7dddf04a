import type { ObservationInput } from '../schemas/observations';
import type { DueCheckView } from '../views/check-schedules';

/** The two one-click answers to a due check. */
export type DueCheckAnswer = 'standing' | 'collapsed';

/**
 * The bench record a one-click answer to a due check makes: the same sample (recipe and the
 * stored mixing date), today's age, and either the state of its last check ("still standing")
 * or 'collapsed'; by eye ('visual'), since a one-click look measures nothing; the sample's fill
 * height carried forward from its checks when one was recorded (the same vial, so the same height,
 * and the shelf-life model reads it per sample). The Idempotency-Key
 * is built from the sample, the age and the answer, so a double click or a retry after a lost
 * answer cannot record the same look twice (keys are per user: the same user gets the first
 * answer back).
 * @example checkFromDue({ recipeId: 7, mixedAt: '2026-06-01T00:00:00.000Z', ageTodayDays: 15,
 *   lastCheck: { observationId: 3, ageDays: 7, observedState: 'gel' }, sampleHeightMm: 45, … }, 'standing')
 *   // { input: { recipeId: 7, mixedAt: '2026-06-01T00:00:00.000Z', ageDays: 15, observedState: 'gel', method: 'visual', sampleHeightMm: 45 },
 *   //   idempotencyKey: 'due-check:7:2026-06-01T00:00:00.000Z:15:standing' }
 */
export function checkFromDue(due: Pick<DueCheckView, 'recipeId' | 'mixedAt' | 'ageTodayDays' | 'lastCheck' | 'sampleHeightMm'>, answer: DueCheckAnswer): { input: ObservationInput; idempotencyKey: string } {
  return {
    input: {
      recipeId: due.recipeId,
      mixedAt: due.mixedAt,
      ageDays: due.ageTodayDays,
      observedState: answer === 'collapsed' ? 'collapsed' : due.lastCheck.observedState,
      method: 'visual',
      ...(due.sampleHeightMm === null ? {} : { sampleHeightMm: due.sampleHeightMm }),
    },
    idempotencyKey: `due-check:${due.recipeId}:${due.mixedAt}:${due.ageTodayDays}:${answer}`,
  };
}
