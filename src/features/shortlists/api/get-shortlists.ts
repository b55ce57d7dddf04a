import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShortlistView } from '@shared/views/shortlist';
import type { Page } from '@shared/views/page';
import { LIMITS } from '@shared/limits';
import { api, toQuery } from '@/lib/api-client';
import { shortlistKeys, type ShortlistFilters } from './shortlist-keys';

export type ShortlistSummary = ShortlistView & { itemCount: number };

/** A programme's live shortlists, most recently changed first (the largest page: a programme has tens, not thousands). */
export const getShortlists = (filters: ShortlistFilters) =>
  api.get<Page<ShortlistSummary>>(`/api/shortlists${toQuery({ ...filters, pageSize: LIMITS.pageSizeMax })}`);

export const shortlistsQueryOptions = (filters: ShortlistFilters) => queryOptions({ queryKey: shortlistKeys.list(filters), queryFn: () => getShortlists(filters) });

export const useShortlists = (filters: ShortlistFilters) => useQuery(shortlistsQueryOptions(filters));
