import { Z_95 } from '../statistics/z-95';
import type { Estimate } from './types';

/** z for a two-sided 95 % interval, 1.959963984540054: defined once in shared/statistics/z-95.ts. */
export { Z_95 };

/**
 * A value with its standard error and the 95 % Wald interval value ± z₀.₉₇₅·SE.
 * Source: Agresti, *Categorical Data Analysis*, 3rd ed. (2013), ch. 1 (Wald inference for a
 * maximum-likelihood estimate and its standard error).
 * @example waldEstimate(0.5, 0.1).high // 0.696
 */
export function waldEstimate(value: number, standardError: number): Estimate {
  return { value, standardError, low: value - Z_95 * standardError, high: value + Z_95 * standardError };
}
