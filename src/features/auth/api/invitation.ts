import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { AcceptInvitationInput } from '@shared/schemas/auth';
import type { Role } from '@shared/roles';
import type { UserView } from '@shared/views/user';
import { api } from '@/lib/api-client';
import { sessionKeys } from './session-keys';

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: sessionKeys.invitation(token),
    queryFn: () => api.get<{ name: string; email: string; role: Role }>(`/api/invitations/${encodeURIComponent(token)}`),
    enabled: token.length > 0,
    retry: false,
  });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}

export function useAcceptInvitation() {
  return useMutation({ mutationFn: (input: AcceptInvitationInput) => api.post<{ user: UserView }>('/api/invitations/accept', input) });
}
