/** Query keys for programmes, from general to specific, so a prefix invalidates a family. */
export const programmeKeys = {
  all: ['programmes'] as const,
  lists: () => [...programmeKeys.all, 'list'] as const,
  list: (filters: { archived?: 'true' | 'false' | 'all' } = {}) => [...programmeKeys.lists(), filters] as const,
  details: () => [...programmeKeys.all, 'detail'] as const,
  detail: (id: number) => [...programmeKeys.details(), id] as const,
};
