import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProgrammeView } from '@shared/views/programme';
import { api } from '@/lib/api-client';
import { programmeKeys } from './programme-keys';

export const getProgramme = (id: number) => api.get<{ programme: ProgrammeView }>(`/api/programmes/${id}`);

export const programmeQueryOptions = (id: number) =>
  queryOptions({ queryKey: programmeKeys.detail(id), queryFn: () => getProgramme(id), select: (data) => data.programme });

export const useProgramme = (id: number | null) => useQuery({ ...programmeQueryOptions(id ?? 0), enabled: id !== null });
