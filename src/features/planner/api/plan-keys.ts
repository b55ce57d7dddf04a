/** Query keys for plans: a programme's list, and one plan with everything it found. */
export const planKeys = {
  all: ['plans'] as const,
  lists: () => [...planKeys.all, 'list'] as const,
  list: (programmeId: number) => [...planKeys.lists(), { programme: programmeId }] as const,
  details: () => [...planKeys.all, 'detail'] as const,
  detail: (id: number) => [...planKeys.details(), id] as const,
};

