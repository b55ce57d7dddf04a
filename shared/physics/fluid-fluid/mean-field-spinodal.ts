import { brentRoot } from '../numerics/brent-root';
import { requireInRange } from '../validation/require-in-range';
import { meanFieldStrength } from './mean-field-branches';
import { meanFieldCriticalPointShared } from './mean-field-critical-point';
import { meanFieldSpinodalStrength } from './mean-field-spinodal-strength';

/** Most negative B2* the mean-field fluid–fluid functions accept (the coexisting liquid is then at φ ≈ 0.68). */
export const MEAN_FIELD_MIN_B2 = -20;

/**
 * Spinodal of the CS fluid with mean-field attraction at a given B2*: the two volume fractions
 * where dp̃/dφ = 0, i.e. A_s(φ) = 4(1 − B2*) with A_s = (β∂P/∂ρ)_CS/(2φ), one on each side of
 * the critical φ_c = 0.13044 (Brent, tolerance 1e-15).
 *
 * Source: van der Waals construction with the Carnahan–Starling reference (CS: J. Chem. Phys.
 * 51, 635 (1969)).
 *
 * @param b2 reduced second virial coefficient, −20 ≤ B2* < ∞.
 * @returns `{ low, high }`, or `null` when B2* ≥ B2*_c = −1.6503 (no spinodal above the critical point).
 * @throws PhysicsArgumentError for B2* < −20, NaN or ±Infinity.
 * @example meanFieldSpinodal(-3) // { low: 0.0444206869..., high: 0.2854451895... }
 */
export function meanFieldSpinodal(b2: number): { low: number; high: number } | null {
  requireInRange('b2', b2, MEAN_FIELD_MIN_B2, Infinity, { what: 'a reduced second virial coefficient', lowEnd: 'closed' });
  return meanFieldSpinodalUnchecked(b2);
}

/** The spinodal without argument checks (internal). */
export function meanFieldSpinodalUnchecked(b2: number): { low: number; high: number } | null {
  const critical = meanFieldCriticalPointShared();
  if (b2 >= critical.b2) return null;
  const strength = meanFieldStrength(b2);
  const excess = (phi: number) => meanFieldSpinodalStrength(phi) - strength;
  const low = brentRoot(excess, 1e-12, critical.phi, { absoluteTolerance: 1e-16 });
  const high = brentRoot(excess, critical.phi, 0.99, { absoluteTolerance: 1e-16 });
  if (low === null || high === null) return null;
  return { low, high };
}
