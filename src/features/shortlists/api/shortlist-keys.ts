import type { ShortlistStatus } from '@shared/states';

export type ShortlistFilters = { programme: number; status?: ShortlistStatus };

export const shortlistKeys = {
  all: ['shortlists'] as const,
  lists: () => [...shortlistKeys.all, 'list'] as const,
  list: (filters: ShortlistFilters) => [...shortlistKeys.lists(), filters] as const,
  details: () => [...shortlistKeys.all, 'detail'] as const,
  detail: (id: number) => [...shortlistKeys.details(), id] as const,
};
