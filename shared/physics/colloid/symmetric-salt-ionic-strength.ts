import { PhysicsArgumentError } from '../validation/physics-argument-error';
import { requireInRange } from '../validation/require-in-range';

/**
 * Ionic strength of a symmetric z:z salt at molar concentration c, I = ½Σcᵢzᵢ² = c z² (mol/L).
 * Asymmetric salts (e.g. CaCl₂, I = 3c) are outside this helper.
 *
 * Source: G. N. Lewis & M. Randall, J. Am. Chem. Soc. 43, 1112 (1921) (definition).
 *
 * @param concentration salt concentration in mol/L, 0 < c ≤ 10.
 * @param valence ion valence z, an integer 1…4.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example symmetricSaltIonicStrength(0.01, 2) // 0.04
 */
export function symmetricSaltIonicStrength(concentration: number, valence: number): number {
  requireInRange('concentration', concentration, 0, 10, { what: 'a salt concentration in mol/L', highEnd: 'closed' });
  requireInRange('valence', valence, 1, 4, { what: 'an ion valence', lowEnd: 'closed', highEnd: 'closed' });
  if (!Number.isInteger(valence)) throw new PhysicsArgumentError('valence', 'an integer ion valence in [1, 4]', valence);
  return concentration * valence * valence;
}
