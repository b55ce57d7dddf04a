import { requireInRange } from '../validation/require-in-range';

/**
 * Reduced second virial coefficient of Baxter adhesive hard spheres, B2* = 1 − 1/(4τ).
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968).
 *
 * @param tau stickiness τ > 0 (smaller is stickier; τ → ∞ is hard spheres).
 * @throws PhysicsArgumentError for τ ≤ 0, NaN or ±Infinity.
 * @example reducedB2FromStickiness(0.1133) // -1.2065313...
 */
export function reducedB2FromStickiness(tau: number): number {
  requireInRange('tau', tau, 0, Infinity, { what: 'a Baxter stickiness τ' });
  return 1 - 1 / (4 * tau);
}
