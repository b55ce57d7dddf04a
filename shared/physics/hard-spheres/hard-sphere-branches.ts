import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { CELL_MODEL_FREE_ENERGY_CONSTANT } from './cell-model-solid';
import { FCC_CLOSE_PACKING } from './close-packing';

/**
 * Highest φ at which a fluid branch is used in a coexistence search. Beyond φ ≈ 0.72 the
 * Carnahan–Starling pressure overtakes the cell solid's again at equal μ, a spurious second
 * crossing; stopping the fluid at 0.70 (well above random close packing, 0.64) keeps it out of
 * every bracket.
 */
export const FLUID_BRANCH_LIMIT = 0.7;

/**
 * Highest φ of a liquid branch in a fluid–fluid (gas–liquid) search, where no crystal competes:
 * strongly attractive liquids coexist above 0.7 in these theories (beyond the map, whose x axis
 * ends at φ_cp, but their gas side is still needed).
 */
export const LIQUID_BRANCH_LIMIT = 0.99;

// Scalar hard-sphere thermodynamics without allocation (the coexistence solvers call these
// millions of times while a map is built). Internal, unchecked.

/** Carnahan–Starling reduced pressure p̃ = φZ (J. Chem. Phys. 51, 635 (1969)). */
export function csPressure(phi: number): number {
  return (phi * (1 + phi + phi * phi - phi * phi * phi)) / (1 - phi) ** 3;
}

/** Carnahan–Starling βμ = ln φ + βμ_ex (de Broglie term dropped: it cancels at coexistence). */
export function csChemicalPotential(phi: number): number {
  return Math.log(phi) + (8 * phi - 9 * phi * phi + 3 * phi * phi * phi) / (1 - phi) ** 3;
}

/** Carnahan–Starling dp̃/dφ = (1 + 4φ + 4φ² − 4φ³ + φ⁴)/(1 − φ)⁴. */
export function csPressureDerivative(phi: number): number {
  const phi2 = phi * phi;
  return (1 + 4 * phi + 4 * phi2 - 4 * phi2 * phi + phi2 * phi2) / (1 - phi) ** 4;
}

/** Cell-model crystal p̃ = 3φ/(1 − φ/φ_cp) (Lekkerkerker et al., Europhys. Lett. 20, 559 (1992)). */
export function cellPressure(phi: number): number {
  return (3 * phi) / (1 - phi / FCC_CLOSE_PACKING);
}

/** Cell-model crystal βμ = 2.1306 + 3 ln[φ/(1 − φ/φ_cp)] + 3/(1 − φ/φ_cp). */
export function cellChemicalPotential(phi: number): number {
  const packing = 1 - phi / FCC_CLOSE_PACKING;
  return CELL_MODEL_FREE_ENERGY_CONSTANT + 3 * Math.log(phi / packing) + 3 / packing;
}

/** Cell-model crystal dp̃/dφ = 3/(1 − φ/φ_cp)². */
export function cellPressureDerivative(phi: number): number {
  const packing = 1 - phi / FCC_CLOSE_PACKING;
  return 3 / (packing * packing);
}

class CarnahanStarlingBranch implements PhaseBranch {
  constructor(readonly low: number, readonly high: number) {}
  pressure(phi: number): number { return csPressure(phi); }
  chemicalPotential(phi: number): number { return csChemicalPotential(phi); }
  pressureDerivative(phi: number): number { return csPressureDerivative(phi); }
}

class CellModelSolidBranch implements PhaseBranch {
  constructor(readonly low: number, readonly high: number) {}
  pressure(phi: number): number { return cellPressure(phi); }
  chemicalPotential(phi: number): number { return cellChemicalPotential(phi); }
  pressureDerivative(phi: number): number { return cellPressureDerivative(phi); }
}

/** Carnahan–Starling fluid as a coexistence branch on [low, high]. Internal, unchecked. */
export function carnahanStarlingBranch(low = 1e-300, high = FLUID_BRANCH_LIMIT): PhaseBranch {
  return new CarnahanStarlingBranch(low, high);
}

/** Cell-model FCC crystal as a coexistence branch on [low, high]. Internal, unchecked. */
export function cellModelSolidBranch(low = 1e-6, high = FCC_CLOSE_PACKING * (1 - 1e-12)): PhaseBranch {
  return new CellModelSolidBranch(low, high);
}
