import type { CoxRecord } from './cox-proportional-hazards';

/** Breslow's baseline cumulative hazard: a step function, H₀ at each distinct collapse time. */
export interface BaselineHazard {
  /** Distinct collapse times, ascending. */
  timeDays: number[];
  /** H₀(t) just after each of those times (at covariates equal to `centre`). */
  cumulativeHazard: number[];
  /** The covariate values the baseline refers to (the samples' means): x − centre enters the prediction. */
  centre: Record<string, number>;
}

/**
 * Breslow's estimator of the baseline cumulative hazard of a fitted Cox model, centred on the
 * samples' mean covariates x̄:
 *   H₀(t) = Σ over distinct collapse times tᵢ ≤ t of dᵢ / Σ_{j at risk at tᵢ} exp(β·(xⱼ − x̄)),
 * with dᵢ the collapses at tᵢ and the risk set every sample whose time is ≥ tᵢ (a sample last
 * seen standing at tᵢ is still at risk then, as in kaplanMeier). With β = 0 it is the
 * Nelson–Aalen estimator. Centring changes nothing in a prediction (the factor exp(β·x̄) cancels)
 * and keeps exp finite.
 *
 * Source: N. Breslow, discussion of Cox (1972), J. R. Stat. Soc. B 34, 216 (1972); Klein &
 * Moeschberger, *Survival Analysis*, 2nd ed. (2003), §8.8, eq. 8.8.2. One sort and one backward
 * pass: O(n log n + n p).
 *
 * Limits: records as coxProportionalHazards takes them; `coefficients` keyed like the covariates.
 * @throws RangeError for a record missing a covariate or with a bad time (naming it)
 * @example breslowBaselineHazard([{ timeDays: 1, collapsed: true, values: { a: 0 } }, { timeDays: 2, collapsed: true, values: { a: 0 } }], { a: 0 })
 *   .cumulativeHazard // [0.5, 1.5]
 */
export function breslowBaselineHazard(records: readonly CoxRecord[], coefficients: Readonly<Record<string, number>>): BaselineHazard {
  const keys = Object.keys(coefficients);
  records.forEach((r, i) => {
    if (!(Number.isFinite(r.timeDays) && r.timeDays >= 0)) throw new RangeError(`breslowBaselineHazard: record ${i} has timeDays ${r.timeDays}; times must be finite and ≥ 0`);
    for (const key of keys) if (!Number.isFinite(r.values[key])) throw new RangeError(`breslowBaselineHazard: record ${i} has ${key} = ${r.values[key]}; every covariate needs a finite value`);
  });
  const centre: Record<string, number> = {};
  for (const key of keys) centre[key] = records.length ? records.reduce((s, r) => s + r.values[key], 0) / records.length : 0;
  const sorted = [...records].sort((a, b) => a.timeDays - b.timeDays);
  const weight = sorted.map((r) => Math.exp(keys.reduce((s, key) => s + coefficients[key] * (r.values[key] - centre[key]), 0)));
  const increments: Array<{ timeDays: number; increment: number }> = [];
  let riskSum = 0;
  for (let i = sorted.length - 1; i >= 0; ) {
    const time = sorted[i].timeDays;
    let events = 0;
    for (; i >= 0 && sorted[i].timeDays === time; i--) {
      riskSum += weight[i];
      if (sorted[i].collapsed) events++;
    }
    if (events > 0) increments.push({ timeDays: time, increment: events / riskSum });
  }
  increments.reverse();
  let total = 0;
  return { timeDays: increments.map((s) => s.timeDays), cumulativeHazard: increments.map((s) => (total += s.increment)), centre };
}
