import { studentTQuantile } from './student-t-quantile';

/** One measurement of a recipe's storage modulus at an age. */
export interface ModulusAtAge {
  ageDays: number;
  storageModulusPa: number;
}

export type StiffeningFit =
  | {
      status: 'fitted';
      /** Change of G′ per tenfold increase in age, Pa per decade, with its SE and 95 % interval. */
      slopePaPerDecade: number;
      standardError: number;
      low: number;
      high: number;
      /** G′ of the fitted line at 1 day (log10 age = 0), Pa. */
      interceptPa: number;
      pointCount: number;
      distinctAges: number;
      degreesOfFreedom: number;
      /** 'softens' when the slope is negative and its interval leaves out 0; 'stiffens' the mirror. */
      trend: 'stiffens' | 'softens' | 'no-clear-trend';
    }
  | { status: 'not-enough-ages'; distinctAges: number; pointCount: number; message: string };

/** Fewest distinct ages a stiffening line is fitted to. */
export const MIN_STIFFENING_AGES = 3;

/**
 * Stiffening with age: ordinary least squares of G′ against log10(age) for one recipe,
 * G′ = a + b·log10(age). b = Sxy/Sxx, SE(b) = √(s²/Sxx) with s² = RSS/(n − 2), 95 % interval
 * b ± t₀.₉₇₅,ₙ₋₂·SE(b) (any regression text, e.g. Draper & Smith, *Applied Regression Analysis*,
 * 3rd ed. (1998), ch. 1; freely readable: Wikipedia, "Simple linear regression"). Written out
 * because simple-statistics' linearRegression gives no standard error.
 *
 * Ageing colloidal gels commonly stiffen roughly logarithmically with waiting time, so a line in
 * log(age) is common practice for reading the trend (no single source; it is a description, not a
 * law). A recipe "softens" when b < 0 with its interval below 0.
 *
 * Limits: ages > 0 and finite, moduli finite; needs ≥ 3 distinct ages, else a 'not-enough-ages'
 * result (not an error), since a recipe checked twice is common.
 * @throws RangeError for a non-positive age or a non-finite value, naming the point
 * @example stiffeningWithAge([{ ageDays: 1, storageModulusPa: 100 }, { ageDays: 10, storageModulusPa: 150 },
 *   { ageDays: 100, storageModulusPa: 200 }]) // slope 50 Pa per decade, SE 0, trend 'stiffens'
 */
export function stiffeningWithAge(points: readonly ModulusAtAge[]): StiffeningFit {
  points.forEach((point, index) => {
    if (!(Number.isFinite(point.ageDays) && point.ageDays > 0)) throw new RangeError(`stiffeningWithAge: point ${index} has ageDays ${point.ageDays}; ages must be finite and > 0`);
    if (!Number.isFinite(point.storageModulusPa)) throw new RangeError(`stiffeningWithAge: point ${index} has storageModulusPa ${point.storageModulusPa}; it must be finite`);
  });
  const distinctAges = new Set(points.map((p) => p.ageDays)).size;
  const pointCount = points.length;
  if (distinctAges < MIN_STIFFENING_AGES) {
    return { status: 'not-enough-ages', distinctAges, pointCount, message: `not enough ages: G′ was measured at ${distinctAges} age${distinctAges === 1 ? '' : 's'}; a trend needs at least ${MIN_STIFFENING_AGES}` };
  }
  const x = points.map((p) => Math.log10(p.ageDays));
  const y = points.map((p) => p.storageModulusPa);
  const meanX = x.reduce((s, v) => s + v, 0) / pointCount;
  const meanY = y.reduce((s, v) => s + v, 0) / pointCount;
  const sxx = x.reduce((s, v) => s + (v - meanX) ** 2, 0);
  const sxy = x.reduce((s, v, i) => s + (v - meanX) * (y[i] - meanY), 0);
  const slope = sxy / sxx;
  const intercept = meanY - slope * meanX;
  const residualSquares = x.reduce((s, v, i) => s + (y[i] - intercept - slope * v) ** 2, 0);
  const degreesOfFreedom = pointCount - 2;
  const standardError = Math.sqrt(residualSquares / degreesOfFreedom / sxx);
  const reach = studentTQuantile(0.975, degreesOfFreedom) * standardError;
  const [low, high] = [slope - reach, slope + reach];
  const trend = high < 0 ? 'softens' : low > 0 ? 'stiffens' : 'no-clear-trend';
  return { status: 'fitted', slopePaPerDecade: slope, standardError, low, high, interceptPa: intercept, pointCount, distinctAges, degreesOfFreedom, trend };
}
