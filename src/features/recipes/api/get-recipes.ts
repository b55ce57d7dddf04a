import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/views/page';
import type { RecipeView } from '@shared/views/recipe';
import { api, toQuery } from '@/lib/api-client';
import { recipeKeys, type RecipeFilters } from './recipe-keys';

export const recipesQueryOptions = (filters: RecipeFilters) =>
  queryOptions({
    queryKey: recipeKeys.list(filters),
    queryFn: () => api.get<Page<RecipeView>>(`/api/recipes${toQuery(filters)}`),
    placeholderData: keepPreviousData,
  });

export const useRecipes = (filters: RecipeFilters, enabled = true) => useQuery({ ...recipesQueryOptions(filters), enabled });
