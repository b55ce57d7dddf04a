import { useMutation } from '@tanstack/react-query';
import type { ConfirmPasswordResetInput, RequestPasswordResetInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: (input: RequestPasswordResetInput) => api.post<{ message: string }>('/api/password-resets', input) });
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: (input: ConfirmPasswordResetInput) => api.post<{ message: string }>('/api/password-resets/confirm', input) });
}
