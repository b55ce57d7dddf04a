/**
 * Quantile of Student's t distribution with a whole number of degrees of freedom ν.
 *
 * Uses the closed form of A(t|ν) = P(|T| ≤ t) for integer ν (Abramowitz & Stegun, *Handbook of
 * Mathematical Functions* (1964), 26.7.3–26.7.4), with θ = arctan(t/√ν):
 * ν odd: A = (2/π)[θ + sinθ (cosθ + (2/3)cos³θ + … + (2·4···(ν−3))/(1·3···(ν−2)) cos^(ν−2)θ)]
 * (A = 2θ/π for ν = 1); ν even: A = sinθ [1 + (1/2)cos²θ + … + (1·3···(ν−3))/(2·4···(ν−2)) cos^(ν−2)θ];
 * then solves A(t|ν) = 2p − 1 for t by bisection to 1e-12 relative.
 *
 * Written here because simple-statistics (a dependency) has no t quantile; the exact finite
 * series needs no incomplete beta function.
 *
 * Limits: 0 < p < 1; ν a whole number ≥ 1.
 * @throws RangeError for p outside (0, 1) or a ν that is not a whole number ≥ 1
 * @example studentTQuantile(0.975, 5) // 2.5706 (published tables: 2.5706)
 */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`studentTQuantile: p must lie in (0, 1), got ${p}`);
  if (!(Number.isInteger(degreesOfFreedom) && degreesOfFreedom >= 1)) throw new RangeError(`studentTQuantile: degrees of freedom must be a whole number ≥ 1, got ${degreesOfFreedom}`);
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, degreesOfFreedom);
  const target = 2 * p - 1;
  let high = 1;
  while (twoSidedCentralProbability(high, degreesOfFreedom) < target) high *= 2;
  let low = 0;
  while (high - low > 1e-12 * high) {
    const middle = (low + high) / 2;
    if (twoSidedCentralProbability(middle, degreesOfFreedom) < target) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

/** A(t|ν) = P(|T| ≤ t) for integer ν, Abramowitz & Stegun 26.7.3–26.7.4. */
export function twoSidedCentralProbability(t: number, degreesOfFreedom: number): number {
  const theta = Math.atan(t / Math.sqrt(degreesOfFreedom));
  const cos2 = Math.cos(theta) ** 2;
  if (degreesOfFreedom % 2 === 1) {
    if (degreesOfFreedom === 1) return (2 * theta) / Math.PI;
    let term = Math.cos(theta);
    let sum = term;
    for (let k = 2; k <= degreesOfFreedom - 3; k += 2) {
      term *= (cos2 * k) / (k + 1);
      sum += term;
    }
    return (2 / Math.PI) * (theta + Math.sin(theta) * sum);
  }
  let term = 1;
  let sum = 1;
  for (let k = 2; k <= degreesOfFreedom - 2; k += 2) {
    term *= (cos2 * (k - 1)) / k;
    sum += term;
  }
  return Math.sin(theta) * sum;
}
