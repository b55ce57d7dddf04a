import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ObservationView } from '@shared/views/observation';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';

const PAGE_SIZE = 50;

/** Under the observations family, so an outcome recorded on the bench refreshes the evidence here. */
export const recipeObservationKeys = {
  list: (recipe: number) => ['observations', 'list', { recipe, page: 1, pageSize: PAGE_SIZE }] as const,
};

/** The newest outcomes the bench recorded for one recipe: the evidence beside a shortlisted recipe. */
export const getRecipeObservations = (recipe: number) => api.get<Page<ObservationView>>(`/api/observations${toQuery({ recipe, page: 1, pageSize: PAGE_SIZE })}`);

export const recipeObservationsQueryOptions = (recipe: number) => queryOptions({ queryKey: recipeObservationKeys.list(recipe), queryFn: () => getRecipeObservations(recipe) });

export const useRecipeObservations = (recipe: number) => useQuery(recipeObservationsQueryOptions(recipe));
