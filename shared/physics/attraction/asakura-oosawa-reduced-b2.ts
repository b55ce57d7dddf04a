import { requireInRange } from '../validation/require-in-range';
import { requirePositive } from '../validation/require-positive';
import { asakuraOosawaEnergyUnchecked } from './asakura-oosawa-pair-energy';
import { reducedB2FromPotential } from './reduced-b2-from-potential';

/**
 * Reduced second virial coefficient of hard spheres with the Asakura–Oosawa depletion
 * attraction, B2* = 1 − 3∫₁^{1+q} (e^{−βU_AO(x)} − 1) x² dx, by adaptive quadrature
 * (relative tolerance 1e-11).
 *
 * Source: S. Asakura & F. Oosawa, J. Chem. Phys. 22, 1255 (1954) for the potential; the Mayer
 * integral as in {@link reducedB2FromPotential}.
 *
 * @param q size ratio R_g/a, q > 0.
 * @param polymerReservoir reservoir polymer fraction φ_p^R ≥ 0, with contact energy
 *   φ_p^R(1 + 3/(2q)) ≤ 700 kT.
 * @throws PhysicsArgumentError for q ≤ 0, φ_p^R < 0, a contact energy beyond 700 kT, NaN or ±Infinity.
 * @example asakuraOosawaReducedB2(0.1, 0.25) // -1.25590589... (a 4 kT well of width 0.1σ)
 */
export function asakuraOosawaReducedB2(q: number, polymerReservoir: number): number {
  requirePositive('q', q, 'a size ratio R_g/a');
  requireInRange('polymerReservoir', polymerReservoir, 0, Infinity, { what: 'a reservoir polymer fraction', lowEnd: 'closed' });
  if (polymerReservoir === 0) return 1;
  // The overlap potential is smooth on the whole range [1, 1 + q]: no scan for well edges needed.
  return reducedB2FromPotential((x) => asakuraOosawaEnergyUnchecked(x, q, polymerReservoir), 1 + q, { contactScan: false });
}
