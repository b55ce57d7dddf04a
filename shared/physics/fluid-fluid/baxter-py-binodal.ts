import { LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { twoBranchCoexistence } from '../numerics/two-phase-coexistence';
import { requireInRange } from '../validation/require-in-range';
import { baxterFluidBranch } from './baxter-py-branch';
import { baxterBandUnchecked } from './baxter-py-no-solution-band';

/** Smallest stickiness the Percus–Yevick binodal accepts (B2* = 1 − 1/(4τ) ≈ −24). */
export const BAXTER_MIN_TAU = 0.01;

/**
 * Gas–liquid binodal of Baxter adhesive spheres in the Percus–Yevick compressibility route:
 * equal p̃ and βμ (closed forms, see baxterPYPressure and baxterPYChemicalPotential) between a
 * gas below the no-solution band and a liquid above it (Brent in βμ, then Newton polish;
 * |Δp̃|, |Δβμ| < 1e-12).
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968). The liquid's chemical potential is the
 * closed form continued across the band (the band itself has no solution).
 *
 * @param tau stickiness, 0.01 ≤ τ < ∞.
 * @returns `{ gas, liquid }`, or `null` for τ ≥ τ_c = 0.0976311 (above the critical point) or
 *   when no coexisting pair exists outside the band (reported as "no solution").
 * @throws PhysicsArgumentError for τ < 0.01, NaN or ±Infinity.
 * @example baxterPYBinodal(0.09) // { gas: 0.049089181..., liquid: 0.315220626... }
 */
export function baxterPYBinodal(tau: number): { gas: number; liquid: number } | null {
  requireInRange('tau', tau, BAXTER_MIN_TAU, Infinity, { what: 'a Baxter stickiness τ', lowEnd: 'closed' });
  const band = baxterBandUnchecked(tau);
  if (band === null) return null;
  const gas = baxterFluidBranch(tau, 1e-300, band.low * (1 - 1e-12));
  const liquid = baxterFluidBranch(tau, band.high * (1 + 1e-12), LIQUID_BRANCH_LIMIT);
  const point = twoBranchCoexistence(gas, liquid);
  return point === null ? null : { gas: point.first, liquid: point.second };
}
