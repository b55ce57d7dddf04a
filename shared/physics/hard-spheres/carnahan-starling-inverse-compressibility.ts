import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Carnahan–Starling inverse compressibility of the hard-sphere fluid,
 * β∂P/∂ρ = d(φZ)/dφ = (1 + 4φ + 4φ² − 4φ³ + φ⁴)/(1 − φ)⁴ (dimensionless); the derivative of
 * the reduced pressure p̃ = φZ. It enters every spinodal (dp̃/dφ = 0).
 *
 * Source: differentiation of the Carnahan–Starling equation of state (J. Chem. Phys. 51, 635
 * (1969)).
 *
 * @param phi volume fraction, 0 < φ < φ_cp = π/√18.
 * @throws PhysicsArgumentError if φ is not in (0, φ_cp).
 * @example carnahanStarlingInverseCompressibility(0.5) // 26
 */
export function carnahanStarlingInverseCompressibility(phi: number): number {
  requireVolumeFraction('phi', phi);
  const phi2 = phi * phi;
  return (1 + 4 * phi + 4 * phi2 - 4 * phi2 * phi + phi2 * phi2) / (1 - phi) ** 4;
}
