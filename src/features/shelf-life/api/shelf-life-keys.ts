/** Query keys of the programme shelf-life analysis: all → programme(id) → focus(id, recipe). */
export const shelfLifeKeys = {
  all: ['shelf-life'] as const,
  programme: (programmeId: number) => [...shelfLifeKeys.all, programmeId] as const,
  focus: (programmeId: number, recipeId: number | null) => [...shelfLifeKeys.programme(programmeId), recipeId ?? 'all'] as const,
};
