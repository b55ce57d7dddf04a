import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/views/page';
import type { ObservationView } from '@shared/views/observation';
import { api } from '@/lib/api-client';

/** Every live observation of one recipe (for its timeline), oldest age first. */
export const recipeObservationsQueryOptions = (recipeId: number) =>
  queryOptions({
    queryKey: ['recipes', 'observations', recipeId] as const,
    queryFn: async () => {
      const page = await api.get<Page<ObservationView>>(`/api/observations?recipe=${recipeId}&pageSize=200`);
      return page.items.slice().sort((a, b) => a.ageDays - b.ageDays || a.id - b.id);
    },
  });

export const useRecipeObservations = (recipeId: number | undefined) => useQuery({ ...recipeObservationsQueryOptions(recipeId ?? 0), enabled: recipeId !== undefined });
