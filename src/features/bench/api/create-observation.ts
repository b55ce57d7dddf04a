import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ObservationInput } from '@shared/schemas/observations';
import type { ObservationView } from '@shared/views/observation';
import { api } from '@/lib/api-client';
import { dueCheckKeys } from './due-check-keys';
import { observationKeys } from './observation-keys';

export const createObservation = (input: ObservationInput) => api.post<{ observation: ObservationView }>('/api/observations', input);

export function useCreateObservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createObservation,
    onSuccess: ({ observation }) => {
      queryClient.setQueryData(observationKeys.detail(observation.id), { observation });
      // A new check can answer a due one, so the due list is asked again too.
      return Promise.all([observationKeys.lists(), dueCheckKeys.all].map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
  });
}
