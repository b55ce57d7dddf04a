import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Carnahan–Starling excess chemical potential of the hard-sphere fluid,
 * βμ_ex = (8φ − 9φ² + 3φ³)/(1 − φ)³ = βF_ex/N + Z − 1, in units of kT.
 *
 * Source: N. F. Carnahan & K. E. Starling, J. Chem. Phys. 51, 635 (1969).
 *
 * @param phi volume fraction, 0 < φ < φ_cp = π/√18.
 * @throws PhysicsArgumentError if φ is not in (0, φ_cp).
 * @example carnahanStarlingExcessChemicalPotential(0.5) // 17
 */
export function carnahanStarlingExcessChemicalPotential(phi: number): number {
  requireVolumeFraction('phi', phi);
  return (8 * phi - 9 * phi * phi + 3 * phi * phi * phi) / (1 - phi) ** 3;
}
