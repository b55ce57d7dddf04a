import type { Programme } from '../models';
import type { ProgrammeView } from '../../shared/views/programme';

export function presentProgramme(p: Programme, counts: { recipes: number; observations: number } = { recipes: 0, observations: 0 }): ProgrammeView {
  return {
    id: p.id,
    name: p.name,
    goalState: p.goalState,
    attractionSource: p.attractionSource,
    codePrefix: p.codePrefix,
    notes: p.notes ?? null,
    archived: p.archivedAt != null,
    recipeCount: counts.recipes,
    observationCount: counts.observations,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}
