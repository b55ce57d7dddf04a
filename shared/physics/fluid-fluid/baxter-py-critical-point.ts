import { brentRoot } from '../numerics/brent-root';
import { baxterSpinodalUnchecked } from './baxter-py-spinodal-stickiness';

let cached: { phi: number; tau: number } | null = null;

/**
 * Critical point of Baxter adhesive spheres in the Percus–Yevick (compressibility) theory: the
 * maximum of the spinodal τ_s(φ) = (1 + 4φ − 14φ²)/(12(1 − φ)(1 + 2φ)), found numerically by
 * Brent's method on dτ_s/dφ = 0 (tolerance 1e-16).
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968); closed form τ_c = (2 − √2)/6 =
 * 0.0976311, φ_c = (3√2 − 4)/2 = 0.1213203.
 *
 * @returns `{ phi, tau }`; never throws.
 * @example baxterPYCriticalPoint().tau // 0.09763107293781749
 */
export function baxterPYCriticalPoint(): { phi: number; tau: number } {
  if (cached) return { ...cached };
  // d/dφ of n/d with n = 1 + 4φ − 14φ², d = 12(1 + φ − 2φ²): n′d − nd′ = 0.
  const slope = (phi: number) => {
    const n = 1 + 4 * phi - 14 * phi * phi;
    const d = 12 * (1 + phi - 2 * phi * phi);
    return (4 - 28 * phi) * d - n * 12 * (1 - 4 * phi);
  };
  const phi = brentRoot(slope, 0.01, 0.3, { absoluteTolerance: 1e-17 });
  if (phi === null) throw new Error('baxterPYCriticalPoint: no maximum found (internal error)');
  cached = { phi, tau: baxterSpinodalUnchecked(phi) };
  return { ...cached };
}
