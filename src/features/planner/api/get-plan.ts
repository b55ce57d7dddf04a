import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlanView } from '@shared/views/plan';
import { api } from '@/lib/api-client';
import { planKeys } from './plan-keys';

export const getPlan = async (id: number) => (await api.get<{ plan: PlanView }>(`/api/plans/${id}`)).plan;

export const planQueryOptions = (id: number) => queryOptions({ queryKey: planKeys.detail(id), queryFn: () => getPlan(id) });

export const usePlan = (id: number | null) => useQuery({ ...planQueryOptions(id ?? 0), enabled: id !== null });
