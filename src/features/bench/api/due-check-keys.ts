/** Query keys of the due-check list (GET /api/due-checks), per programme. */
export const dueCheckKeys = {
  all: ['due-checks'] as const,
  lists: () => [...dueCheckKeys.all, 'list'] as const,
  list: (programme: number) => [...dueCheckKeys.lists(), { programme }] as const,
};
