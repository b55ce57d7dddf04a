import { requireInRange } from '../validation/require-in-range';

/**
 * Depth U (kT) of the square well of range λσ that has a given reduced second virial
 * coefficient: the inverse of B2* = 1 − (λ³ − 1)(e^U − 1), U = ln[1 + (1 − B2*)/(λ³ − 1)].
 *
 * Source: inversion of the square-well B2* (Noro & Frenkel, J. Chem. Phys. 113, 2941 (2000)).
 * Used to place any attraction on a map whose y axis is a square-well depth (extended law of
 * corresponding states: equal B2* ⇒ equal state).
 *
 * @param b2 reduced second virial coefficient, B2* ≤ 1 (1 is hard spheres, U = 0).
 * @param lambda range λ > 1.
 * @throws PhysicsArgumentError for B2* > 1, λ ≤ 1, NaN or ±Infinity.
 * @example squareWellDepthFromReducedB2(-2.0258433150744, 1.5) // 0.8215577...
 */
export function squareWellDepthFromReducedB2(b2: number, lambda: number): number {
  requireInRange('b2', b2, -Infinity, 1, { what: 'a reduced second virial coefficient', highEnd: 'closed' });
  requireInRange('lambda', lambda, 1, Infinity, { what: 'a well range λ = r/σ' });
  return Math.log1p((1 - b2) / (lambda ** 3 - 1));
}
