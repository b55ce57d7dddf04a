import type { Recipe, User } from '../models';
import type { RecipeView } from '../../shared/views/team-data';
import type { RecipeAttraction } from '../../shared/schemas/recipes';

export function recipeAttraction(r: Recipe): RecipeAttraction {
  switch (r.attractionSource) {
    case 'depletion':
      return { source: 'depletion', depletantId: r.depletantId!, concentrationGL: r.depletantGl! };
    case 'salt':
      return { source: 'salt', saltId: r.saltId!, concentrationMM: r.saltMm! };
    case 'direct':
      return { source: 'direct', contactEnergyKT: r.contactEnergyKt!, rangeSigma: r.rangeSigma! };
    default:
      return { source: 'none' };
  }
}

/** The columns a recipe's attraction occupies; the others are cleared. */
export function attractionColumns(a: RecipeAttraction) {
  return {
    attractionSource: a.source,
    depletantId: a.source === 'depletion' ? a.depletantId : null,
    depletantGl: a.source === 'depletion' ? a.concentrationGL : null,
    saltId: a.source === 'salt' ? a.saltId : null,
    saltMm: a.source === 'salt' ? a.concentrationMM : null,
    contactEnergyKt: a.source === 'direct' ? a.contactEnergyKT : null,
    rangeSigma: a.source === 'direct' ? a.rangeSigma : null,
  };
}

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
    attraction: recipeAttraction(r),
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
