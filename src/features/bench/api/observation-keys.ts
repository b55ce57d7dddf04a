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

/** Any page of GET /api/observations: the bench log's filters, or one recipe's outcomes. */
export type ObservationListQuery = Partial<ObservationFilters> & { recipe?: number; page?: number; pageSize?: number };

/**
 * Query keys of observations, the one factory for them: the bench log, a recipe's timeline and
 * its newest outcomes (Find, shortlists) are all lists under `observationKeys.lists()`, so
 * recording an outcome anywhere refreshes every one of them.
 */
export const observationKeys = {
  all: ['observations'] as const,
  lists: () => [...observationKeys.all, 'list'] as const,
  list: (query: ObservationListQuery) => [...observationKeys.lists(), query] as const,
  details: () => [...observationKeys.all, 'detail'] as const,
  detail: (id: number) => [...observationKeys.details(), id] as const,
};
