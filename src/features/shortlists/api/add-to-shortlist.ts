import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShortlistView } from '@shared/views/shortlist';
import { api } from '@/lib/api-client';
import { shortlistKeys } from './shortlist-keys';

const REASON = 'Picked on the state map; give the reason before submitting.';

/**
 * Adds recipes chosen on the map to a draft shortlist (appending to the one named) or to a
 * new draft. The shortlist API replaces the whole list, so the current one is read first.
 */
export function useAddToShortlist() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { programmeId: number; recipeIds: number[]; shortlistId?: number; title?: string; targetState: ShortlistView['targetState'] }) => {
      if (input.shortlistId) {
        const { shortlist } = await api.get<{ shortlist: ShortlistView }>(`/api/shortlists/${input.shortlistId}`);
        const existing = shortlist.items.map((i) => ({ recipeId: i.recipeId, reason: i.reason }));
        const added = input.recipeIds.filter((id) => !existing.some((e) => e.recipeId === id)).map((recipeId) => ({ recipeId, reason: REASON }));
        const body = { programmeId: shortlist.programmeId, title: shortlist.title, purpose: shortlist.purpose ?? undefined, targetState: shortlist.targetState, items: [...existing, ...added] };
        return (await api.put<{ shortlist: ShortlistView }>(`/api/shortlists/${input.shortlistId}`, body)).shortlist;
      }
      const body = { programmeId: input.programmeId, title: input.title ?? 'Picked on the map', targetState: input.targetState, items: input.recipeIds.map((recipeId) => ({ recipeId, reason: REASON })) };
      return (await api.post<{ shortlist: ShortlistView }>('/api/shortlists', body)).shortlist;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shortlistKeys.all }),
  });
}
