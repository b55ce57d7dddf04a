import { FCC_CLOSE_PACKING } from './close-packing';

/**
 * Additive constant of the cell-model free energy per particle, chosen (Lekkerkerker et al.
 * 1992) so that the cell solid coexists with the Carnahan–Starling fluid near the simulated
 * hard-sphere freezing point.
 */
export const CELL_MODEL_FREE_ENERGY_CONSTANT = 2.1306;

/**
 * Cell-model hard-sphere crystal (FCC) as used in free-volume theory:
 * βF/N = 2.1306 + 3 ln[φ/(1 − φ/φ_cp)], Z = 3/(1 − φ/φ_cp),
 * βμ = βF/N + Z, reduced pressure p̃ = φZ, all in units of kT; φ_cp = π/√18.
 *
 * Source: H. N. W. Lekkerkerker, W. C.-K. Poon, P. N. Pusey, A. Stroobants & P. B. Warren,
 * Europhys. Lett. 20, 559 (1992).
 *
 * Internal: callers have validated 0 < φ < φ_cp. Returns the four quantities at once because the
 * coexistence solvers need them together.
 *
 * @example cellModelSolid(0.6).compressibility // 15.8131671802...
 */
export function cellModelSolid(phi: number): { freeEnergy: number; compressibility: number; chemicalPotential: number; pressureDerivative: number } {
  const packing = 1 - phi / FCC_CLOSE_PACKING;
  const freeEnergy = CELL_MODEL_FREE_ENERGY_CONSTANT + 3 * Math.log(phi / packing);
  const compressibility = 3 / packing;
  // d(φZ)/dφ = 3/packing + 3(φ/φ_cp)/packing² = 3/packing²
  const pressureDerivative = 3 / (packing * packing);
  return { freeEnergy, compressibility, chemicalPotential: freeEnergy + compressibility, pressureDerivative };
}
