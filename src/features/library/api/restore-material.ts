import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api } from '@/lib/api-client';
import { materialKeys } from './material-keys';

export const restoreMaterial = <K extends MaterialKind>(kind: K, id: number) => api.post<{ item: MaterialViews[K] }>(`/api/materials/${kind}/${id}/restore`);

export function useRestoreMaterial(kind: MaterialKind) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => restoreMaterial(kind, id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: materialKeys.kind(kind) }),
  });
}
