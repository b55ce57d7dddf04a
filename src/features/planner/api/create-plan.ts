import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanInput } from '@shared/schemas/plans';
import type { PlanView } from '@shared/views/plan';
import { api } from '@/lib/api-client';
import { planKeys } from './plan-keys';

/** Runs the planner on the server and stores the plan. */
export const createPlan = async (input: PlanInput) => (await api.post<{ plan: PlanView }>('/api/plans', input as Record<string, unknown>)).plan;

export function useCreatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: (plan) => {
      queryClient.setQueryData(planKeys.detail(plan.id), plan);
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
