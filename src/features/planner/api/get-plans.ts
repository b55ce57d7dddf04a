import { queryOptions, useQuery } from '@tanstack/react-query';
import { LIMITS } from '@shared/limits';
import type { PlanSummaryView } from '@shared/views/plan';
import type { Page } from '@shared/views/page';
import { api } from '@/lib/api-client';
import { planKeys } from './plan-keys';

/** A programme's plans, newest first (one page of the largest size: a programme runs tens of plans). */
export const getPlans = (programmeId: number) => api.get<Page<PlanSummaryView>>(`/api/plans?programme=${programmeId}&pageSize=${LIMITS.pageSizeMax}`);

export const plansQueryOptions = (programmeId: number) => queryOptions({ queryKey: planKeys.list(programmeId), queryFn: () => getPlans(programmeId) });

export const usePlans = (programmeId: number) => useQuery(plansQueryOptions(programmeId));
