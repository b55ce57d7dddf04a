import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProgrammeShelfLifeView } from '@shared/views/shelf-life';
import { api } from '@/lib/api-client';
import { shelfLifeKeys } from './shelf-life-keys';

/**
 * The programme's shelf-life analysis, or one recipe's part of it (its own curve and its group;
 * regions and the model always cover the programme). Bench checks, recipe edits and calibrations
 * made on other screens change it, so it is re-read whenever a screen showing it opens (staleTime 0).
 */
export const programmeShelfLifeQueryOptions = (programmeId: number, recipeId: number | null = null) =>
  queryOptions({
    queryKey: shelfLifeKeys.focus(programmeId, recipeId),
    queryFn: () => api.get<ProgrammeShelfLifeView>(`/api/programmes/${programmeId}/shelf-life${recipeId === null ? '' : `?recipe=${recipeId}`}`),
    staleTime: 0,
  });

export const useProgrammeShelfLife = (programmeId: number | undefined, recipeId: number | null = null, enabled = true) =>
  useQuery({ ...programmeShelfLifeQueryOptions(programmeId ?? 0, recipeId), enabled: enabled && programmeId !== undefined });
