import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';
import { freeVolumeFraction } from './free-volume-fraction';

/**
 * Reservoir polymer fraction from the polymer fraction in the sample, φ_p^R = φ_p/α(φ) — what a
 * recipe needs, since it states how much polymer went into the sample. No polymer gives 0 even
 * where α underflows; polymer with no free volume left for it has no finite φ_p^R and throws.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 *
 * @param phi colloid volume fraction, 0 < φ < φ_cp.
 * @param q size ratio R_g/a, q > 0.
 * @param systemPolymer polymer fraction in the sample φ_p = c/c* ≥ 0.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity, and naming
 *   `phi` when α(φ) is so small that φ_p/α overflows.
 * @example reservoirPolymerFraction(0.3, 0.1, 0.30097389502) // 0.5
 */
export function reservoirPolymerFraction(phi: number, q: number, systemPolymer: number): number {
  requireInRange('systemPolymer', systemPolymer, 0, Infinity, { what: 'a polymer volume fraction in the sample', lowEnd: 'closed' });
  const freeVolume = freeVolumeFraction(phi, q);
  if (systemPolymer === 0) return 0;
  const reservoir = systemPolymer / freeVolume;
  if (!Number.isFinite(reservoir)) {
    throw new PhysicsArgumentError('phi', `a volume fraction that leaves the polymer some free volume (α(φ) = ${freeVolume} at q = ${q})`, phi);
  }
  return reservoir;
}
