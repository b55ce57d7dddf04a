import { requirePositive } from '../validation/require-positive';
import { requireVolumeFraction } from '../validation/require-volume-fraction';

/**
 * Free-volume fraction available to ideal polymer (a sphere of radius R_g = q·a) among hard
 * spheres at volume fraction φ, from scaled-particle theory:
 * α(φ) = (1 − φ) exp(−Ay − By² − Cy³), y = φ/(1 − φ), A = 3q + 3q² + q³, B = 9q²/2 + 3q³,
 * C = 3q³ (dimensionless, 0 < α < 1).
 *
 * Source: H. N. W. Lekkerkerker et al., Europhys. Lett. 20, 559 (1992); Lekkerkerker & Tuinier,
 * *Colloids and the Depletion Interaction* (Springer, 2011), ch. 3.
 *
 * @param phi colloid volume fraction, 0 < φ < φ_cp.
 * @param q size ratio R_g/a, q > 0.
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), q ≤ 0, NaN or ±Infinity.
 * @example freeVolumeFraction(0.3, 0.1) // 0.6019477900...
 */
export function freeVolumeFraction(phi: number, q: number): number {
  requireVolumeFraction('phi', phi);
  requirePositive('q', q, 'a size ratio R_g/a');
  return freeVolumeTerms(phi, q).alpha;
}

/** α and its first two φ-derivatives. */
export interface FreeVolumeTerms {
  alpha: number;
  slope: number;
  curvature: number;
}

/** α, α′ and α″ (internal, unchecked); the thermodynamics needs all three. */
export function freeVolumeTerms(phi: number, q: number): FreeVolumeTerms {
  return freeVolumeTermsInto(phi, q, { alpha: 0, slope: 0, curvature: 0 });
}

/** The same, written into `out` (no allocation in the coexistence loops). Internal. */
export function freeVolumeTermsInto(phi: number, q: number, out: FreeVolumeTerms): FreeVolumeTerms {
  const a = 3 * q + 3 * q * q + q * q * q;
  const b = 4.5 * q * q + 3 * q * q * q;
  const c = 3 * q * q * q;
  const y = phi / (1 - phi);
  const dyDphi = (1 + y) * (1 + y);
  const exponent = a * y + b * y * y + c * y * y * y;
  const boltzmann = Math.exp(-exponent);
  const exponentSlope = (a + 2 * b * y + 3 * c * y * y) * dyDphi;
  // α′ = −e^{−g}·h with h = 1 + (A + 2By + 3Cy²)(1 + y), since (1 − φ) = 1/(1 + y).
  const h = 1 + (a + 2 * b * y + 3 * c * y * y) * (1 + y);
  const hSlope = ((2 * b + 6 * c * y) * (1 + y) + (a + 2 * b * y + 3 * c * y * y)) * dyDphi;
  out.alpha = (1 - phi) * boltzmann;
  out.slope = -boltzmann * h;
  out.curvature = boltzmann * (exponentSlope * h - hSlope);
  return out;
}
