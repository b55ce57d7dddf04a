import type { QueryClient } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import { dueCheckKeys, observationKeys } from '@/features/bench';
import { mapPointKeys } from '@/features/map';
import { shelfLifeKeys } from '@/features/shelf-life';
import { shortlistKeys } from '@/features/shortlists';
import { recipeKeys } from './recipe-keys';

/**
 * Everything a saved, archived or restored recipe changes, asked again: the recipe lists, its
 * programme's map overlay and shelf-life analysis, the shortlists that show it, the bench's
 * lists (each outcome agrees or not with the recipe's prediction) and the due checks (an
 * archived recipe's samples are no longer due). The recipe itself is written into its entry.
 */
export function recipeChanged(queryClient: QueryClient, recipe: RecipeView) {
  queryClient.setQueryData(recipeKeys.detail(recipe.code), recipe);
  return Promise.all(
    [recipeKeys.lists(), mapPointKeys.list(recipe.programmeId), shelfLifeKeys.programme(recipe.programmeId), shortlistKeys.all, observationKeys.lists(), dueCheckKeys.all].map(
      (queryKey) => queryClient.invalidateQueries({ queryKey }),
    ),
  );
}
