import { invertSymmetric, solveSymmetric } from '../statistics/logistic-regression';
import { Z_95 } from '../statistics/z-95';
import { breslowPartialLikelihood } from './breslow-partial-likelihood';
import { CoxFitRefused, MIN_COX_EVENTS } from './cox-fit-refused';
import { hazardReading } from './hazard-reading';

/** A covariate of the fit: the key of its value in each record, and how to speak of it. */
export interface CoxCovariate {
  key: string;
  /** Words for the reading, e.g. "attraction", "φ", "sample height". */
  label: string;
  /** Unit for the reading, e.g. "kT", "mm"; '' for a pure number. */
  unit: string;
  /** The change the hazard ratio is reported for (default 1): e.g. 0.01 for φ. */
  step?: number;
}

/** One sample followed on the shelf, with the values of its covariates. */
export interface CoxRecord {
  timeDays: number;
  collapsed: boolean;
  values: Readonly<Record<string, number>>;
}

/** One covariate's result, on its own scale. */
export interface CoxTerm {
  key: string;
  label: string;
  unit: string;
  step: number;
  /** β: the change of the log collapse hazard per unit of the covariate. */
  coefficient: number;
  standardError: number;
  /** 95 % Wald interval of β. */
  low: number;
  high: number;
  /** exp(β·step) and its 95 % interval. */
  hazardRatio: number;
  hazardRatioLow: number;
  hazardRatioHigh: number;
  /** Whether the interval of the hazard ratio leaves out 1 (no effect). */
  clear: boolean;
  /** e.g. "each +1 kT of attraction multiplies the collapse hazard by 0.62 (0.48–0.80)". */
  reading: string;
}

export interface CoxFit {
  terms: CoxTerm[];
  /** Covariance of the coefficients on the covariates' own scale (inverse information). */
  covariance: number[][];
  logPartialLikelihood: number;
  /** At β = 0, for a likelihood-ratio test: 2(ℓ − ℓ₀) ~ χ² with p degrees of freedom. */
  nullLogPartialLikelihood: number;
  iterations: number;
  sampleCount: number;
  eventCount: number;
}

/** Standardised coefficients beyond this mean the likelihood has no maximum (hazard ratio e^30 per SD). */
const RUNAWAY = 30;

/**
 * Cox proportional-hazards model for time to collapse: the collapse hazard of a sample is
 * h(t | x) = h₀(t) · exp(β·x), with h₀ left unspecified; β maximises the partial likelihood
 * (Breslow's ties: breslowPartialLikelihood).
 *
 * Fit: covariates are standardised internally (z = (x − mean)/SD) for stability; Newton–Raphson
 * from β = 0, Δ = I⁻¹U, halving the step while the partial likelihood does not rise; stops when ℓ
 * changes by less than 1e-10 relative. Reported on each covariate's own scale: β = β_z / SD,
 * covariance = I_z⁻¹ scaled by 1/(SD_j SD_k); 95 % Wald intervals β ± 1.959964·SE; hazard ratios
 * exp(β·step).
 *
 * Source: D. R. Cox, J. R. Stat. Soc. B 34, 187 (1972); N. Breslow, Biometrics 30, 89 (1974);
 * Klein & Moeschberger, *Survival Analysis*, 2nd ed. (2003), ch. 8; freely readable: Wikipedia,
 * "Proportional hazards model". Written here because no well-kept npm package fits Cox models.
 *
 * Limits: at least 10 collapses (MIN_COX_EVENTS) and every covariate varying; few collapses per
 * covariate give wide intervals. The model assumes the covariates scale the hazard by the same
 * factor at every age (proportional hazards), which these results do not check.
 * @throws CoxFitRefused with reason 'too-few-events' (message: how many collapses there are and
 *   how many are needed), 'no-variation' (naming the covariate) or 'no-convergence' (the collapses
 *   are separated by a covariate, so a hazard ratio runs off to 0 or infinity)
 * @throws RangeError for no covariates, a repeated key, or a missing or non-finite value (naming
 *   the record and key)
 * @example coxProportionalHazards(sixMpAndPlacebo, [{ key: 'placebo', label: 'placebo', unit: '' }])
 *   .terms[0] // { coefficient: 1.509, standardError: 0.410, hazardRatio: 4.52, … }
 */
export function coxProportionalHazards(records: readonly CoxRecord[], covariates: readonly CoxCovariate[]): CoxFit {
  checkInput(records, covariates);
  const eventCount = records.reduce((n, r) => n + (r.collapsed ? 1 : 0), 0);
  if (eventCount < MIN_COX_EVENTS) {
    throw new CoxFitRefused('too-few-events', `Cannot fit what drives collapse: ${eventCount} collapse${eventCount === 1 ? '' : 's'} seen; at least ${MIN_COX_EVENTS} are needed.`, { events: eventCount, needed: MIN_COX_EVENTS });
  }
  const sorted = [...records].sort((a, b) => a.timeDays - b.timeDays);
  const scales = covariates.map((covariate) => {
    const values = sorted.map((r) => r.values[covariate.key]);
    const mean = values.reduce((s, v) => s + v, 0) / values.length;
    const sd = Math.sqrt(values.reduce((s, v) => s + (v - mean) ** 2, 0) / values.length);
    if (!(sd > 1e-12 * Math.max(1, Math.abs(mean)))) {
      throw new CoxFitRefused('no-variation', `Cannot fit what drives collapse: ${covariate.label} is ${values[0]} in every sample; it needs at least two different values.`, { samples: values.length }, covariate.key);
    }
    return { mean, sd };
  });
  const times = sorted.map((r) => r.timeDays);
  const collapsed = sorted.map((r) => r.collapsed);
  const rows = sorted.map((r) => covariates.map((c, k) => (r.values[c.key] - scales[k].mean) / scales[k].sd));
  const p = covariates.length;
  let beta = new Array<number>(p).fill(0);
  let current = breslowPartialLikelihood(times, collapsed, rows, beta);
  const nullLogPartialLikelihood = current.logLikelihood;
  let iterations = 0;
  for (; iterations < 100; iterations++) {
    const step = solveOrRefuse(current.information, current.score, covariates, beta, eventCount);
    let candidate = beta.map((b, k) => b + step[k]);
    let next = breslowPartialLikelihood(times, collapsed, rows, candidate);
    for (let halving = 0; halving < 30 && !(next.logLikelihood >= current.logLikelihood); halving++) {
      step.forEach((_, k) => (step[k] /= 2));
      candidate = beta.map((b, k) => b + step[k]);
      next = breslowPartialLikelihood(times, collapsed, rows, candidate);
    }
    const gain = next.logLikelihood - current.logLikelihood;
    if (!(gain >= 0)) break; // no step improves: at the maximum to rounding
    beta = candidate;
    current = next;
    const runaway = beta.findIndex((b) => Math.abs(b) > RUNAWAY);
    if (runaway >= 0) throw separated(covariates[runaway], eventCount);
    if (gain < 1e-10 * (Math.abs(current.logLikelihood) + 1e-3) && Math.max(...step.map(Math.abs)) < 1e-6) break;
  }
  if (iterations >= 100) throw new CoxFitRefused('no-convergence', 'Cannot fit what drives collapse: the fit did not settle in 100 steps.', { events: eventCount });
  const standardisedCovariance = invertSymmetricOrRefuse(breslowPartialLikelihood(times, collapsed, rows, beta).information, covariates);
  const covariance = standardisedCovariance.map((row, j) => row.map((value, k) => value / (scales[j].sd * scales[k].sd)));
  const terms = covariates.map((covariate, k): CoxTerm => {
    const coefficient = beta[k] / scales[k].sd;
    const standardError = Math.sqrt(covariance[k][k]);
    const step = covariate.step ?? 1;
    const low = coefficient - Z_95 * standardError;
    const high = coefficient + Z_95 * standardError;
    const ratios = [coefficient, low, high].map((b) => Math.exp(b * step)).sort((a, b) => a - b);
    const hazardRatio = Math.exp(coefficient * step);
    const [hazardRatioLow, , hazardRatioHigh] = ratios;
    const clear = hazardRatioLow > 1 || hazardRatioHigh < 1;
    const reading = hazardReading({ label: covariate.label, unit: covariate.unit, step }, hazardRatio, hazardRatioLow, hazardRatioHigh);
    return { key: covariate.key, label: covariate.label, unit: covariate.unit, step, coefficient, standardError, low, high, hazardRatio, hazardRatioLow, hazardRatioHigh, clear, reading };
  });
  return { terms, covariance, logPartialLikelihood: current.logLikelihood, nullLogPartialLikelihood, iterations: iterations + 1, sampleCount: records.length, eventCount };
}

function checkInput(records: readonly CoxRecord[], covariates: readonly CoxCovariate[]): void {
  if (covariates.length === 0) throw new RangeError('coxProportionalHazards: needs at least one covariate');
  const keys = new Set<string>();
  for (const c of covariates) {
    if (keys.has(c.key)) throw new RangeError(`coxProportionalHazards: covariate ${c.key} is listed twice`);
    keys.add(c.key);
    if (c.step !== undefined && !(Number.isFinite(c.step) && c.step > 0)) throw new RangeError(`coxProportionalHazards: covariate ${c.key} has step ${c.step}; it must be finite and > 0`);
  }
  records.forEach((r, i) => {
    if (!(Number.isFinite(r.timeDays) && r.timeDays >= 0)) throw new RangeError(`coxProportionalHazards: record ${i} has timeDays ${r.timeDays}; times must be finite and ≥ 0`);
    if (typeof r.collapsed !== 'boolean') throw new RangeError(`coxProportionalHazards: record ${i} has collapsed ${String(r.collapsed)}; it must be true or false`);
    for (const c of covariates) if (!Number.isFinite(r.values[c.key])) throw new RangeError(`coxProportionalHazards: record ${i} has ${c.key} = ${r.values[c.key]}; every covariate needs a finite value`);
  });
}

function separated(covariate: CoxCovariate, eventCount: number): CoxFitRefused {
  return new CoxFitRefused('no-convergence', `Cannot fit what drives collapse: ${covariate.label} separates the samples that collapsed from those that did not, so its effect runs off to infinity; more varied samples are needed.`, { events: eventCount }, covariate.key);
}

function solveOrRefuse(information: number[][], score: number[], covariates: readonly CoxCovariate[], beta: readonly number[], eventCount: number): number[] {
  try {
    return solveSymmetric(information, score);
  } catch {
    // Away from β = 0 a vanishing information means a coefficient is running off to infinity.
    const largest = beta.reduce((best, b, k) => (Math.abs(b) > Math.abs(beta[best]) ? k : best), 0);
    if (Math.abs(beta[largest]) > 3) throw separated(covariates[largest], eventCount);
    throw new CoxFitRefused('no-convergence', `Cannot fit what drives collapse: the covariates (${covariates.map((c) => c.label).join(', ')}) cannot be told apart in these samples (one is fixed by the others, or a hazard ratio runs off to infinity).`);
  }
}

function invertSymmetricOrRefuse(information: number[][], covariates: readonly CoxCovariate[]): number[][] {
  try {
    return invertSymmetric(information);
  } catch {
    throw new CoxFitRefused('no-convergence', `Cannot fit what drives collapse: the covariates (${covariates.map((c) => c.label).join(', ')}) cannot be told apart in these samples.`);
  }
}
