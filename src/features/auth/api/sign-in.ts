import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignInInput } from '@shared/schemas/auth';
import type { UserView } from '@shared/views/user';
import { api } from '@/lib/api-client';
import { sessionKeys } from './session-keys';

export const signIn = (input: SignInInput) => api.post<{ user: UserView }>('/api/session', input);

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: ({ user }) => {
      queryClient.clear();
      queryClient.setQueryData(sessionKeys.current(), user);
    },
  });
}
