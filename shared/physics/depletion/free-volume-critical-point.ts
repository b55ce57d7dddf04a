import { brentMinimize } from '../numerics/brent-minimize';
import { branchAtChemicalPotential } from '../numerics/two-phase-coexistence';
import { FLUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { freeVolumeBranch } from './free-volume-branches';
import { freeVolumeSolidBranch } from './free-volume-fluid-solid-coexistence';
import { requireSizeRatio } from './free-volume-limits';
import { freeVolumeSpinodalPolymer } from './free-volume-spinodal-polymer';

export interface FreeVolumeCriticalPoint {
  phi: number;
  polymerReservoir: number;
  /** False when the critical point lies inside fluid–crystal coexistence (gas–liquid metastable). */
  stable: boolean;
}

/**
 * Gas–liquid critical point of colloid + ideal polymer in free-volume theory at size ratio q:
 * the minimum over φ of the spinodal polymer fraction φ_p^R,s(φ) = q³(β∂P/∂ρ)_CS/(φα″)
 * (Brent minimisation, φ to ~1e-9). `stable` compares the crystal with the critical fluid at the
 * same chemical potential: the critical point is stable when the crystal's pressure there is lower.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992); Lekkerkerker & Tuinier,
 * *Colloids and the Depletion Interaction* (Springer, 2011), ch. 3.
 *
 * @param q size ratio R_g/a, 0 < q ≤ 5.
 * @throws PhysicsArgumentError for q outside (0, 5], NaN or ±Infinity.
 * @example freeVolumeCriticalPoint(0.5).stable // true (q above the critical endpoint 0.3275)
 */
export function freeVolumeCriticalPoint(q: number): FreeVolumeCriticalPoint {
  requireSizeRatio(q);
  const { phi, polymerReservoir, stable } = freeVolumeCriticalPointUnchecked(q);
  return { phi, polymerReservoir, stable };
}

/**
 * Critical point without argument checks, with the crystal-minus-fluid pressure at the critical
 * μ (−Infinity when no crystal exists at that μ) for the critical-endpoint search. Internal.
 */
export function freeVolumeCriticalPointUnchecked(q: number): FreeVolumeCriticalPoint & { stabilityMargin: number } {
  const minimum = brentMinimize((phi) => freeVolumeSpinodalPolymer(phi, q), 1e-4, FLUID_BRANCH_LIMIT, 1e-11);
  const phi = minimum.x;
  const polymerReservoir = minimum.value;
  const fluid = freeVolumeBranch('fluid', q, polymerReservoir, 1e-300, 0.7);
  const solid = freeVolumeSolidBranch(q, polymerReservoir);
  const mu = fluid.chemicalPotential(phi);
  const phiSolid = branchAtChemicalPotential(solid, mu);
  // Crystal pressure minus fluid pressure at equal μ: negative means the fluid is stable.
  const stabilityMargin = phiSolid === null ? -Infinity : solid.pressure(phiSolid) - fluid.pressure(phi);
  return { phi, polymerReservoir, stable: stabilityMargin < 0, stabilityMargin };
}
