/**
 * Coefficients of Baxter's factor function Q(r) = a(r² − 1)/2 + b(r − 1) + λ/12 on 0 < r < 1
 * (σ = 1) for adhesive hard spheres in the Percus–Yevick approximation:
 * μ = λφ(1 − φ), a = (1 + 2φ − μ)/(1 − φ)², b = (μ − 3φ)/(2(1 − φ)²).
 * λ = 0 gives Wertheim's hard-sphere solution.
 *
 * Source: R. J. Baxter, J. Chem. Phys. 49, 2770 (1968); hard spheres: M. S. Wertheim,
 * Phys. Rev. Lett. 10, 321 (1963). Internal (no argument checks).
 *
 * @example baxterFactorCoefficients(0.5, 0) // { a: 8, b: -3, lambda: 0 }
 */
export function baxterFactorCoefficients(phi: number, lambda: number): { a: number; b: number; lambda: number } {
  const oneMinusSquared = (1 - phi) * (1 - phi);
  const mu = lambda * phi * (1 - phi);
  return { a: (1 + 2 * phi - mu) / oneMinusSquared, b: (mu - 3 * phi) / (2 * oneMinusSquared), lambda };
}
