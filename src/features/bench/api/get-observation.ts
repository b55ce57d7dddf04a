import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ObservationView } from '@shared/views/observation';
import { api } from '@/lib/api-client';
import { observationKeys } from './observation-keys';

export const getObservation = (id: number) => api.get<{ observation: ObservationView }>(`/api/observations/${id}`);

export const observationQueryOptions = (id: number) =>
  queryOptions({ queryKey: observationKeys.detail(id), queryFn: () => getObservation(id), select: (data) => data.observation });

export const useObservation = (id: number | null) => useQuery({ ...observationQueryOptions(id ?? 0), enabled: id !== null });
