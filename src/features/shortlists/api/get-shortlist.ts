import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { shortlistKeys } from './shortlist-keys';

export const getShortlist = (id: number) => api.get<{ shortlist: ShortlistView }>(`/api/shortlists/${id}`);

export const shortlistQueryOptions = (id: number) =>
  queryOptions({ queryKey: shortlistKeys.detail(id), queryFn: () => getShortlist(id), select: (data) => data.shortlist });

export const useShortlist = (id: number) => useQuery(shortlistQueryOptions(id));
