import { brentMinimize } from '../numerics/brent-minimize';
import { branchAtChemicalPotential } from '../numerics/two-phase-coexistence';
import { LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { freeVolumeBranch } from './free-volume-branches';
import { freeVolumeSolidBranch } from './free-volume-branches';
import { requireSizeRatio } from './free-volume-limits';
import { freeVolumeSpinodalPolymer } from './free-volume-spinodal-polymer';

export interface FreeVolumeCriticalPoint {
  phi: number;
  polymerReservoir: number;
  /** False when the critical point lies inside fluid–crystal coexistence (gas–liquid metastable). */
  stable: boolean;
  /**
   * True when the minimum lies at or above FCC close packing φ_cp = 0.7405 (q below about 0.049):
   * the theory's critical fluid is denser than any packing of spheres, so the point is formal.
   */
  beyondClosePacking: boolean;
}

/**
 * Upper end of the critical-point search. The spinodal polymer fraction has a single minimum,
 * which moves towards φ = 1 as q → 0 (0.739 at q = 0.05, 0.948 at q = 0.005): searching only the
 * fluid range (to 0.70) returned its edge for q below 0.062.
 */
const CRITICAL_SEARCH_END = LIQUID_BRANCH_LIMIT;

/**
 * Gas–liquid critical point of colloid + ideal polymer in free-volume theory at size ratio q:
 * the minimum over φ of the spinodal polymer fraction φ_p^R,s(φ) = q³(β∂P/∂ρ)_CS/(φα″)
 * (Brent minimisation on 1e-4 < φ < 0.99, φ to ~1e-9). `stable` compares the crystal with the critical fluid at the
 * same chemical potential: the critical point is stable when the crystal's pressure there is lower.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992); Lekkerkerker & Tuinier,
 * *Colloids and the Depletion Interaction* (Springer, 2011), ch. 3.
 *
 * @param q size ratio R_g/a, 0 < q ≤ 5.
 * @throws PhysicsArgumentError for q outside (0, 5], NaN or ±Infinity.
 * `beyondClosePacking` flags a minimum at or above φ_cp (q ≲ 0.049), and one at the end of
 * the search (q ≲ 0.003), where the true minimum lies further still.
 * @example freeVolumeCriticalPoint(0.5).stable // true (q above the critical endpoint 0.3275)
 */
export function freeVolumeCriticalPoint(q: number): FreeVolumeCriticalPoint {
  requireSizeRatio(q);
  const { phi, polymerReservoir, stable, beyondClosePacking } = freeVolumeCriticalPointUnchecked(q);
  return { phi, polymerReservoir, stable, beyondClosePacking };
}

/**
 * Critical point without argument checks, with the crystal-minus-fluid pressure at the critical
 * μ (−Infinity when no crystal exists at that μ) for the critical-endpoint search. Internal.
 */
export function freeVolumeCriticalPointUnchecked(q: number): FreeVolumeCriticalPoint & { stabilityMargin: number } {
  // α″ can underflow at high φ for large q (φ_p^R,s → Infinity or NaN): treat both as "far above".
  const spinodalPolymer = (phi: number) => {
    const value = freeVolumeSpinodalPolymer(phi, q);
    return Number.isNaN(value) ? Infinity : value;
  };
  const minimum = brentMinimize(spinodalPolymer, 1e-4, CRITICAL_SEARCH_END, 1e-11);
  const phi = minimum.x;
  const polymerReservoir = minimum.value;
  const fluid = freeVolumeBranch('fluid', q, polymerReservoir, 1e-300, 0.7);
  const solid = freeVolumeSolidBranch(q, polymerReservoir);
  const mu = fluid.chemicalPotential(phi);
  const phiSolid = branchAtChemicalPotential(solid, mu);
  // Crystal pressure minus fluid pressure at equal μ: negative means the fluid is stable.
  const stabilityMargin = phiSolid === null ? -Infinity : solid.pressure(phiSolid) - fluid.pressure(phi);
  const beyondClosePacking = phi >= FCC_CLOSE_PACKING;
  // A critical fluid denser than close packing is never the stable state, whatever the formulas say.
  return { phi, polymerReservoir, stable: stabilityMargin < 0 && !beyondClosePacking, beyondClosePacking, stabilityMargin };
}
