import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { api } from '@/lib/api-client';
import { materialKeys } from './material-keys';

/** PUT replaces the whole entry: a field left out of `input` is cleared on the server. */
export const replaceMaterial = <K extends MaterialKind>(kind: K, id: number, input: Record<string, unknown>) =>
  api.put<{ item: MaterialViews[K] }>(`/api/materials/${kind}/${id}`, input);

export function useReplaceMaterial(kind: MaterialKind) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: Record<string, unknown> }) => replaceMaterial(kind, id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: materialKeys.kind(kind) }),
  });
}
