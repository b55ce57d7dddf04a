import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DueChecksView } from '@shared/views/check-schedules';
import { api, toQuery } from '@/lib/api-client';
import { dueCheckKeys } from './due-check-keys';

/** How many due samples the panel lists at once (the answer also gives the total). */
export const DUE_CHECKS_SHOWN = 50;

export const getDueChecks = (programme: number) => api.get<DueChecksView>(`/api/due-checks${toQuery({ programme, limit: DUE_CHECKS_SHOWN })}`);

export const dueChecksQueryOptions = (programme: number) => queryOptions({ queryKey: dueCheckKeys.list(programme), queryFn: () => getDueChecks(programme) });

export const useDueChecks = (programme: number) => useQuery(dueChecksQueryOptions(programme));
