import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { recipeChanged } from './recipe-changed';

export function useArchiveRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, archived }: { id: number; archived: boolean }) =>
      (await api.post<{ recipe: RecipeView }>(`/api/recipes/${id}/${archived ? 'archive' : 'restore'}`)).recipe,
    onSuccess: (recipe) => void recipeChanged(queryClient, recipe),
  });
}
