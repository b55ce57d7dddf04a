import { queryOptions, useQuery } from '@tanstack/react-query';
import { LIMITS } from '@shared/limits';
import type { RecipeView } from '@shared/views/recipe';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';

/** Under the recipes family, so a recipe saved anywhere refreshes the shortlist form's choices. */
export const programmeRecipeKeys = {
  list: (programme: number) => ['recipes', 'list', { programme, pageSize: LIMITS.pageSizeMax, sort: 'code' }] as const,
};

/** The programme's live recipes by code, the most one page holds: what a shortlist is picked from. */
export const getProgrammeRecipes = (programme: number) =>
  api.get<Page<RecipeView>>(`/api/recipes${toQuery({ programme, pageSize: LIMITS.pageSizeMax, sort: 'code' })}`);

export const programmeRecipesQueryOptions = (programme: number) => queryOptions({ queryKey: programmeRecipeKeys.list(programme), queryFn: () => getProgrammeRecipes(programme) });

export const useProgrammeRecipes = (programme: number) => useQuery(programmeRecipesQueryOptions(programme));
