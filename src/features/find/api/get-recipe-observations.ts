import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ObservationView } from '@shared/views/observation';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';
import { findKeys } from './find-keys';

/** The newest 50 bench outcomes of one recipe; `total` counts them all. */
export const getRecipeObservations = (recipe: number) => api.get<Page<ObservationView>>(`/api/observations${toQuery({ recipe, page: 1, pageSize: 50 })}`);

export const recipeObservationsQueryOptions = (recipe: number) => queryOptions({ queryKey: findKeys.observations(recipe), queryFn: () => getRecipeObservations(recipe) });

export const useRecipeObservations = (recipe: number | null) => useQuery({ ...recipeObservationsQueryOptions(recipe ?? 0), enabled: recipe !== null });
