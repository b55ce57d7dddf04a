/**
 * The Cox partial log-likelihood with Breslow's handling of ties, its score (gradient) and its
 * information (minus the Hessian), in one pass over the samples sorted by time.
 *
 * ℓ(β) = Σ over distinct collapse times t of [ Σ_{i collapsed at t} xᵢ·β − d_t · ln S₀(t) ],
 * with S₀(t) = Σ_{j at risk at t} exp(xⱼ·β), S₁ = Σ exp(xⱼ·β) xⱼ, S₂ = Σ exp(xⱼ·β) xⱼxⱼᵀ over the
 * same risk set (all samples whose time is ≥ t), d_t the collapses at t;
 * score U = Σ_t [Σ xᵢ − d_t S₁/S₀], information I = Σ_t d_t [S₂/S₀ − (S₁/S₀)(S₁/S₀)ᵀ].
 * Breslow's approximation treats the d_t tied collapses as if each had the whole risk set
 * (Breslow, Biometrics 30, 89 (1974); Klein & Moeschberger, *Survival Analysis*, 2nd ed. (2003),
 * §8.4; Kalbfleisch & Prentice (2002), §4.2).
 *
 * Walking from the latest time to the earliest, the risk set only grows, so S₀, S₁, S₂ are running
 * sums: O(n p²). exp is taken relative to the largest linear predictor, which leaves ℓ's maximiser,
 * U and I unchanged and keeps exp finite.
 *
 * Limits: `times` ascending; rows of equal length p; internal, called by coxProportionalHazards
 * with standardised covariates.
 * @example breslowPartialLikelihood([1, 2], [true, true], [[0], [1]], [0]).logLikelihood // −ln 2
 */
export function breslowPartialLikelihood(times: readonly number[], collapsed: readonly boolean[], rows: readonly (readonly number[])[], beta: readonly number[]): { logLikelihood: number; score: number[]; information: number[][] } {
  const p = beta.length;
  const eta = rows.map((row) => row.reduce((sum, value, k) => sum + value * beta[k], 0));
  const offset = eta.reduce((m, value) => Math.max(m, value), -Infinity);
  let logLikelihood = 0;
  const score = new Array<number>(p).fill(0);
  const information = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  let s0 = 0;
  const s1 = new Array<number>(p).fill(0);
  const s2 = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  for (let i = times.length - 1; i >= 0; ) {
    const time = times[i];
    let events = 0;
    const eventSum = new Array<number>(p).fill(0);
    for (; i >= 0 && times[i] === time; i--) {
      const weight = Math.exp(eta[i] - offset);
      const row = rows[i];
      s0 += weight;
      for (let a = 0; a < p; a++) {
        s1[a] += weight * row[a];
        for (let b = 0; b <= a; b++) s2[a][b] += weight * row[a] * row[b];
      }
      if (collapsed[i]) {
        events++;
        logLikelihood += eta[i] - offset;
        for (let a = 0; a < p; a++) eventSum[a] += row[a];
      }
    }
    if (events === 0) continue;
    logLikelihood -= events * Math.log(s0);
    for (let a = 0; a < p; a++) {
      const meanA = s1[a] / s0;
      score[a] += eventSum[a] - events * meanA;
      for (let b = 0; b <= a; b++) information[a][b] += events * (s2[a][b] / s0 - meanA * (s1[b] / s0));
    }
  }
  for (let a = 0; a < p; a++) for (let b = 0; b < a; b++) information[b][a] = information[a][b];
  return { logLikelihood, score, information };
}
