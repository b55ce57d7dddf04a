import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { brentRoot } from '../numerics/brent-root';
import { envelopeCoexistence, type PhaseBranch } from '../numerics/two-phase-coexistence';
import { freeVolumeBranch } from './free-volume-branches';
import { freeVolumeFluidPieces } from './free-volume-fluid-pieces';
import { requireReservoirPolymer, requireSizeRatio } from './free-volume-limits';

/** Lowest φ used for the crystal branch (the crystal always coexists above melting, 0.5424). */
export const FREE_VOLUME_SOLID_LOW = 0.5;

/**
 * Stable fluid–crystal coexistence of colloid + ideal polymer in free-volume theory at
 * (q, φ_p^R): the crystal against the most stable fluid (gas or liquid) at equal βμ, equal p̃
 * (Brent in βμ over the stable envelope, Newton polish; residuals below 1e-12). Above the triple
 * point this is gas–crystal, below it liquid–crystal; at φ_p^R = 0 it is hard-sphere freezing
 * and melting.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992).
 *
 * @param q size ratio, 0 < q ≤ 5.
 * @param polymerReservoir reservoir polymer fraction, 0 ≤ φ_p^R ≤ 20.
 * @returns `{ fluid, solid }` volume fractions.
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example freeVolumeFluidSolidCoexistence(0.1, 0) // { fluid: 0.49238..., solid: 0.54236... }
 */
export function freeVolumeFluidSolidCoexistence(q: number, polymerReservoir: number): { fluid: number; solid: number } {
  requireSizeRatio(q);
  requireReservoirPolymer(polymerReservoir);
  const point = freeVolumeFluidSolidUnchecked(q, polymerReservoir);
  if (point === null) throw new Error(`freeVolumeFluidSolidCoexistence: no coexistence found at q=${q}, polymerReservoir=${polymerReservoir} (internal error)`);
  return { fluid: point.fluid, solid: point.solid };
}

/** Coexistence without checks; also says whether the fluid is the gas (true above the triple point). */
export function freeVolumeFluidSolidUnchecked(q: number, polymerReservoir: number): { fluid: number; solid: number; fluidIsGas: boolean; chemicalPotential: number; pressure: number } | null {
  const { pieces, spinodal } = freeVolumeFluidPieces(q, polymerReservoir);
  const solid = freeVolumeSolidBranch(q, polymerReservoir);
  const point = envelopeCoexistence(pieces, solid);
  if (point === null) return null;
  return {
    fluid: point.first,
    solid: point.second,
    fluidIsGas: spinodal !== null && point.first <= spinodal.low,
    chemicalPotential: point.chemicalPotential,
    pressure: point.pressure,
  };
}

/**
 * The crystal branch from max(0.5, the φ where its own dp̃/dφ turns positive) to close packing:
 * at small q the polymer term makes the crystal mechanically unstable at lower φ. Internal.
 */
export function freeVolumeSolidBranch(q: number, polymerReservoir: number): PhaseBranch {
  const trial = freeVolumeBranch('solid', q, polymerReservoir, FREE_VOLUME_SOLID_LOW, 1);
  if (trial.pressureDerivative(FREE_VOLUME_SOLID_LOW) > 0) return trial;
  const onset = brentRoot((phi) => trial.pressureDerivative(phi), FREE_VOLUME_SOLID_LOW, FCC_CLOSE_PACKING * (1 - 1e-9), { absoluteTolerance: 1e-14 });
  return freeVolumeBranch('solid', q, polymerReservoir, (onset ?? FREE_VOLUME_SOLID_LOW) * (1 + 1e-9), 1);
}
