import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api } from '@/lib/api-client';
import { materialKeys } from './material-keys';

export const createMaterial = <K extends MaterialKind>(kind: K, input: Record<string, unknown>) =>
  api.post<{ item: MaterialViews[K] }>(`/api/materials/${kind}`, input);

export function useCreateMaterial(kind: MaterialKind) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Record<string, unknown>) => createMaterial(kind, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: materialKeys.kind(kind) }),
  });
}
