import { queryOptions, useQuery } from '@tanstack/react-query';
import { decodeMapObservations, decodeMapRecipes, type MapObservation, type MapPoints, type MapRecipe } from '@shared/views/map-points';
import { api } from '@/lib/api-client';

/** Query keys of the map overlay (GET /api/map-points), one list per programme. */
export const mapPointKeys = {
  all: ['map-points'] as const,
  lists: () => [...mapPointKeys.all, 'list'] as const,
  list: (programmeId: number) => [...mapPointKeys.lists(), { programme: programmeId }] as const,
};

/** A programme's overlay as records: its recipes, and its observations with their recipe's coordinates, prediction and agreement. */
export interface MapOverlay {
  programmeId: number;
  recipes: MapRecipe[];
  observations: MapObservation[];
}

/** Columns and rows to records, once per answer (the query's `select`, kept while the answer is the same). */
export function decodeOverlay(data: MapPoints): MapOverlay {
  const recipes = decodeMapRecipes(data);
  return { programmeId: data.programmeId, recipes, observations: decodeMapObservations(data, recipes) };
}

export const mapPointsQueryOptions = (programmeId: number) =>
  queryOptions({ queryKey: mapPointKeys.list(programmeId), queryFn: () => api.get<MapPoints>(`/api/map-points?programme=${programmeId}`), select: decodeOverlay });

export const useMapPoints = (programmeId: number | undefined) => useQuery({ ...mapPointsQueryOptions(programmeId ?? 0), enabled: programmeId !== undefined });
