import { LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { brentRoot } from '../numerics/brent-root';
import { branchAtChemicalPotential, twoBranchCoexistence } from '../numerics/two-phase-coexistence';
import { freeVolumeCriticalPointUnchecked } from './free-volume-critical-point';
import { freeVolumeFluidPieces } from './free-volume-fluid-pieces';
import { freeVolumeSolidBranch } from './free-volume-branches';
import { FREE_VOLUME_MAX_POLYMER, requireSizeRatio } from './free-volume-limits';

export interface FreeVolumeTriplePoint {
  polymerReservoir: number;
  gas: number;
  liquid: number;
  solid: number;
}

/**
 * Gas–liquid–crystal triple point of free-volume theory at size ratio q: the reservoir polymer
 * fraction at which the crystal's pressure, at the gas–liquid coexistence chemical potential,
 * equals the coexistence pressure (Brent on φ_p^R, tolerance 1e-12).
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 *
 * @param q size ratio, 0 < q ≤ 5.
 * @returns the triple point, or `null` when the gas–liquid critical point is metastable
 *   (q below the critical endpoint 0.3275): there is then no triple point.
 * @throws PhysicsArgumentError for q outside (0, 5], NaN or ±Infinity.
 * @example freeVolumeTriplePoint(0.6)?.polymerReservoir // 1.33556
 */
export function freeVolumeTriplePoint(q: number): FreeVolumeTriplePoint | null {
  requireSizeRatio(q);
  return freeVolumeTriplePointUnchecked(q);
}

/** Triple point without argument checks (internal). */
export function freeVolumeTriplePointUnchecked(q: number): FreeVolumeTriplePoint | null {
  const critical = freeVolumeCriticalPointUnchecked(q);
  if (!critical.stable) return null;
  const gasLiquidAt = (polymerReservoir: number) => {
    const { pieces } = freeVolumeFluidPieces(q, polymerReservoir, critical, LIQUID_BRANCH_LIMIT);
    if (pieces.length < 2) return null;
    return twoBranchCoexistence(pieces[0], pieces[1]);
  };
  // Crystal pressure minus gas–liquid pressure at the coexistence μ: < 0 while gas–liquid is stable.
  const excess = (polymerReservoir: number) => {
    const point = gasLiquidAt(polymerReservoir);
    if (point === null) return NaN;
    const solid = freeVolumeSolidBranch(q, polymerReservoir);
    const phiSolid = branchAtChemicalPotential(solid, point.chemicalPotential);
    if (phiSolid === null) return solid.chemicalPotential(solid.low) > point.chemicalPotential ? -1 : 1;
    return solid.pressure(phiSolid) - point.pressure;
  };
  const low = critical.polymerReservoir * (1 + 1e-6);
  let high = critical.polymerReservoir * 1.5;
  while (!(excess(high) > 0) && high < FREE_VOLUME_MAX_POLYMER) high *= 1.5;
  const polymerReservoir = brentRoot(excess, low, Math.min(high, FREE_VOLUME_MAX_POLYMER), { absoluteTolerance: 1e-12 });
  if (polymerReservoir === null) return null;
  const point = gasLiquidAt(polymerReservoir);
  const phiSolid = point && branchAtChemicalPotential(freeVolumeSolidBranch(q, polymerReservoir), point.chemicalPotential);
  if (!point || phiSolid === null || phiSolid === undefined) return null;
  return { polymerReservoir, gas: point.first, liquid: point.second, solid: phiSolid };
}
