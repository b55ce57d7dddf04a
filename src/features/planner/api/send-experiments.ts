import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanExperimentRecipesInput } from '@shared/schemas/plans';
import type { RecipeView } from '@shared/views/recipe';
import { api } from '@/lib/api-client';
import { CHANGED_BY_PLAN_RECIPES, planKeys } from './plan-keys';

/** Proposed next experiments go to the bench as draft recipes with a note. */
export const sendExperiments = (planId: number, input: PlanExperimentRecipesInput) =>
  api.post<{ recipes: RecipeView[] }>(`/api/plans/${planId}/next-experiments/recipes`, input as Record<string, unknown>);

export function useSendExperiments(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanExperimentRecipesInput) => sendExperiments(planId, input),
    onSuccess: () => Promise.all([planKeys.detail(planId), planKeys.lists(), ...CHANGED_BY_PLAN_RECIPES].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
