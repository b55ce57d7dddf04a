import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CheckScheduleInput } from '@shared/schemas/check-schedules';
import type { CheckScheduleView } from '@shared/views/check-schedules';
import { api } from '@/lib/api-client';
import { dueCheckKeys } from '@/features/bench';
import { checkScheduleKeys } from './get-check-schedule';

export const setCheckSchedule = ({ recipeId, input }: { recipeId: number; input: CheckScheduleInput }) =>
  api.put<{ schedule: CheckScheduleView }>(`/api/recipes/${recipeId}/check-schedule`, input).then((answer) => answer.schedule);

/** Saves a recipe's check schedule; what is due changes with it. */
export function useSetCheckSchedule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setCheckSchedule,
    onSuccess: (schedule) => {
      queryClient.setQueryData(checkScheduleKeys.detail(schedule.recipeId), schedule);
      return queryClient.invalidateQueries({ queryKey: dueCheckKeys.all });
    },
  });
}
