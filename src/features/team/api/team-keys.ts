export const teamKeys = {
  all: ['team'] as const,
  users: () => [...teamKeys.all, 'users'] as const,
  audit: (filters: { page: number; action?: string }) => [...teamKeys.all, 'audit', filters] as const,
  outbox: (filters: { page: number; to?: string }) => [...teamKeys.all, 'outbox', 'list', filters] as const,
  outboxMessage: (id: number) => [...teamKeys.all, 'outbox', 'detail', id] as const,
};
