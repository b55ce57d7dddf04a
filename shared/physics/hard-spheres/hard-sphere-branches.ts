import type { PhaseBranch } from '../numerics/two-phase-coexistence';
import { FCC_CLOSE_PACKING } from './close-packing';
import { cellModelSolid } from './cell-model-solid';

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

/**
 * Carnahan–Starling fluid as a coexistence branch: p̃ = φZ_CS, βμ = ln φ + βμ_ex,CS,
 * dp̃/dφ = (1 + 4φ + 4φ² − 4φ³ + φ⁴)/(1 − φ)⁴ (Carnahan & Starling, J. Chem. Phys. 51, 635
 * (1969)); the de Broglie term is dropped (it cancels at coexistence). Internal, unchecked.
 */
export function carnahanStarlingBranch(low = 1e-300, high = FLUID_BRANCH_LIMIT): PhaseBranch {
  return {
    low,
    high,
    pressure: (phi) => (phi * (1 + phi + phi * phi - phi * phi * phi)) / (1 - phi) ** 3,
    chemicalPotential: (phi) => Math.log(phi) + (8 * phi - 9 * phi * phi + 3 * phi * phi * phi) / (1 - phi) ** 3,
    pressureDerivative: (phi) => {
      const phi2 = phi * phi;
      return (1 + 4 * phi + 4 * phi2 - 4 * phi2 * phi + phi2 * phi2) / (1 - phi) ** 4;
    },
  };
}

/**
 * Cell-model FCC solid as a coexistence branch (Lekkerkerker et al., Europhys. Lett. 20, 559
 * (1992)): p̃ = 3φ/(1 − φ/φ_cp), βμ = 2.1306 + 3 ln[φ/(1 − φ/φ_cp)] + 3/(1 − φ/φ_cp).
 * Internal, unchecked.
 */
export function cellModelSolidBranch(low = 1e-6, high = FCC_CLOSE_PACKING * (1 - 1e-12)): PhaseBranch {
  return {
    low,
    high,
    pressure: (phi) => phi * cellModelSolid(phi).compressibility,
    chemicalPotential: (phi) => cellModelSolid(phi).chemicalPotential,
    pressureDerivative: (phi) => cellModelSolid(phi).pressureDerivative,
  };
}
