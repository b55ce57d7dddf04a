import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { findKeys } from './find-keys';

export const getRecipeByCode = (code: string) => api.get<{ recipe: RecipeView }>(`/api/recipes/code/${encodeURIComponent(code)}`);

export const recipeByCodeQueryOptions = (code: string) =>
  queryOptions({ queryKey: findKeys.byCode(code), queryFn: () => getRecipeByCode(code), select: (data) => data.recipe });

export const useRecipeByCode = (code: string | null) => useQuery({ ...recipeByCodeQueryOptions(code ?? ''), enabled: Boolean(code) });
