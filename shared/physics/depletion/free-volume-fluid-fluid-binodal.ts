import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { LIQUID_BRANCH_LIMIT } from '../hard-spheres/hard-sphere-branches';
import { twoBranchCoexistence } from '../numerics/two-phase-coexistence';
import { freeVolumeFluidPieces } from './free-volume-fluid-pieces';
import { requireReservoirPolymer, requireSizeRatio } from './free-volume-limits';

/**
 * Gas–liquid binodal of colloid + ideal polymer in free-volume theory at (q, φ_p^R): equal p̃
 * and βμ of the fluid branch below and above the spinodal (Brent in βμ, Newton polish; the
 * residuals |Δp̃|, |Δβμ| are below 1e-12). Returned whether or not it is stable against the
 * crystal: below q ≈ 0.33 it is metastable (inside fluid–crystal coexistence) and is drawn dashed.
 * At small q the theory's liquid lies at or above close packing φ_cp (it is searched up to
 * φ = 0.99); such a formal solution is reported as no coexistence (null), never as a liquid.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 *
 * @param q size ratio, 0 < q ≤ 5.
 * @param polymerReservoir reservoir polymer fraction, 0 ≤ φ_p^R ≤ 20.
 * @returns `{ gas, liquid }` with liquid < φ_cp, or `null` at or below the critical polymer
 *   fraction and where the liquid would reach close packing.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example freeVolumeFluidFluidBinodal(0.5, 1.0) // { gas: 0.000401693, liquid: 0.514167 }
 */
export function freeVolumeFluidFluidBinodal(q: number, polymerReservoir: number): { gas: number; liquid: number } | null {
  requireSizeRatio(q);
  requireReservoirPolymer(polymerReservoir);
  const { pieces, spinodal } = freeVolumeFluidPieces(q, polymerReservoir, undefined, LIQUID_BRANCH_LIMIT);
  if (spinodal === null || pieces.length < 2) return null;
  const point = twoBranchCoexistence(pieces[0], pieces[1]);
  // A liquid at or beyond close packing is no liquid: the theory's formal solution is not returned.
  return point === null || point.second >= FCC_CLOSE_PACKING ? null : { gas: point.first, liquid: point.second };
}
