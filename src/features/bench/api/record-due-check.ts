import { useMutation, useQueryClient } from '@tanstack/react-query';
import { checkFromDue, type DueCheckAnswer } from '@shared/check-schedules/check-from-due';
import type { DueCheckView } from '@shared/views/check-schedules';
import type { ObservationView } from '@shared/views/observation';
import { api } from '@/lib/api-client';
import { observationsChanged } from './observations-changed';

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
    onSuccess: (_answer, { programmeId }) => observationsChanged(queryClient, programmeId),
  });
}
