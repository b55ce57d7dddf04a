import { queryOptions, useQuery } from '@tanstack/react-query';
import { LIMITS } from '@shared/limits';
import type { ShortlistView } from '@shared/views/shortlist';
import type { Page } from '@shared/views/page';
import { api } from '@/lib/api-client';

/** A programme's draft shortlists, which a plan's recipes may be added to. */
export const draftShortlistsQueryOptions = (programmeId: number) =>
  queryOptions({
    queryKey: ['shortlists', 'list', { programme: programmeId, status: 'draft', for: 'plans' }] as const,
    queryFn: async () => (await api.get<Page<ShortlistView>>(`/api/shortlists?programme=${programmeId}&status=draft&pageSize=${LIMITS.pageSizeMax}`)).items,
  });

export const useDraftShortlists = (programmeId: number) => useQuery(draftShortlistsQueryOptions(programmeId));
