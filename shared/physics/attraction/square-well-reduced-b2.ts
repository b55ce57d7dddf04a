import { requireInRange } from '../validation/require-in-range';

/** Largest well depth (kT) accepted anywhere: e^700 is near the largest finite double. */
export const MAX_WELL_DEPTH = 700;

/**
 * Reduced second virial coefficient of a square well of depth U (kT) and range λσ,
 * B2* = B2/B2_HS = 1 − (λ³ − 1)(e^U − 1) (dimensionless; B2_HS = 2πσ³/3).
 *
 * Source: standard result of integrating the Mayer function of the square well; see e.g.
 * M. G. Noro & D. Frenkel, J. Chem. Phys. 113, 2941 (2000), eq. for the square well.
 *
 * @param depth well depth U in kT, 0 ≤ U ≤ 700 (0 is hard spheres).
 * @param lambda range λ = (outer radius)/σ, λ > 1.
 * @throws PhysicsArgumentError for depth outside [0, 700] or λ ≤ 1, NaN or ±Infinity.
 * @example squareWellReducedB2(1 / 1.2172, 1.5) // -2.0258... (the simulated critical point)
 */
export function squareWellReducedB2(depth: number, lambda: number): number {
  requireInRange('depth', depth, 0, MAX_WELL_DEPTH, { what: 'a well depth in kT', lowEnd: 'closed', highEnd: 'closed' });
  requireInRange('lambda', lambda, 1, Infinity, { what: 'a well range λ = r/σ' });
  const shellVolume = lambda ** 3 - 1;
  return 1 - shellVolume * Math.expm1(depth);
}
