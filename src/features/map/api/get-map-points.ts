import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MapPoints } from '@shared/views/map-points';
import { api } from '@/lib/api-client';

/** Query keys of the map overlay (GET /api/map-points), one list per programme. */
export const mapPointKeys = {
  all: ['map-points'] as const,
  lists: () => [...mapPointKeys.all, 'list'] as const,
  list: (programmeId: number) => [...mapPointKeys.lists(), { programme: programmeId }] as const,
};

export const mapPointsQueryOptions = (programmeId: number) =>
  queryOptions({ queryKey: mapPointKeys.list(programmeId), queryFn: () => api.get<MapPoints>(`/api/map-points?programme=${programmeId}`) });

export const useMapPoints = (programmeId: number | undefined) => useQuery({ ...mapPointsQueryOptions(programmeId ?? 0), enabled: programmeId !== undefined });
