/** Query keys of a programme's calibrations, general to specific. */
export const calibrationKeys = {
  all: ['calibrations'] as const,
  lists: () => [...calibrationKeys.all, 'list'] as const,
  list: (programmeId: number) => [...calibrationKeys.lists(), programmeId] as const,
  details: () => [...calibrationKeys.all, 'detail'] as const,
  detail: (programmeId: number, id: number) => [...calibrationKeys.details(), programmeId, id] as const,
};
