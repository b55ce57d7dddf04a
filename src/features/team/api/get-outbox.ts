import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export interface OutboxItemView {
  id: number;
  sender: string;
  recipients: string;
  subject: string;
  transport: 'catcher' | 'relay';
  createdAt: string;
  preview?: string;
  text?: string | null;
  html?: string | null;
}

export const outboxQueryOptions = (filters: { page: number; to?: string }) =>
  queryOptions({
    queryKey: teamKeys.outbox(filters),
    queryFn: () => api.get<Page<OutboxItemView>>(`/api/outbox${toQuery({ ...filters, pageSize: 25 })}`),
    placeholderData: keepPreviousData,
  });

export const useOutbox = (filters: { page: number; to?: string }) => useQuery(outboxQueryOptions(filters));

export const outboxMessageQueryOptions = (id: number) =>
  queryOptions({ queryKey: teamKeys.outboxMessage(id), queryFn: () => api.get<{ message: OutboxItemView }>(`/api/outbox/${id}`) });

export const useOutboxMessage = (id: number | null) => useQuery({ ...outboxMessageQueryOptions(id ?? 0), enabled: id !== null });
