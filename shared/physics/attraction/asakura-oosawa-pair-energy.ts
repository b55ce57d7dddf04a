import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';

/**
 * Asakura–Oosawa depletion pair energy between two hard spheres of diameter σ in a reservoir of
 * ideal polymer (reservoir fraction φ_p^R, size ratio q = R_g/a): for 1 ≤ x = r/σ ≤ 1 + q
 * βU(x) = −φ_p^R ((1+q)/q)³ [1 − 3x/(2(1+q)) + x³/(2(1+q)³)], and 0 beyond (kT).
 *
 * Source: S. Asakura & F. Oosawa, J. Chem. Phys. 22, 1255 (1954); A. Vrij, Pure Appl. Chem.
 * 48, 471 (1976); in this form Lekkerkerker & Tuinier, *Colloids and the Depletion
 * Interaction* (Springer, 2011), ch. 2.
 *
 * @param x centre distance over σ, x ≥ 1.
 * @param q size ratio q > 0.
 * @param polymerReservoir reservoir polymer fraction φ_p^R ≥ 0.
 * @throws PhysicsArgumentError for x < 1, q ≤ 0, φ_p^R < 0, NaN or ±Infinity.
 * @example asakuraOosawaPairEnergy(1, 0.5, 0.2) // -0.8 (= −φ_p^R(1 + 3/(2q)))
 */
export function asakuraOosawaPairEnergy(x: number, q: number, polymerReservoir: number): number {
  requireInRange('x', x, 1, Infinity, { what: 'a centre distance r/σ', lowEnd: 'closed' });
  requirePositive('q', q, 'a size ratio R_g/a');
  requireInRange('polymerReservoir', polymerReservoir, 0, Infinity, { what: 'a reservoir polymer fraction', lowEnd: 'closed' });
  return asakuraOosawaEnergyUnchecked(x, q, polymerReservoir);
}

/** The same formula without argument checks, for quadrature loops (internal). */
export function asakuraOosawaEnergyUnchecked(x: number, q: number, polymerReservoir: number): number {
  const outer = 1 + q;
  if (x >= outer) return 0;
  const ratio = x / outer;
  const overlap = 1 - 1.5 * ratio + 0.5 * ratio * ratio * ratio;
  return -polymerReservoir * (outer / q) ** 3 * overlap;
}
