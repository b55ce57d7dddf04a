import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ObservationView } from '@shared/views/observation';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';
import { observationKeys, type ObservationListQuery } from './observation-keys';

const getObservationPage = (query: ObservationListQuery) => api.get<Page<ObservationView>>(`/api/observations${toQuery({ ...query })}`);

const RECENT = { page: 1, pageSize: 50 } as const;
const EVERY = { pageSize: 200 } as const;

/** The newest 50 bench outcomes of one recipe; `total` counts them all (Find, a shortlisted recipe's evidence). */
export const recentRecipeObservationsQueryOptions = (recipe: number) =>
  queryOptions({ queryKey: observationKeys.list({ recipe, ...RECENT }), queryFn: () => getObservationPage({ recipe, ...RECENT }) });

export const useRecentRecipeObservations = (recipe: number | null) => useQuery({ ...recentRecipeObservationsQueryOptions(recipe ?? 0), enabled: recipe !== null });

const byAge = (page: Page<ObservationView>) => page.items.slice().sort((a, b) => a.ageDays - b.ageDays || a.id - b.id);

/** Every live observation of one recipe, oldest age first: its timeline and shelf life on the bench. */
export const recipeObservationsQueryOptions = (recipe: number) =>
  queryOptions({ queryKey: observationKeys.list({ recipe, ...EVERY }), queryFn: () => getObservationPage({ recipe, ...EVERY }), select: byAge });

export const useRecipeObservations = (recipe: number | undefined) => useQuery({ ...recipeObservationsQueryOptions(recipe ?? 0), enabled: recipe !== undefined });
