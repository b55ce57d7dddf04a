import type { RecipeListQuery } from '@shared/schemas/recipes';

export type RecipeFilters = Partial<Pick<RecipeListQuery, 'programme' | 'state' | 'q' | 'archived' | 'sort' | 'order' | 'page' | 'pageSize'>>;

export const recipeKeys = {
  all: ['recipes'] as const,
  lists: () => [...recipeKeys.all, 'list'] as const,
  list: (filters: RecipeFilters) => [...recipeKeys.lists(), filters] as const,
  details: () => [...recipeKeys.all, 'detail'] as const,
  detail: (code: string) => [...recipeKeys.details(), code] as const,
};
