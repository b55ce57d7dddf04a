import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { shortlistKeys } from './shortlist-keys';

/** The status moves the API offers, each a POST to /api/shortlists/:id/<move>. */
export type ShortlistMove = 'submit' | 'approve' | 'return' | 'reopen' | 'archive';

export const moveShortlist = (id: number, move: ShortlistMove, body: { comment?: string } = {}) =>
  api.post<{ shortlist: ShortlistView }>(`/api/shortlists/${id}/${move}`, body);

/** Shared by the five move hooks: the answer is the shortlist as it now stands. */
export function useMoveShortlist<T extends { comment?: string } | void>(id: number, move: ShortlistMove) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: T) => moveShortlist(id, move, body ?? {}),
    onSuccess: ({ shortlist }) => {
      queryClient.setQueryData(shortlistKeys.detail(id), { shortlist });
      return queryClient.invalidateQueries({ queryKey: shortlistKeys.lists() });
    },
  });
}
