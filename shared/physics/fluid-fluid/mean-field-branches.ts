import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import { cellModelSolid } from '../hard-spheres/cell-model-solid';
import { carnahanStarlingBranch } from '../hard-spheres/hard-sphere-branches';
import type { PhaseBranch } from '../numerics/two-phase-coexistence';

/**
 * Mean-field attraction strength A = 4(1 − B2*): the van der Waals term −Aφ² in p̃ that makes
 * the second virial coefficient of p̃ = φ + 4B2*φ² + … equal to B2*.
 */
export function meanFieldStrength(b2: number): number {
  return 4 * (1 - b2);
}

/**
 * Carnahan–Starling fluid with a mean-field (van der Waals) attraction, as a coexistence branch:
 * p̃ = φZ_CS − Aφ², βμ = ln φ + βμ_ex,CS − 2Aφ, dp̃/dφ = β∂P/∂ρ|_CS − 2Aφ.
 * Internal, unchecked; `low`/`high` must bound a piece where dp̃/dφ ≥ 0.
 */
export function meanFieldFluidBranch(b2: number, low: number, high: number): PhaseBranch {
  const strength = meanFieldStrength(b2);
  const fluid = carnahanStarlingBranch();
  return {
    low,
    high,
    pressure: (phi) => fluid.pressure(phi) - strength * phi * phi,
    chemicalPotential: (phi) => fluid.chemicalPotential(phi) - 2 * strength * phi,
    pressureDerivative: (phi) => fluid.pressureDerivative(phi) - 2 * strength * phi,
  };
}

/**
 * Cell-model solid with the same mean-field attraction (the van der Waals treatment of both
 * phases, as in Daanoun, Tejero & Baus, Phys. Rev. E 50, 2913 (1994)): p̃ = 3φ/(1 − φ/φ_cp) −
 * Aφ², βμ = βμ_cell − 2Aφ. Internal, unchecked.
 */
export function meanFieldSolidBranch(b2: number, low: number, high = FCC_CLOSE_PACKING * (1 - 1e-12)): PhaseBranch {
  const strength = meanFieldStrength(b2);
  return {
    low,
    high,
    pressure: (phi) => phi * cellModelSolid(phi).compressibility - strength * phi * phi,
    chemicalPotential: (phi) => cellModelSolid(phi).chemicalPotential - 2 * strength * phi,
    pressureDerivative: (phi) => cellModelSolid(phi).pressureDerivative - 2 * strength * phi,
  };
}
