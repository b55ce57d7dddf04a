import type { Recipe, User } from '../models';
import type { RecipeView } from '../../shared/views/recipe';
import { storedAttraction } from '../models/recipe-shapes';

export function presentRecipe(r: Recipe & { creator?: User | null }, extra: { observationCount?: number } = {}): RecipeView {
  return {
    id: r.id,
    code: r.code,
    programmeId: r.programmeId,
    name: r.name,
    particleId: r.particleId,
    solventId: r.solventId,
    fraction: { kind: r.fractionKind, value: r.fractionValue },
    temperatureC: r.temperatureC,
    attraction: storedAttraction(r),
    notes: r.notes,
    archived: r.archivedAt != null,
    origin: r.origin,
    derived: r.derived,
    createdBy: r.creator ? { id: r.creator.id, name: r.creator.name } : null,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    ...extra,
  };
}
