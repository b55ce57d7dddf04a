import { useMutation, useQueryClient } from '@tanstack/react-query';
import { checkFromDue, type DueCheckAnswer } from '@shared/check-schedules/check-from-due';
import type { DueCheckView } from '@shared/views/check-schedules';
import type { ObservationView } from '@shared/views/observation';
import { api } from '@/lib/api-client';
import { dueCheckKeys } from './due-check-keys';
import { observationKeys } from './observation-keys';

/**
 * Queries of other features that a new check changes, by their key prefixes (a feature does not
 * import another's key factory): the recipe page's checks (timeline, shelf life) and the map overlay.
 */
const recipeChecksKey = (recipeId: number) => ['recipes', 'observations', recipeId] as const;
const mapOverlayKey = (programmeId: number) => ['map-points', programmeId] as const;

/**
 * One-click answer to a due check: POST /api/observations with the record checkFromDue builds and
 * its Idempotency-Key, so a double click or a retry records the look once.
 */
export const recordDueCheck = ({ due, answer }: { due: DueCheckView; answer: DueCheckAnswer; programmeId: number }) => {
  const { input, idempotencyKey } = checkFromDue(due, answer);
  return api.post<{ observation: ObservationView }>('/api/observations', input, { 'Idempotency-Key': idempotencyKey });
};

export function useRecordDueCheck() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordDueCheck,
    onSuccess: (_answer, { due, programmeId }) =>
      Promise.all(
        [observationKeys.all, dueCheckKeys.all, recipeChecksKey(due.recipeId), mapOverlayKey(programmeId)].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      ),
  });
}
