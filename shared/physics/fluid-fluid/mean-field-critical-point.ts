import { brentRoot } from '../numerics/brent-root';
import { meanFieldSpinodalStrength, meanFieldSpinodalStrengthSlope } from './mean-field-spinodal-strength';

let cached: Readonly<{ phi: number; b2: number }> | null = null;

/**
 * Critical point of the Carnahan–Starling fluid with a mean-field attraction of strength
 * A = 4(1 − B2*) (p̃ = φZ_CS − Aφ²): the minimum over φ of the spinodal strength
 * A_s(φ) = (β∂P/∂ρ)_CS/(2φ), found by Brent's method on dA_s/dφ = 0 (tolerance 1e-15).
 *
 * Source: the "approximate binodal" of Gelwright's design (CS + second virial attraction),
 * the van der Waals construction with the Carnahan–Starling reference (e.g. Vliegenthart &
 * Lekkerkerker, J. Chem. Phys. 112, 5364 (2000) for the B2* mapping).
 *
 * @returns `{ phi: 0.1304438842, b2: −1.6503067645 }`; never throws.
 * @example meanFieldCriticalPoint().b2 // -1.650306764480...
 */
export function meanFieldCriticalPoint(): { phi: number; b2: number } {
  return { ...meanFieldCriticalPointShared() };
}

/** The cached critical point itself (frozen; no copy), for the hot paths. Internal. */
export function meanFieldCriticalPointShared(): Readonly<{ phi: number; b2: number }> {
  if (cached) return cached;
  const phi = brentRoot(meanFieldSpinodalStrengthSlope, 0.05, 0.3, { absoluteTolerance: 1e-16 });
  if (phi === null) throw new Error('meanFieldCriticalPoint: no minimum found (internal error)');
  cached = Object.freeze({ phi, b2: 1 - meanFieldSpinodalStrength(phi) / 4 });
  return cached;
}
