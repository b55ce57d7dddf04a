/**
 * Greenwood's variance of the Kaplan–Meier estimate.
 *
 * Var Ŝ(t) = Ŝ(t)² · Σ over event times tᵢ ≤ t of dᵢ / (nᵢ (nᵢ − dᵢ)),
 * where nᵢ samples were at risk and dᵢ collapsed at tᵢ. This file gives the one term of that sum
 * and the variance from the running sum.
 *
 * Source: M. Greenwood, *The natural duration of cancer*, Reports on Public Health and Medical
 * Subjects 33 (HMSO, London, 1926); in any survival text, e.g. J. P. Klein & M. L. Moeschberger,
 * *Survival Analysis*, 2nd ed. (2003), eq. 4.2.2; freely readable: Wikipedia, "Kaplan–Meier
 * estimator", section "Variance estimation".
 *
 * Limits: atRisk > events ≥ 0. When every sample at risk collapses (atRisk = events) the term is
 * infinite and the variance at Ŝ = 0 undefined: the caller treats that step separately.
 * @throws RangeError when events > atRisk or either is negative
 * @example greenwoodTerm(21, 3) // 3 / (21 · 18) = 0.0079365
 */
export function greenwoodTerm(atRisk: number, events: number): number {
  if (!(events >= 0 && atRisk >= events)) throw new RangeError(`greenwoodTerm: needs atRisk ≥ events ≥ 0, got atRisk ${atRisk} and events ${events}`);
  return events / (atRisk * (atRisk - events));
}

/**
 * Var Ŝ(t) = Ŝ(t)² · (Greenwood sum up to t).
 * @example greenwoodVariance(18 / 21, 3 / (21 * 18)) // 0.0058309 (standard error 0.0764)
 */
export function greenwoodVariance(survival: number, greenwoodSum: number): number {
  return survival * survival * greenwoodSum;
}
