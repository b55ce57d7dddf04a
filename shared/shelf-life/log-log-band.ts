import { Z_95 } from '../statistics/z-95';

/**
 * Pointwise 95 % confidence band of a survival estimate on the log(−log) scale ("log-log" or
 * complementary log-log band).
 *
 * With σ² the Greenwood sum Σ dᵢ / (nᵢ (nᵢ − dᵢ)) and θ = exp(z · σ / ln Ŝ) (θ < 1 since ln Ŝ < 0),
 * the band is [Ŝ^(1/θ), Ŝ^θ]. It comes from a normal interval for log(−log Ŝ), whose delta-method
 * variance is σ² / (ln Ŝ)², so it always lies inside [0, 1]; it is clipped there anyway against
 * rounding. The plain "Ŝ ± z·SE" band can leave [0, 1] and is poor in the tails, which is why this
 * one is used (Klein & Moeschberger, *Survival Analysis*, 2nd ed. (2003), §4.3, eq. 4.3.2;
 * Kalbfleisch & Prentice, *The Statistical Analysis of Failure Time Data*, 2nd ed. (2002), §1.4).
 *
 * Limits: survival in [0, 1], greenwoodSum ≥ 0. At Ŝ = 1 (nothing collapsed yet) the band is
 * [1, 1]; at Ŝ = 0 it is [0, 0]; a non-finite sum (undefined variance) gives [0, 0] too.
 * @throws RangeError when survival is outside [0, 1] or the sum is negative
 * @example logLogBand(18 / 21, 3 / (21 * 18)) // { low: 0.6197, high: 0.9516 }
 */
export function logLogBand(survival: number, greenwoodSum: number, z: number = Z_95): { low: number; high: number } {
  if (!(survival >= 0 && survival <= 1)) throw new RangeError(`logLogBand: survival must lie in [0, 1], got ${survival}`);
  if (!(greenwoodSum >= 0) && !Number.isNaN(greenwoodSum)) throw new RangeError(`logLogBand: the Greenwood sum must be ≥ 0, got ${greenwoodSum}`);
  if (survival === 1) return { low: 1, high: 1 };
  if (survival === 0 || !Number.isFinite(greenwoodSum)) return { low: 0, high: 0 };
  const logSurvival = Math.log(survival);
  const theta = Math.exp((z * Math.sqrt(greenwoodSum)) / logSurvival);
  return { low: clipToUnit(survival ** (1 / theta)), high: clipToUnit(survival ** theta) };
}

function clipToUnit(value: number): number {
  return Math.min(1, Math.max(0, value));
}
