import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanExperimentRecipesInput } from '@shared/schemas/plans';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { planRecipesMade } from './plan-recipes-made';

/** Proposed next experiments go to the bench as draft recipes with a note. */
export const sendExperiments = (planId: number, input: PlanExperimentRecipesInput) =>
  api.post<{ recipes: RecipeView[] }>(`/api/plans/${planId}/next-experiments/recipes`, input as Record<string, unknown>);

export function useSendExperiments(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanExperimentRecipesInput) => sendExperiments(planId, input),
    onSuccess: () => planRecipesMade(queryClient, planId),
  });
}
