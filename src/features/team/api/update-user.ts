import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserInput } from '@shared/schemas/team';
import type { UserView } from '@shared/views/user';
import { api } from '@/lib/api-client';
import { teamKeys } from './team-keys';

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: UpdateUserInput & { id: number }) => api.patch<{ user: UserView }>(`/api/users/${id}`, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
