import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';

/**
 * Particle volume fraction from the particle mass fraction w of a two-component dispersion,
 * φ = (w/ρ_p) / (w/ρ_p + (1 − w)/ρ_s) (volumes additive).
 *
 * Source: definition of mass and volume fractions (common practice).
 *
 * @param massFraction w, 0 < w < 1.
 * @param particleDensity ρ_p in g/cm³, > 0.
 * @param solventDensity ρ_s in g/cm³, > 0.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example volumeFractionFromMassFraction(0.2, 2.0, 1.0) // 0.1111111111111111
 */
export function volumeFractionFromMassFraction(massFraction: number, particleDensity: number, solventDensity: number): number {
  requireInRange('massFraction', massFraction, 0, 1, { what: 'a mass fraction' });
  requirePositive('particleDensity', particleDensity, 'a density in g/cm³');
  requirePositive('solventDensity', solventDensity, 'a density in g/cm³');
  const particleVolume = massFraction / particleDensity;
  return particleVolume / (particleVolume + (1 - massFraction) / solventDensity);
}
