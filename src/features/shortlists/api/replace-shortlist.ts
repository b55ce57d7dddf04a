import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShortlistInput } from '@shared/schemas/shortlists';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { shortlistKeys } from './shortlist-keys';

/** Replaces a draft's title, purpose, target and recipes (only drafts; the server answers 409 otherwise). */
export const replaceShortlist = (id: number, input: ShortlistInput) => api.put<{ shortlist: ShortlistView }>(`/api/shortlists/${id}`, input);

export function useReplaceShortlist(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ShortlistInput) => replaceShortlist(id, input),
    onSuccess: ({ shortlist }) => {
      queryClient.setQueryData(shortlistKeys.detail(id), { shortlist });
      return queryClient.invalidateQueries({ queryKey: shortlistKeys.lists() });
    },
  });
}
