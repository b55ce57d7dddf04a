import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeInput } from '@shared/schemas/recipes';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { recipeChanged } from './recipe-changed';

/** Creates a recipe (no id) or replaces one; the server derives and returns the parameters. */
export function useSaveRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, input }: { id?: number; input: RecipeInput }) =>
      (id ? await api.put<{ recipe: RecipeView }>(`/api/recipes/${id}`, input) : await api.post<{ recipe: RecipeView }>('/api/recipes', input)).recipe,
    onSuccess: (recipe) => void recipeChanged(queryClient, recipe),
  });
}
