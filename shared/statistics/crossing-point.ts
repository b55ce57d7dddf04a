/**
 * The point where a fitted logistic line crosses one half, x₀ = −β₀/β₁, with its standard
 * error by the delta method: Var(x₀) ≈ (Var β₀ + 2x₀ Cov(β₀,β₁) + x₀² Var β₁) / β₁².
 * Source: Agresti, *Categorical Data Analysis*, 3rd ed. (2013), §3.1.5 (delta method) and
 * §5.1.2 (the "median effective level" of a logistic fit).
 * @throws Error when β₁ is zero (the line never crosses one half)
 */
export function crossingPoint(coefficients: number[], covariance: number[][]): { value: number; standardError: number } {
  const [b0, b1] = coefficients;
  if (b1 === 0) throw new Error('crossingPoint: the slope is zero; the outcome does not depend on the feature');
  const x0 = -b0 / b1;
  const variance = (covariance[0][0] + 2 * x0 * covariance[0][1] + x0 * x0 * covariance[1][1]) / (b1 * b1);
  return { value: x0, standardError: Math.sqrt(Math.max(0, variance)) };
}
