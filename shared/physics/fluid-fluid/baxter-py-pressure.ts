import { requireInRange } from '../validation/require-in-range';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { baxterLambdaUnchecked } from './baxter-py-lambda';

/**
 * Reduced pressure p̃ = βPv₀ = φZ of Baxter adhesive spheres, Percus–Yevick compressibility
 * route, in closed form:
 * Z = (1 + φ + φ²)/(1 − φ)³ − λφ(1 + φ/2)/(1 − φ)² + λ³φ²/36.
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968). Checked here by differentiation:
 * dp̃/dφ equals the published inverse compressibility [(1 + 2φ) − λφ(1 − φ)]²/(1 − φ)⁴ along
 * either root of the quadratic, so the closed form is the integral from φ = 0.
 *
 * @param phi volume fraction, 0 < φ < φ_cp.
 * @param tau stickiness τ > 0.
 * @returns p̃, or `null` inside the no-solution band (no real λ).
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), τ ≤ 0, NaN or ±Infinity.
 * @example baxterPYPressure(0.3, 0.5) // 0.6547872569531 (φZ)
 */
export function baxterPYPressure(phi: number, tau: number): number | null {
  requireVolumeFraction('phi', phi);
  requireInRange('tau', tau, 0, Infinity, { what: 'a Baxter stickiness τ' });
  return baxterPressureUnchecked(phi, tau);
}

/** p̃ without argument checks (internal); `null` inside the band. */
export function baxterPressureUnchecked(phi: number, tau: number): number | null {
  const lambda = baxterLambdaUnchecked(phi, tau);
  if (lambda === null) return null;
  const hardSphere = (1 + phi + phi * phi) / (1 - phi) ** 3;
  const adhesion = (lambda * phi * (1 + phi / 2)) / (1 - phi) ** 2 - (lambda ** 3 * phi * phi) / 36;
  return phi * (hardSphere - adhesion);
}
