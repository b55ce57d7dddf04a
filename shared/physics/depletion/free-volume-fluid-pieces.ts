import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { brentRoot } from '../numerics/brent-root';
import { FLUID_BRANCH_LIMIT, LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { freeVolumeBranch } from './free-volume-branches';
import { freeVolumeCriticalPointUnchecked } from './free-volume-critical-point';
import { freeVolumeSpinodalPolymer } from './free-volume-spinodal-polymer';

/**
 * The fluid of free-volume theory at (q, φ_p^R) cut into pieces on which p̃ rises: one piece
 * below the critical polymer fraction, a gas and a liquid piece separated by the spinodal above
 * it. Internal, unchecked. `critical` may be passed to avoid recomputing it; `liquidLimit` is the
 * top of the liquid piece (0.7 against the crystal, 0.99 for gas–liquid coexistence).
 */
export function freeVolumeFluidPieces(
  q: number,
  polymerReservoir: number,
  critical = freeVolumeCriticalPointUnchecked(q),
  liquidLimit = FLUID_BRANCH_LIMIT,
): { pieces: PhaseBranch[]; spinodal: { low: number; high: number; denseRoot: number | null } | null } {
  if (polymerReservoir <= critical.polymerReservoir) {
    return { pieces: [freeVolumeBranch('fluid', q, polymerReservoir, 1e-300, liquidLimit)], spinodal: null };
  }
  // At high φ (and large q) α″ underflows and φ_p^R,s overflows: cap it so the bracket stays finite.
  const excess = (phi: number) => {
    const onSpinodal = freeVolumeSpinodalPolymer(phi, q);
    return (Number.isFinite(onSpinodal) ? onSpinodal : 1e300) - polymerReservoir;
  };
  const low = brentRoot(excess, 1e-12, critical.phi, { absoluteTolerance: 1e-16 });
  const high = brentRoot(excess, critical.phi, LIQUID_BRANCH_LIMIT, { absoluteTolerance: 1e-16 });
  const pieces: PhaseBranch[] = [];
  if (low !== null) pieces.push(freeVolumeBranch('fluid', q, polymerReservoir, 1e-300, low));
  if (high !== null && high < liquidLimit) pieces.push(freeVolumeBranch('fluid', q, polymerReservoir, high, liquidLimit));
  // `high` stays usable as the end of the gas–liquid region (the search bound when the dense root
  // is missing); `denseRoot` says whether that end is a real root (null: none below φ = 0.99).
  return { pieces, spinodal: low !== null ? { low, high: high ?? LIQUID_BRANCH_LIMIT, denseRoot: high } : null };
}
