import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateInvitationInput } from '@shared/schemas/team';
import type { UserView } from '@shared/views/user';
import { api } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInvitationInput) => api.post<{ user: UserView }>('/api/invitations', input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
