import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Carnahan–Starling compressibility factor of the hard-sphere fluid,
 * Z = βP/ρ = (1 + φ + φ² − φ³)/(1 − φ)³ (dimensionless).
 *
 * Source: N. F. Carnahan & K. E. Starling, J. Chem. Phys. 51, 635 (1969).
 * Accurate to ~0.3 % against simulation up to φ ≈ 0.49 (the fluid's stable range); above
 * freezing it describes the metastable fluid.
 *
 * @param phi volume fraction, 0 < φ < φ_cp = π/√18 (the formula itself diverges only at 1).
 * @throws PhysicsArgumentError if φ is not in (0, φ_cp).
 * @example carnahanStarlingCompressibility(0.5) // 13
 */
export function carnahanStarlingCompressibility(phi: number): number {
  requireVolumeFraction('phi', phi);
  return (1 + phi + phi * phi - phi * phi * phi) / (1 - phi) ** 3;
}
