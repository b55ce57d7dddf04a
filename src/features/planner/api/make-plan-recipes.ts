import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanRecipesInput } from '@shared/schemas/plans';
import type { RecipeView } from '@shared/views/recipe';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { planRecipesMade } from './plan-recipes-made';

/** Chosen candidates become recipes (origin plan:<id>), and optionally a draft shortlist, in one request. */
export const makePlanRecipes = (planId: number, input: PlanRecipesInput) =>
  api.post<{ recipes: RecipeView[]; shortlist: ShortlistView | null }>(`/api/plans/${planId}/recipes`, input as Record<string, unknown>);

export function useMakePlanRecipes(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanRecipesInput) => makePlanRecipes(planId, input),
    onSuccess: () => planRecipesMade(queryClient, planId),
  });
}
