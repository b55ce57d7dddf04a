import { FCC_CLOSE_PACKING } from '../hard-spheres/close-packing';
import {
  cellChemicalPotential,
  cellPressure,
  cellPressureDerivative,
  csChemicalPotential,
  csPressure,
  csPressureDerivative,
} from '../hard-spheres/hard-sphere-branches';
import type { PhaseBranch } from '../numerics/two-phase-coexistence';

/**
 * Mean-field attraction strength A = 4(1 − B2*): the van der Waals term −Aφ² in p̃ that makes
 * the second virial coefficient of p̃ = φ + 4B2*φ² + … equal to B2*.
 */
export function meanFieldStrength(b2: number): number {
  return 4 * (1 - b2);
}

/**
 * A hard-sphere phase (CS fluid or cell crystal) with the mean-field attraction:
 * p̃ = p̃_HS − Aφ², βμ = βμ_HS − 2Aφ, dp̃/dφ = p̃′_HS − 2Aφ. Internal, unchecked.
 */
class MeanFieldBranch implements PhaseBranch {
  readonly #strength: number;
  readonly #solid: boolean;
  constructor(b2: number, solid: boolean, readonly low: number, readonly high: number) {
    this.#strength = meanFieldStrength(b2);
    this.#solid = solid;
  }
  pressure(phi: number): number {
    return (this.#solid ? cellPressure(phi) : csPressure(phi)) - this.#strength * phi * phi;
  }
  chemicalPotential(phi: number): number {
    return (this.#solid ? cellChemicalPotential(phi) : csChemicalPotential(phi)) - 2 * this.#strength * phi;
  }
  pressureDerivative(phi: number): number {
    return (this.#solid ? cellPressureDerivative(phi) : csPressureDerivative(phi)) - 2 * this.#strength * phi;
  }
}

/**
 * Carnahan–Starling fluid with a mean-field (van der Waals) attraction, as a coexistence branch
 * on [low, high], which must be a piece where dp̃/dφ ≥ 0. Internal, unchecked.
 */
export function meanFieldFluidBranch(b2: number, low: number, high: number): PhaseBranch {
  return new MeanFieldBranch(b2, false, low, high);
}

/**
 * Cell-model solid with the same mean-field attraction (the van der Waals treatment of both
 * phases, as in Daanoun, Tejero & Baus, Phys. Rev. E 50, 2913 (1994)). Internal, unchecked.
 */
export function meanFieldSolidBranch(b2: number, low: number, high = FCC_CLOSE_PACKING * (1 - 1e-12)): PhaseBranch {
  return new MeanFieldBranch(b2, true, low, high);
}
