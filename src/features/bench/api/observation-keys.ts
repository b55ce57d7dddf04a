import type { ObservationMethod, ObservedState } from '@shared/states';

/** The bench log's filters as the API takes them (see observationListQuerySchema). */
export interface ObservationFilters {
  programme: number;
  state?: ObservedState;
  method?: ObservationMethod;
  disagreeing?: 'true';
  minAgeDays?: number;
  maxAgeDays?: number;
}

export const observationKeys = {
  all: ['observations'] as const,
  lists: () => [...observationKeys.all, 'list'] as const,
  list: (filters: ObservationFilters & { page: number; pageSize: number }) => [...observationKeys.lists(), filters] as const,
  details: () => [...observationKeys.all, 'detail'] as const,
  detail: (id: number) => [...observationKeys.details(), id] as const,
};
