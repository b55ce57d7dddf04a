import { brentRoot } from '../numerics/brent-root';
import { envelopeCoexistence } from '../numerics/two-phase-coexistence';
import { freeVolumeSolidBranch } from './free-volume-branches';
import { freeVolumeFluidPieces } from './free-volume-fluid-pieces';
import { requireReservoirPolymer, requireSizeRatio } from './free-volume-limits';

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
 * @returns `{ fluid, solid }` volume fractions. At small q with large φ_p^R the gas is extremely
 *   dilute (1e-180 at q = 0.4, φ_p^R = 20) and is found in the dilute limit (crystalAgainstDiluteGas);
 *   `fluid` is 0 once it underflows double precision (q ≤ 0.2 with φ_p^R ≳ 15).
 * @throws PhysicsArgumentError for arguments outside those ranges, NaN or ±Infinity.
 * @example freeVolumeFluidSolidCoexistence(0.1, 0) // { fluid: 0.49238..., solid: 0.54236... }
 */
export function freeVolumeFluidSolidCoexistence(q: number, polymerReservoir: number): { fluid: number; solid: number } {
  requireSizeRatio(q);
  requireReservoirPolymer(polymerReservoir);
  const point = freeVolumeFluidSolidUnchecked(q, polymerReservoir);
  if (point !== null) return { fluid: point.fluid, solid: point.solid };
  const dilute = crystalAgainstDiluteGas(q, polymerReservoir);
  if (dilute === null) throw new Error(`freeVolumeFluidSolidCoexistence: no coexistence found at q=${q}, polymerReservoir=${polymerReservoir} (internal error)`);
  return dilute;
}

/**
 * Crystal–gas coexistence when the gas is so dilute (φ_gas < 1e-16) that the general solver's
 * bracket (which starts at φ = 1e-300) fails, e.g. q ≤ 0.4 with φ_p^R ≳ 15. As φ_gas → 0 the gas's
 * pressure tends to the reservoir polymer's, p̃ → φ_p^R/q³ (α(0) = 1), and its chemical potential to
 * ln φ_gas + (φ_p^R/q³)(1 + A), A = 3q + 3q² + q³ (α′(0) = −(1 + A)), both with corrections of
 * relative order φ_gas, below double precision here. So the crystal is the one at p̃ = φ_p^R/q³ and
 * φ_gas = exp(βμ_solid − (φ_p^R/q³)(1 + A)), which is 0 once it underflows (below ~1e-308).
 * Returns null when no crystal has that pressure or the gas would not be that dilute.
 *
 * Source: Lekkerkerker et al., Europhys. Lett. 20, 559 (1992) (the same free energies). Internal.
 */
export function crystalAgainstDiluteGas(q: number, polymerReservoir: number): { fluid: number; solid: number } | null {
  const osmotic = polymerReservoir / (q * q * q);
  const solid = freeVolumeSolidBranch(q, polymerReservoir);
  const phi = brentRoot((x) => solid.pressure(x) - osmotic, solid.low, solid.high, { absoluteTolerance: 1e-15 });
  if (phi === null) return null;
  const logGas = solid.chemicalPotential(phi) - osmotic * (1 + 3 * q + 3 * q * q + q * q * q);
  return logGas < Math.log(1e-16) ? { fluid: Math.exp(logGas), solid: phi } : null;
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
