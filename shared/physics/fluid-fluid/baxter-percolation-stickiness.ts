import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Percolation threshold of adhesive spheres in the Percus–Yevick approximation: clusters span
 * the sample for τ < τ_p(φ) = (19φ² − 2φ + 1)/(12(1 − φ)²), equivalently λφ = 1.
 *
 * Source: Y. C. Chiew & E. D. Glandt, J. Phys. A 16, 2599 (1983).
 *
 * @param phi volume fraction, 0 < φ < φ_cp.
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), NaN or ±Infinity.
 * @example baxterPercolationStickiness(0.1) // 0.10185185185185186
 */
export function baxterPercolationStickiness(phi: number): number {
  requireVolumeFraction('phi', phi);
  return (19 * phi * phi - 2 * phi + 1) / (12 * (1 - phi) ** 2);
}
