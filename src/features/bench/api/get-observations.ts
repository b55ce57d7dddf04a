import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ObservationView } from '@shared/views/observation';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';
import { observationKeys, type ObservationFilters } from './observation-keys';

export const BENCH_PAGE_SIZE = 25;

type Query = ObservationFilters & { page: number; pageSize: number };

export const getObservations = (query: Query) => api.get<Page<ObservationView>>(`/api/observations${toQuery({ ...query })}`);

export const observationsQueryOptions = (filters: ObservationFilters, page: number) => {
  const query: Query = { ...filters, page, pageSize: BENCH_PAGE_SIZE };
  return queryOptions({ queryKey: observationKeys.list(query), queryFn: () => getObservations(query), placeholderData: keepPreviousData });
};

export const useObservations = (filters: ObservationFilters, page: number) => useQuery(observationsQueryOptions(filters, page));
