import { adaptiveGaussKronrod } from '../numerics/adaptive-gauss-kronrod';
import { requireInRange } from '../validation/require-in-range';
import { requireVolumeFraction } from '../validation/require-volume-fraction';
import { baxterDiscriminantNumerator, baxterLambdaUnchecked } from './baxter-py-lambda';
import { baxterPressureUnchecked } from './baxter-py-pressure';

/**
 * Below this φ the adhesive part is integrated numerically: the closed form's terms (of order
 * τ³/φ) cancel to a result of order 1/τ, with a relative rounding error measured as
 * ≈ 3e-15·τ⁴/φ², so the switch at 0.06τ² keeps it below ~1e-12. Above τ ≈ 4 that is every φ:
 * the stiff, nearly hard-sphere fluid is always integrated, and stays exact up to τ = 1e300.
 */
function quadratureBelow(tau: number): number {
  return 0.06 * tau * tau;
}

/** Baxter's critical stickiness τ_c = (2 − √2)/6, where N(φ) is a perfect square. */
const CRITICAL_STICKINESS = (2 - Math.SQRT2) / 6;

/**
 * Relative half-width of the bridge around τ_c. At τ_c the closed form's logarithms meet a
 * double root and cancel catastrophically (about 1e-15/|τ/τ_c − 1| kT; at τ_c itself it is off by
 * ~0.8 kT); within the bridge βμ is interpolated linearly in τ between its edges, where the
 * closed form is good to ~1e-9 and the interpolation to ~1e-6 kT.
 */
const CRITICAL_BRIDGE = 1e-6;

/**
 * Chemical potential βμ of Baxter adhesive spheres, Percus–Yevick compressibility route
 * (de Broglie term dropped): βμ = ln φ + βF_ex/N + Z − 1 with
 * βF_ex/N = −ln(1 − φ) + 3φ(2 − φ)/(2(1 − φ)²) + ∫₀^φ [−(τ + x/(1−x))λ² + xλ³/9] dx.
 * The adhesive integral has a closed form, derived for Gelwright by Euler substitution
 * (λ involves √N with N quadratic in φ): with s = √N, b₀ = 2τ(1−τ) − 1/3, b₁ = 4/3 − 2τ,
 * K(φ) = (R₀ + sR₁)/(φ(1−φ)²) + α ln|2τs + 2τ² + b₀φ| − α ln(1−φ) ± β ln|(1 + b₁(φ−1) ∓ √2 s)/(φ−1)|,
 * α = 12τ(6τ − 1), β = √2(54τ² − 12τ + 1), R₀, R₁ quadratics in φ (see code). It is the
 * analytic continuation used for the liquid across the no-solution band. For φ < 0.06τ² (so for
 * every φ once τ ≳ 4, where the closed form's terms cancel) the integral is taken by adaptive
 * Gauss–Kronrod quadrature instead (relative tolerance 1e-13), which tends to the hard-sphere
 * limit as τ → ∞; within 1e-6 (relative) of τ_c it is interpolated across, where the closed form
 * degenerates.
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968) (λ, compressibility); the closed form is
 * checked in the tests against quadrature and against dβμ/dφ = (dp̃/dφ)/φ.
 *
 * @param phi volume fraction, 0 < φ < φ_cp.
 * @param tau stickiness τ > 0.
 * @returns βμ, or `null` inside the no-solution band.
 * @throws PhysicsArgumentError for φ outside (0, φ_cp), τ ≤ 0, NaN or ±Infinity.
 * @example baxterPYChemicalPotential(0.3, 0.5) // 0.8138929700783 (mpmath quadrature: 0.813892970078319)
 */
export function baxterPYChemicalPotential(phi: number, tau: number): number | null {
  requireVolumeFraction('phi', phi);
  requireInRange('tau', tau, 0, Infinity, { what: 'a Baxter stickiness τ' });
  return baxterChemicalPotentialUnchecked(phi, tau);
}

/** βμ without checks (internal); `null` inside the band. */
export function baxterChemicalPotentialUnchecked(phi: number, tau: number): number | null {
  const pressure = baxterPressureUnchecked(phi, tau);
  if (pressure === null) return null;
  const hardSphereExcess = -Math.log1p(-phi) + (3 * phi * (2 - phi)) / (2 * (1 - phi) ** 2);
  return Math.log(phi) + hardSphereExcess + adhesiveExcess(phi, tau) + pressure / phi - 1;
}

/** ∫₀^φ of the adhesive integrand, by the form that is accurate at (φ, τ) (internal). */
function adhesiveExcess(phi: number, tau: number): number {
  const offset = tau / CRITICAL_STICKINESS - 1;
  if (Math.abs(offset) < CRITICAL_BRIDGE) {
    const below = adhesiveExcessAwayFromCritical(phi, CRITICAL_STICKINESS * (1 - CRITICAL_BRIDGE));
    const above = adhesiveExcessAwayFromCritical(phi, CRITICAL_STICKINESS * (1 + CRITICAL_BRIDGE));
    const weight = (offset + CRITICAL_BRIDGE) / (2 * CRITICAL_BRIDGE);
    return below + weight * (above - below);
  }
  return adhesiveExcessAwayFromCritical(phi, tau);
}

function adhesiveExcessAwayFromCritical(phi: number, tau: number): number {
  return phi < quadratureBelow(tau) ? adhesiveIntegralByQuadrature(phi, tau) : adhesiveIntegralClosedForm(phi, tau);
}

/** The integrand −(τ + x/(1−x))λ² + xλ³/9 of the adhesive free energy (internal). */
export function adhesiveIntegrand(x: number, tau: number): number {
  const lambda = baxterLambdaUnchecked(x, tau);
  if (lambda === null) return NaN;
  // (τλ)·λ rather than τ·λ²: for τ near 1e300, λ ≈ 1/τ and λ² would underflow.
  return -(tau * lambda + (x / (1 - x)) * lambda) * lambda + (x * lambda ** 3) / 9;
}

function adhesiveIntegralByQuadrature(phi: number, tau: number): number {
  return adaptiveGaussKronrod((x) => adhesiveIntegrand(x, tau), 0, phi, { relativeTolerance: 1e-13, absoluteTolerance: 1e-17 }).value;
}

/** K(φ) − K(0⁺) in closed form (internal; valid outside the band, φ > 0). */
export function adhesiveIntegralClosedForm(phi: number, tau: number): number {
  return adhesiveAntiderivative(phi, tau) - adhesiveAntiderivativeAtZero(tau);
}

function coefficients(tau: number) {
  const t2 = tau * tau;
  const t3 = t2 * tau;
  return {
    b0: 2 * tau * (1 - tau) - 1 / 3,
    b1: 4 / 3 - 2 * tau,
    r0: [-24 * t3, 3 * (16 * t3 + 18 * tau - 5), -6 * (4 * t3 + 9 * tau - 3)],
    r1: [24 * t2, -2 * (24 * t2 + 30 * tau - 5), 4 * (6 * t2 + 15 * tau - 4)],
    alpha: 12 * tau * (6 * tau - 1),
    beta: Math.SQRT2 * (54 * t2 - 12 * tau + 1),
    // Two equivalent forms of the √N logarithm; each is singular at one τ where N is a perfect
    // square (τ_c and (2 + √2)/6), so the one regular near the given τ is used.
    minusForm: tau < 1 / 3,
  };
}

function adhesiveAntiderivative(phi: number, tau: number): number {
  const c = coefficients(tau);
  const s = Math.sqrt(baxterDiscriminantNumerator(phi, tau));
  const r0 = c.r0[0] + phi * (c.r0[1] + phi * c.r0[2]);
  const r1 = c.r1[0] + phi * (c.r1[1] + phi * c.r1[2]);
  const rational = (r0 + s * r1) / (phi * (1 - phi) ** 2);
  const dilute = c.alpha * (Math.log(Math.abs(2 * tau * s + 2 * tau * tau + c.b0 * phi)) - Math.log1p(-phi));
  const a = 1 + c.b1 * (phi - 1);
  const b = Math.SQRT2 * s;
  const dense = c.minusForm
    ? c.beta * Math.log(Math.abs((a - b) / (phi - 1)))
    : -c.beta * Math.log(Math.abs((a + b) / (phi - 1)));
  return rational + dilute + dense;
}

function adhesiveAntiderivativeAtZero(tau: number): number {
  const c = coefficients(tau);
  // Limit φ → 0: the 1/φ terms cancel (R₀(0) + τR₁(0) = 0), leaving R₀′ + τR₁′ + s′(0)R₁(0)
  // with s′(0) = b₀/(2τ).
  const rational = c.r0[1] + tau * c.r1[1] + 12 * tau * c.b0;
  const dilute = c.alpha * Math.log(4 * tau * tau);
  const dense = c.minusForm
    ? c.beta * Math.log(Math.abs((2 - Math.SQRT2) * tau - 1 / 3))
    : -c.beta * Math.log(Math.abs((2 + Math.SQRT2) * tau - 1 / 3));
  return rational + dilute + dense;
}
