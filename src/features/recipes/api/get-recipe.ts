import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { recipeKeys } from './recipe-keys';

export const recipeQueryOptions = (code: string) =>
  queryOptions({
    queryKey: recipeKeys.detail(code),
    queryFn: async () => (await api.get<{ recipe: RecipeView }>(`/api/recipes/code/${encodeURIComponent(code)}`)).recipe,
  });

export const useRecipe = (code: string) => useQuery(recipeQueryOptions(code));
