import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';

/**
 * Asakura–Oosawa depletion energy at contact (r = σ), βU(σ) = −φ_p^R (1 + 3/(2q)) in kT
 * (negative: an attraction). From the overlap volume of the two depletion layers.
 *
 * Source: S. Asakura & F. Oosawa, J. Chem. Phys. 22, 1255 (1954); Lekkerkerker & Tuinier,
 * *Colloids and the Depletion Interaction* (Springer, 2011), ch. 2.
 *
 * @param q size ratio R_g/a, q > 0.
 * @param polymerReservoir reservoir polymer fraction φ_p^R ≥ 0.
 * @throws PhysicsArgumentError for q ≤ 0, φ_p^R < 0, NaN or ±Infinity.
 * @example asakuraOosawaContactEnergy(0.1, 0.25) // -4
 */
export function asakuraOosawaContactEnergy(q: number, polymerReservoir: number): number {
  requirePositive('q', q, 'a size ratio R_g/a');
  requireInRange('polymerReservoir', polymerReservoir, 0, Infinity, { what: 'a reservoir polymer fraction', lowEnd: 'closed' });
  return -polymerReservoir * (1 + 3 / (2 * q));
}
