import type { RecipeDerived } from '../views/recipe';
import type { ShelfLifeRecipeCovariates } from './shelf-life-model';

/**
 * The shelf-life model's covariates of a recipe, from what its derivation stores: contact
 * attraction U/kT, φ, and log₁₀ of the gravitational Péclet number (it spans decades, and the
 * hazard is taken to change by a fixed factor per decade); null where the derivation has none.
 * The sample height is not the recipe's: each sample brings its own (survivalRecordsFromChecks).
 * @example shelfLifeCovariatesOf({ contactEnergyKT: 4, phi: 0.2, timescales: { gravitationalPeclet: 0.01 } })
 *   // { attractionKt: 4, phi: 0.2, log10Peclet: -2 }
 */
export function shelfLifeCovariatesOf(derived: Pick<RecipeDerived, 'contactEnergyKT' | 'phi'> & { timescales?: Pick<RecipeDerived['timescales'], 'gravitationalPeclet'> | null }): ShelfLifeRecipeCovariates {
  const peclet = derived.timescales?.gravitationalPeclet ?? null;
  return { attractionKt: derived.contactEnergyKT, phi: derived.phi, log10Peclet: peclet !== null && peclet > 0 ? Math.log10(peclet) : null };
}
