import { requireInRange } from '../validation/require-in-range';
import { freeVolumeFraction } from './free-volume-fraction';

/**
 * Polymer volume fraction in the sample from the reservoir value, φ_p = α(φ)·φ_p^R: ideal polymer
 * fills only the free volume α(φ) left by the colloids.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 *
 * @param phi colloid volume fraction, 0 < φ < φ_cp.
 * @param q size ratio R_g/a, q > 0.
 * @param polymerReservoir reservoir polymer fraction φ_p^R ≥ 0.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example systemPolymerFraction(0.3, 0.1, 0.5) // 0.30097389502...
 */
export function systemPolymerFraction(phi: number, q: number, polymerReservoir: number): number {
  requireInRange('polymerReservoir', polymerReservoir, 0, Infinity, { what: 'a reservoir polymer fraction', lowEnd: 'closed' });
  return freeVolumeFraction(phi, q) * polymerReservoir;
}
