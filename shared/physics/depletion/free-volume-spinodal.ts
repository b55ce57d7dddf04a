import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { requireReservoirPolymer, requireSizeRatio } from './free-volume-limits';
import { freeVolumeFluidPieces } from './free-volume-fluid-pieces';

/**
 * Fluid–fluid spinodal of free-volume theory at (q, φ_p^R): the two volume fractions where
 * dp̃/dφ = 0, i.e. φ_p^R,s(φ) = φ_p^R with φ_p^R,s = q³(β∂P/∂ρ)_CS/(φα″) (Brent, 1e-16).
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 *
 * @param q size ratio, 0 < q ≤ 5.
 * @param polymerReservoir reservoir polymer fraction, 0 ≤ φ_p^R ≤ 20.
 * @returns `{ low, high }`, or `null` at or below the critical polymer fraction. `high` is `null`
 *   when the dense side has no root below close packing φ_cp = 0.7405 (small q: the liquid's
 *   limit of stability would be denser than any packing, or no root exists up to φ = 0.99).
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example freeVolumeSpinodal(0.5, 1.0) // { low: 0.0555679, high: 0.4160791 }
 */
export function freeVolumeSpinodal(q: number, polymerReservoir: number): { low: number; high: number | null } | null {
  requireSizeRatio(q);
  requireReservoirPolymer(polymerReservoir);
  const spinodal = freeVolumeFluidPieces(q, polymerReservoir).spinodal;
  if (spinodal === null) return null;
  const dense = spinodal.denseRoot;
  return { low: spinodal.low, high: dense !== null && dense < FCC_CLOSE_PACKING ? dense : null };
}
