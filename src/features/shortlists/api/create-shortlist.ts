import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShortlistInput } from '@shared/schemas/shortlists';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { shortlistKeys } from './shortlist-keys';

export const createShortlist = (input: ShortlistInput) => api.post<{ shortlist: ShortlistView }>('/api/shortlists', input);

export function useCreateShortlist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createShortlist,
    onSuccess: ({ shortlist }) => {
      queryClient.setQueryData(shortlistKeys.detail(shortlist.id), { shortlist });
      return queryClient.invalidateQueries({ queryKey: shortlistKeys.lists() });
    },
  });
}
