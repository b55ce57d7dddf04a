import type { RecipeAttraction, RecipeInput } from '../../shared/schemas/recipes';
import type { RecipeSnapshot } from '../../shared/views/recipe';
import type { Recipe } from './recipe';

/**
 * A recipe row read as the shared shapes (and the attraction written back as columns): the one
 * place that knows how the columns of `recipes` spell a composition. Services, presenters and
 * the shortlist snapshots all go through it.
 */

/** The attraction a recipe row stores, as the shared schema spells it. */
export function storedAttraction(r: Recipe): RecipeAttraction {
  switch (r.attractionSource) {
    case 'depletion':
      return { source: 'depletion', depletantId: r.depletantId!, concentrationGL: r.depletantConcentrationGL! };
    case 'salt':
      return { source: 'salt', saltId: r.saltId!, concentrationMM: r.saltConcentrationMM! };
    case 'direct':
      return { source: 'direct', contactEnergyKT: r.contactEnergyKT!, rangeSigma: r.rangeSigma! };
    default:
      return { source: 'none' };
  }
}

/** The columns a recipe's attraction occupies; the others are cleared. */
export function attractionColumns(a: RecipeAttraction) {
  return {
    attractionSource: a.source,
    depletantId: a.source === 'depletion' ? a.depletantId : null,
    depletantConcentrationGL: a.source === 'depletion' ? a.concentrationGL : null,
    saltId: a.source === 'salt' ? a.saltId : null,
    saltConcentrationMM: a.source === 'salt' ? a.concentrationMM : null,
    contactEnergyKT: a.source === 'direct' ? a.contactEnergyKT : null,
    rangeSigma: a.source === 'direct' ? a.rangeSigma : null,
  };
}

/** The form input of a stored recipe (what deriveRecipe reads). */
export function recipeInputOf(recipe: Recipe): RecipeInput {
  return {
    programmeId: recipe.programmeId,
    name: recipe.name,
    particleId: recipe.particleId,
    solventId: recipe.solventId,
    fraction: { kind: recipe.fractionKind, value: recipe.fractionValue },
    temperatureC: recipe.temperatureC,
    attraction: storedAttraction(recipe),
    ...(recipe.notes ? { notes: recipe.notes } : {}),
  };
}

/** The recipe as it stands now, as a shortlist keeps it: its composition and what was derived. */
export function snapshotOf(recipe: Recipe): RecipeSnapshot {
  const { name, particleId, solventId, fraction, temperatureC, attraction } = recipeInputOf(recipe);
  return {
    version: recipe.version,
    code: recipe.code,
    name,
    particleId,
    solventId,
    fraction,
    temperatureC,
    attraction,
    derived: recipe.derived,
    takenAt: new Date().toISOString(),
  };
}
