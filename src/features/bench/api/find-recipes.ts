import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';

/** Keys under the recipes family, so a change to recipes anywhere refreshes this chooser too. */
export const recipeChoiceKeys = {
  all: ['recipes'] as const,
  list: (filters: { programme: number; q: string }) => [...recipeChoiceKeys.all, 'list', { ...filters, pageSize: 50 }] as const,
};

/** Live recipes of a programme whose code, name or notes contain the text, by code. */
export const findRecipes = (filters: { programme: number; q: string }) =>
  api.get<Page<RecipeView>>(`/api/recipes${toQuery({ programme: filters.programme, q: filters.q.trim(), pageSize: 50, sort: 'code' })}`);

export const recipeChoicesQueryOptions = (filters: { programme: number; q: string }) =>
  queryOptions({ queryKey: recipeChoiceKeys.list(filters), queryFn: () => findRecipes(filters), placeholderData: keepPreviousData });

export const useRecipeChoices = (filters: { programme: number; q: string }) => useQuery(recipeChoicesQueryOptions(filters));
