import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/views/page';
import { api, toQuery } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export interface AuditEventView {
  id: number;
  action: string;
  entityType: string;
  entityId: string | null;
  details: Record<string, unknown> | null;
  ip: string | null;
  actor: { id: number; name: string; email: string } | null;
  createdAt: string;
}

export const auditQueryOptions = (filters: { page: number; action?: string }) =>
  queryOptions({
    queryKey: teamKeys.audit(filters),
    queryFn: () => api.get<Page<AuditEventView>>(`/api/audit-events${toQuery({ ...filters, pageSize: 25 })}`),
    placeholderData: keepPreviousData,
  });

export const useAuditEvents = (filters: { page: number; action?: string }) => useQuery(auditQueryOptions(filters));
