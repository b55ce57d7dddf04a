import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ObservationInput } from '@shared/schemas/observations';
import type { ObservationView } from '@shared/views/observation';
import { api } from '@/lib/api-client';
import { observationKeys } from './observation-keys';
import { observationsChanged } from './observations-changed';

export const createObservation = (input: ObservationInput) => api.post<{ observation: ObservationView }>('/api/observations', input);

export function useCreateObservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createObservation,
    onSuccess: ({ observation }) => {
      queryClient.setQueryData(observationKeys.detail(observation.id), { observation });
      // A new check can answer a due one, and moves the map overlay and the shelf-life analysis.
      return observationsChanged(queryClient, observation.programmeId);
    },
  });
}
