import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MapPoints } from '@shared/views/map-points';
import { api } from '@/lib/api-client';

export const mapPointKeys = {
  all: ['map-points'] as const,
  programme: (id: number) => [...mapPointKeys.all, id] as const,
};

export const mapPointsQueryOptions = (programmeId: number) =>
  queryOptions({ queryKey: mapPointKeys.programme(programmeId), queryFn: () => api.get<MapPoints>(`/api/map-points?programme=${programmeId}`) });

export const useMapPoints = (programmeId: number | undefined) => useQuery({ ...mapPointsQueryOptions(programmeId ?? 0), enabled: programmeId !== undefined });
