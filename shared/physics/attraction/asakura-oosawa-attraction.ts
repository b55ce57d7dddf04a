import { asakuraOosawaContactEnergy } from './asakura-oosawa-contact-energy';
import { asakuraOosawaReducedB2 } from './asakura-oosawa-reduced-b2';
import { stickinessFromReducedB2 } from './stickiness-from-reduced-b2';

export interface DepletionAttraction {
  /** Depth of the attraction at contact, U/kT = φ_p^R(1 + 3/(2q)) (positive). */
  contactEnergy: number;
  /** Width of the well beyond contact in units of σ: the depletion layers overlap out to σ(1 + q). */
  range: number;
  /** B2* by quadrature of the Mayer function. */
  b2: number;
  /** Baxter τ with the same B2* (Noro–Frenkel), or null without attraction (B2* = 1, τ = ∞). */
  tau: number | null;
}

/**
 * Every description of an Asakura–Oosawa depletion attraction at once: contact depth U/kT,
 * range (q, in σ), B2* (adaptive quadrature, relative tolerance 1e-11) and τ = 1/(4(1 − B2*)).
 *
 * Source: Asakura & Oosawa, J. Chem. Phys. 22, 1255 (1954); Noro & Frenkel, J. Chem. Phys. 113,
 * 2941 (2000) for τ.
 *
 * @param q size ratio R_g/a, q > 0.
 * @param polymerReservoir reservoir polymer fraction φ_p^R ≥ 0 (contact depth ≤ 700 kT).
 * @throws PhysicsArgumentError for q ≤ 0, φ_p^R < 0, a contact depth beyond 700 kT, NaN or ±Infinity.
 * @example asakuraOosawaAttraction(0.1, 0.25) // { contactEnergy: 4, range: 0.1, b2: -1.25590589…, tau: 0.1108203… }
 */
export function asakuraOosawaAttraction(q: number, polymerReservoir: number): DepletionAttraction {
  const contactEnergy = -asakuraOosawaContactEnergy(q, polymerReservoir);
  const b2 = asakuraOosawaReducedB2(q, polymerReservoir);
  return { contactEnergy, range: q, b2, tau: b2 < 1 ? stickinessFromReducedB2(b2) : null };
}
