import type { Estimate } from './types';

/**
 * z for a two-sided 95 % interval: the standard normal quantile at 0.975, 1.959963984540054
 * (standard normal tables, e.g. Abramowitz & Stegun, *Handbook of Mathematical Functions*
 * (1964), ch. 26). Written out rather than taken from simple-statistics' `probit`, whose
 * approximation of the inverse error function gives 1.9572 here.
 */
export const Z_95 = 1.959963984540054;

/**
 * A value with its standard error and the 95 % Wald interval value ± z₀.₉₇₅·SE.
 * Source: Agresti, *Categorical Data Analysis*, 3rd ed. (2013), ch. 1 (Wald inference for a
 * maximum-likelihood estimate and its standard error).
 * @example waldEstimate(0.5, 0.1).high // 0.696
 */
export function waldEstimate(value: number, standardError: number): Estimate {
  return { value, standardError, low: value - Z_95 * standardError, high: value + Z_95 * standardError };
}
