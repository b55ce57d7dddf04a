import type { BaselineHazard } from './breslow-baseline-hazard';

/** S(t | x) of a fitted Cox model at each baseline step. */
export interface PredictedSurvival {
  timeDays: number[];
  survival: number[];
}

/**
 * The survival curve a Cox model predicts for a sample with covariates x:
 *   S(t | x) = S₀(t)^exp(β·(x − x̄)) = exp(−H₀(t) · exp(β·(x − x̄))),
 * with H₀ Breslow's baseline centred on x̄ (breslowBaselineHazard). A step function, constant
 * between the baseline's collapse times; beyond the last one the model says nothing.
 * Source: Klein & Moeschberger, *Survival Analysis*, 2nd ed. (2003), §8.8, eq. 8.8.3.
 * @throws RangeError naming a covariate of the model that `values` lacks
 * @example predictedSurvival({ timeDays: [1, 2], cumulativeHazard: [0.5, 1.5], centre: { a: 0 } }, { a: 0 }, { a: 0 }).survival
 *   // [0.6065, 0.2231]
 */
export function predictedSurvival(baseline: BaselineHazard, coefficients: Readonly<Record<string, number>>, values: Readonly<Record<string, number>>): PredictedSurvival {
  const relativeHazard = Math.exp(linearPredictor(baseline, coefficients, values));
  return { timeDays: [...baseline.timeDays], survival: baseline.cumulativeHazard.map((h) => Math.exp(-h * relativeHazard)) };
}

/**
 * The median time to collapse a Cox model predicts for covariates x: the earliest baseline time
 * at which S(t | x) ≤ 0.5, i.e. H₀(t) ≥ ln 2 · exp(−β·(x − x̄)); null when the prediction never
 * falls to one half within the collapses seen ("longer than the bench has watched").
 * @example predictedMedianDays({ timeDays: [1, 2], cumulativeHazard: [0.5, 1.5], centre: { a: 0 } }, { a: 0 }, { a: 0 }) // 2
 */
export function predictedMedianDays(baseline: BaselineHazard, coefficients: Readonly<Record<string, number>>, values: Readonly<Record<string, number>>): number | null {
  const needed = Math.LN2 * Math.exp(-linearPredictor(baseline, coefficients, values));
  const at = baseline.cumulativeHazard.findIndex((h) => h >= needed);
  return at < 0 ? null : baseline.timeDays[at];
}

/**
 * The chance a Cox model gives a sample with covariates x of still standing at `days`:
 * S(days | x), 1 before the first collapse. Past the last collapse time the baseline stays where
 * it was (the step function's convention), so callers check `days` against what the bench watched.
 * @example predictedSurvivalAt({ timeDays: [1, 2], cumulativeHazard: [0.5, 1.5], centre: { a: 0 } }, { a: 0 }, { a: 0 }, 1.5) // 0.6065
 */
export function predictedSurvivalAt(baseline: BaselineHazard, coefficients: Readonly<Record<string, number>>, values: Readonly<Record<string, number>>, days: number): number {
  const relativeHazard = Math.exp(linearPredictor(baseline, coefficients, values));
  let h = 0;
  for (let i = 0; i < baseline.timeDays.length && baseline.timeDays[i] <= days; i++) h = baseline.cumulativeHazard[i];
  return Math.exp(-h * relativeHazard);
}

/** β·(x − x̄) over the model's covariates. */
function linearPredictor(baseline: BaselineHazard, coefficients: Readonly<Record<string, number>>, values: Readonly<Record<string, number>>): number {
  let eta = 0;
  for (const key of Object.keys(coefficients)) {
    const value = values[key];
    if (!Number.isFinite(value)) throw new RangeError(`predicted survival: covariate ${key} is ${value}; a finite value is needed`);
    eta += coefficients[key] * (value - baseline.centre[key]);
  }
  return eta;
}
