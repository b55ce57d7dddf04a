import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { recipeKeys } from './recipe-keys';

export function useArchiveRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, archived }: { id: number; archived: boolean }) =>
      (await api.post<{ recipe: RecipeView }>(`/api/recipes/${id}/${archived ? 'archive' : 'restore'}`)).recipe,
    onSuccess: (recipe) => {
      queryClient.invalidateQueries({ queryKey: recipeKeys.all });
      queryClient.setQueryData(recipeKeys.detail(recipe.code), recipe);
    },
  });
}
