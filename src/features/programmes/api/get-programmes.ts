import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProgrammeView } from '@shared/views/programme';
import { api, toQuery } from '@/lib/api-client';
import { programmeKeys } from './programme-keys';

export type ProgrammeFilters = { archived?: 'true' | 'false' | 'all' };

/** Programmes sorted by name, live ones only unless asked; each with its recipe and observation counts. */
export const getProgrammes = (filters: ProgrammeFilters = {}) => api.get<{ items: ProgrammeView[] }>(`/api/programmes${toQuery(filters)}`);

export const programmesQueryOptions = (filters: ProgrammeFilters = {}) =>
  queryOptions({ queryKey: programmeKeys.list(filters), queryFn: () => getProgrammes(filters), staleTime: 60_000 });

export const useProgrammes = (filters: ProgrammeFilters = {}) => useQuery(programmesQueryOptions(filters));
