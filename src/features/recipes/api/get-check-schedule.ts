import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CheckScheduleView } from '@shared/views/check-schedules';
import { api } from '@/lib/api-client';

/** Query keys of recipes' check schedules (GET /api/recipes/:id/check-schedule). */
export const checkScheduleKeys = {
  all: ['check-schedules'] as const,
  details: () => [...checkScheduleKeys.all, 'detail'] as const,
  detail: (recipeId: number) => [...checkScheduleKeys.details(), recipeId] as const,
};

export const getCheckSchedule = (recipeId: number) => api.get<{ schedule: CheckScheduleView }>(`/api/recipes/${recipeId}/check-schedule`).then((answer) => answer.schedule);

export const checkScheduleQueryOptions = (recipeId: number) => queryOptions({ queryKey: checkScheduleKeys.detail(recipeId), queryFn: () => getCheckSchedule(recipeId) });

export const useCheckSchedule = (recipeId: number) => useQuery(checkScheduleQueryOptions(recipeId));
