import { requireVolumeFraction } from '../validation/require-volume-fraction';

/** φ above which no positive τ reaches the spinodal: the root of 1 + 4φ − 14φ² = 0, (2 + 3√2)/14. */
export const BAXTER_SPINODAL_END = (2 + 3 * Math.SQRT2) / 14;

/**
 * Stickiness on the Percus–Yevick spinodal of adhesive spheres at φ: substituting the spinodal
 * condition 1 + 2φ = λφ(1 − φ) into Baxter's quadratic gives
 * τ_s(φ) = (1 + 4φ − 14φ²) / (12(1 − φ)(1 + 2φ)). Its maximum is the critical point.
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968) (quadratic and compressibility);
 * the closed form is derived here by elimination.
 * Caution: for φ < φ_c the root that meets the condition is the larger one of the quadratic, not
 * the physical smaller root; the map therefore uses the no-solution band's low edge as the dilute
 * limit of stability (see baxterPYNoSolutionBand).
 *
 * @param phi volume fraction, 0 < φ < φ_cp.
 * @returns τ_s, or `null` for φ ≥ 0.445946 where τ_s ≤ 0 (no spinodal at any stickiness).
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), NaN or ±Infinity.
 * @example baxterPYSpinodalStickiness(0.1213203436) // 0.0976310729...
 */
export function baxterPYSpinodalStickiness(phi: number): number | null {
  requireVolumeFraction('phi', phi);
  if (phi >= BAXTER_SPINODAL_END) return null;
  return baxterSpinodalUnchecked(phi);
}

/** τ_s(φ) without checks (internal). */
export function baxterSpinodalUnchecked(phi: number): number {
  return (1 + 4 * phi - 14 * phi * phi) / (12 * (1 - phi) * (1 + 2 * phi));
}
