import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Carnahan–Starling excess Helmholtz free energy per particle of the hard-sphere fluid,
 * βF_ex/N = φ(4 − 3φ)/(1 − φ)², in units of kT (the integral of (Z − 1)/φ from 0 to φ).
 *
 * Source: N. F. Carnahan & K. E. Starling, J. Chem. Phys. 51, 635 (1969).
 *
 * @param phi volume fraction, 0 < φ < φ_cp = π/√18.
 * @throws PhysicsArgumentError if φ is not in (0, φ_cp).
 * @example carnahanStarlingExcessFreeEnergy(0.5) // 5
 */
export function carnahanStarlingExcessFreeEnergy(phi: number): number {
  requireVolumeFraction('phi', phi);
  return (phi * (4 - 3 * phi)) / (1 - phi) ** 2;
}
