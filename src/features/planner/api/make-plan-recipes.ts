import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanRecipesInput } from '@shared/schemas/plans';
import type { RecipeView } from '@shared/views/recipe';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { CHANGED_BY_PLAN_RECIPES, planKeys } from './plan-keys';

/** Chosen candidates become recipes (origin plan:<id>), and optionally a draft shortlist, in one request. */
export const makePlanRecipes = (planId: number, input: PlanRecipesInput) =>
  api.post<{ recipes: RecipeView[]; shortlist: ShortlistView | null }>(`/api/plans/${planId}/recipes`, input as Record<string, unknown>);

export function useMakePlanRecipes(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlanRecipesInput) => makePlanRecipes(planId, input),
    onSuccess: () => Promise.all([planKeys.detail(planId), planKeys.lists(), ...CHANGED_BY_PLAN_RECIPES].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
