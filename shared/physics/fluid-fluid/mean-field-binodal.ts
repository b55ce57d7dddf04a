import { LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { twoBranchCoexistence } from '../numerics/two-phase-coexistence';
import { requireInRange } from '../validation/require-in-range';
import { meanFieldFluidBranch } from './mean-field-branches';
import { MEAN_FIELD_MIN_B2, meanFieldSpinodal } from './mean-field-spinodal';

/**
 * Gas–liquid binodal of the CS fluid with mean-field attraction at a given B2*: the pair
 * (φ_gas, φ_liquid) with equal p̃ = φZ_CS − Aφ² and equal βμ = ln φ + βμ_ex,CS − 2Aφ,
 * A = 4(1 − B2*). The gas lies below the spinodal's low end, the liquid above its high end;
 * bracketing in βμ (Brent) then a Newton polish give |Δp̃|, |Δβμ| < 1e-12.
 *
 * Source: van der Waals construction with the Carnahan–Starling reference (CS: J. Chem. Phys.
 * 51, 635 (1969)); Gelwright's "approximate binodal".
 *
 * @param b2 reduced second virial coefficient, −20 ≤ B2* < ∞.
 * @returns `{ gas, liquid }`, or `null` when B2* ≥ B2*_c = −1.6503 (above the critical point).
 * @throws PhysicsArgumentError for B2* < −20, NaN or ±Infinity.
 * @example meanFieldBinodal(-3) // { gas: 0.0063948509..., liquid: 0.3762911246... }
 */
export function meanFieldBinodal(b2: number): { gas: number; liquid: number } | null {
  requireInRange('b2', b2, MEAN_FIELD_MIN_B2, Infinity, { what: 'a reduced second virial coefficient', lowEnd: 'closed' });
  const spinodal = meanFieldSpinodal(b2);
  if (spinodal === null || spinodal.high >= LIQUID_BRANCH_LIMIT) return null;
  const gas = meanFieldFluidBranch(b2, 1e-300, spinodal.low);
  const liquid = meanFieldFluidBranch(b2, spinodal.high, LIQUID_BRANCH_LIMIT);
  const point = twoBranchCoexistence(gas, liquid);
  return point === null ? null : { gas: point.first, liquid: point.second };
}
