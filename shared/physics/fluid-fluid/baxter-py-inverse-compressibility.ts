import { requireInRange } from '../validation/require-in-range';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { baxterLambdaUnchecked } from './baxter-py-lambda';

/**
 * Inverse compressibility of Baxter adhesive spheres (Percus–Yevick, compressibility route),
 * β∂P/∂ρ = [(1 + 2φ) − λφ(1 − φ)]²/(1 − φ)⁴ (dimensionless; 1/S(0)).
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968).
 *
 * @param phi volume fraction, 0 < φ < φ_cp.
 * @param tau stickiness τ > 0.
 * @returns the inverse compressibility, or `null` where λ has no real root (no solution).
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), τ ≤ 0, NaN or ±Infinity.
 * @example baxterPYInverseCompressibility(0.1, 0.2) // 0.9035793334...
 */
export function baxterPYInverseCompressibility(phi: number, tau: number): number | null {
  requireVolumeFraction('phi', phi);
  requireInRange('tau', tau, 0, Infinity, { what: 'a Baxter stickiness τ' });
  const lambda = baxterLambdaUnchecked(phi, tau);
  if (lambda === null) return null;
  return ((1 + 2 * phi - lambda * phi * (1 - phi)) ** 2) / (1 - phi) ** 4;
}
