import { requireInRange } from '../validation/require-in-range';
import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Baxter's λ for adhesive hard spheres in the Percus–Yevick approximation: the smaller root of
 * (φ/12)λ² − (τ + φ/(1 − φ))λ + (1 + φ/2)/(1 − φ)² = 0, computed as 2c/(−b + √disc) so that
 * φ → 0 is free of cancellation (λ → 1/τ).
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968).
 *
 * @param phi volume fraction, 0 < φ < φ_cp.
 * @param tau stickiness τ > 0.
 * @returns λ, or `null` where the quadratic has no real root (below τ_c, in a band of φ inside
 *   the spinodal, e.g. 0.0635 < φ < 0.1928 at τ = 0.09): the theory has no solution there.
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), τ ≤ 0, NaN or ±Infinity.
 * @example baxterPYLambda(0.1, 0.2) // 4.778222229...
 */
export function baxterPYLambda(phi: number, tau: number): number | null {
  requireVolumeFraction('phi', phi);
  requireInRange('tau', tau, 0, Infinity, { what: 'a Baxter stickiness τ' });
  return baxterLambdaUnchecked(phi, tau);
}

/** λ without argument checks (internal). */
export function baxterLambdaUnchecked(phi: number, tau: number): number | null {
  const discriminantNumerator = baxterDiscriminantNumerator(phi, tau);
  if (discriminantNumerator < 0) return null;
  const linear = tau + phi / (1 - phi);
  const constant = (1 + phi / 2) / (1 - phi) ** 2;
  // disc = b² − 4ac = N(φ)/(1 − φ)², written through N to keep its sign exact near the band.
  return (2 * constant) / (linear + Math.sqrt(discriminantNumerator) / (1 - phi));
}

/**
 * N(φ, τ) = (τ + φ(1 − τ))² − φ/3 − φ²/6 = (1 − φ)²·(b² − 4ac): the quadratic's discriminant
 * without its positive factor. Negative inside the no-solution band. Internal.
 */
export function baxterDiscriminantNumerator(phi: number, tau: number): number {
  const shifted = tau + phi * (1 - tau);
  return shifted * shifted - phi / 3 - (phi * phi) / 6;
}
