import { requireInRange } from '../validation/require-in-range';

/**
 * Baxter stickiness with the same reduced second virial coefficient, τ = 1/(4(1 − B2*)): the
 * extended law of corresponding states maps any short-range attraction onto adhesive spheres.
 *
 * Source: M. G. Noro & D. Frenkel, J. Chem. Phys. 113, 2941 (2000); R. J. Baxter, J. Chem.
 * Phys. 49, 2770 (1968).
 *
 * @param b2 reduced second virial coefficient, B2* < 1 (B2* = 1 would be τ = ∞).
 * @throws PhysicsArgumentError for B2* ≥ 1, NaN or ±Infinity.
 * @example stickinessFromReducedB2(-1.5) // 0.1
 */
export function stickinessFromReducedB2(b2: number): number {
  requireInRange('b2', b2, -Infinity, 1, { what: 'a reduced second virial coefficient' });
  return 1 / (4 * (1 - b2));
}
