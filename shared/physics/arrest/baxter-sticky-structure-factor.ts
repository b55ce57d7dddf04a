import { baxterLambdaUnchecked } from '../fluid-fluid/baxter-py-lambda';
import { requireInRange } from '../validation/require-in-range';
import { requireStickiness } from '../validation/require-stickiness';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { baxterFactorCoefficients } from './baxter-factor-coefficients';
import { baxterFactorTransform } from './baxter-factor-transform';

/**
 * Static structure factor of Baxter adhesive hard spheres in the Percus–Yevick approximation,
 * from Baxter's factorisation: S(k) = 1/|Q̂(k)|², Q̂(k) = 1 − 12φ ∫₀¹ Q(r) e^{ikr} dr with
 * Q(r) = a(r² − 1)/2 + b(r − 1) + λ/12, a = (1 + 2φ − μ)/(1 − φ)², b = (μ − 3φ)/(2(1 − φ)²),
 * μ = λφ(1 − φ) and λ the smaller root of Baxter's quadratic (baxterPYLambda). k in units of
 * 1/σ (σ the diameter). τ = Infinity gives the hard-sphere solution (λ = 0).
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968); the same S(k) is written out in
 * S. V. G. Menon, C. Manohar & K. S. Rao, J. Chem. Phys. 95, 9186 (1991).
 *
 * @param phi volume fraction, 0 < φ < 1 (a fluid-theory quantity: above close packing is allowed
 *   mathematically, as in the mode-coupling literature).
 * @param tau stickiness τ > 0, or Infinity for hard spheres.
 * @param k wave number kσ ≥ 0.
 * @returns S(k), or `null` where the Percus–Yevick quadratic has no real root (the no-solution
 *   band below τ_c).
 * @throws PhysicsArgumentError naming phi, tau or k.
 * @example baxterStickyStructureFactor(0.3, 0.5, 0) // 1/4.394251… = 0.227569… (S(0) = inverse compressibility⁻¹)
 */
export function baxterStickyStructureFactor(phi: number, tau: number, k: number): number | null {
  requireVolumeFraction('phi', phi, 1);
  requireStickiness('tau', tau);
  requireInRange('k', k, 0, Infinity, { what: 'a wave number kσ', lowEnd: 'closed' });
  const lambda = tau === Infinity ? 0 : baxterLambdaUnchecked(phi, tau);
  if (lambda === null) return null;
  return structureFactorUnchecked(phi, lambda, k);
}

/** S(k) for a known λ, without argument checks. Internal (mode-coupling grids). */
export function structureFactorUnchecked(phi: number, lambda: number, k: number): number {
  const [real, imaginary] = baxterFactorTransform(phi, baxterFactorCoefficients(phi, lambda), k);
  return 1 / (real * real + imaginary * imaginary);
}
