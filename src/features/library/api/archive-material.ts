import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api } from '@/lib/api-client';
import { materialKeys } from './material-keys';

/** Archiving hides an entry from new recipes; recipes that use it keep it. */
export const archiveMaterial = <K extends MaterialKind>(kind: K, id: number) => api.post<{ item: MaterialViews[K] }>(`/api/materials/${kind}/${id}/archive`);

export function useArchiveMaterial(kind: MaterialKind) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => archiveMaterial(kind, id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: materialKeys.kind(kind) }),
  });
}
