import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';
import { findKeys } from './find-keys';

/** Recipes of every programme whose code, name or notes contain the text. */
export const searchRecipes = (q: string) => api.get<Page<RecipeView>>(`/api/recipes${toQuery({ q, pageSize: 25, sort: 'code' })}`);

export const recipeSearchQueryOptions = (q: string) =>
  queryOptions({ queryKey: findKeys.search(q), queryFn: () => searchRecipes(q), enabled: q.trim().length > 0, placeholderData: keepPreviousData });

export const useRecipeSearch = (q: string) => useQuery(recipeSearchQueryOptions(q));
