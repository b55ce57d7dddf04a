import type { baxterFactorCoefficients } from './baxter-factor-coefficients';

type Coefficients = ReturnType<typeof baxterFactorCoefficients>;

/** Below this k the moments ∫₀¹ rⁿ e^{ikr} dr are summed as a series (the closed forms cancel). */
const SERIES_BELOW = 0.5;
const SERIES_TERMS = 18;

/**
 * Baxter's transformed factor Q̂(k) = 1 − 12φ ∫₀¹ Q(r) e^{ikr} dr (σ = 1), returned as
 * [real, imaginary]. With Q(r) = (a/2)r² + b r + d, d = λ/12 − a/2 − b, the integral is
 * (a/2)J₂ + bJ₁ + dJ₀ with the moments Jₙ = ∫₀¹ rⁿ e^{ikr} dr in closed form (c = cos k, s = sin k):
 * J₀ = s/k + i(1 − c)/k; J₁ = s/k + (c − 1)/k² + i(s/k² − c/k);
 * J₂ = s/k + 2c/k² − 2s/k³ + i(−c/k + 2s/k² + 2(c − 1)/k³); below k = 0.5 the series
 * Jₙ = Σₘ (ik)ᵐ/(m!(n + m + 1)) is used instead.
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968) (the factorisation). Internal.
 *
 * @example baxterFactorTransform(0.5, baxterFactorCoefficients(0.5, 0), 0) // [8, 0] (= (1+2φ)/(1−φ)²)
 */
export function baxterFactorTransform(phi: number, coefficients: Coefficients, k: number): [number, number] {
  const { a, b, lambda } = coefficients;
  const d = lambda / 12 - a / 2 - b;
  let j0r: number, j0i: number, j1r: number, j1i: number, j2r: number, j2i: number;
  if (Math.abs(k) < SERIES_BELOW) {
    [j0r, j0i] = momentSeries(0, k);
    [j1r, j1i] = momentSeries(1, k);
    [j2r, j2i] = momentSeries(2, k);
  } else {
    const c = Math.cos(k);
    const s = Math.sin(k);
    const k2 = k * k;
    const k3 = k2 * k;
    j0r = s / k;
    j0i = (1 - c) / k;
    j1r = s / k + (c - 1) / k2;
    j1i = s / k2 - c / k;
    j2r = s / k + (2 * c) / k2 - (2 * s) / k3;
    j2i = -c / k + (2 * s) / k2 + (2 * (c - 1)) / k3;
  }
  const integralReal = 0.5 * a * j2r + b * j1r + d * j0r;
  const integralImaginary = 0.5 * a * j2i + b * j1i + d * j0i;
  return [1 - 12 * phi * integralReal, -12 * phi * integralImaginary];
}

/** Jₙ(k) = Σₘ (ik)ᵐ / (m!(n + m + 1)) as [real, imaginary], for small |k|. */
function momentSeries(n: number, k: number): [number, number] {
  let real = 0;
  let imaginary = 0;
  let power = 1; // kᵐ/m!
  for (let m = 0; m < SERIES_TERMS; m++) {
    const term = power / (n + m + 1);
    // iᵐ cycles 1, i, −1, −i.
    switch (m % 4) {
      case 0: real += term; break;
      case 1: imaginary += term; break;
      case 2: real -= term; break;
      default: imaginary -= term;
    }
    power *= k / (m + 1);
  }
  return [real, imaginary];
}
