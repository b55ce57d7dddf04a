import { invertSymmetric, logisticRegression, type LogisticFit } from '../statistics/logistic-regression';
import { crossingPoint } from '../statistics/crossing-point';
import { CalibrationRefused } from './calibration-refused';
import { firthLogisticRegression } from './firth-logistic-regression';
import { gelBoundaryB2 } from './gel-boundary-b2';
import { goldenSectionMaximum } from './golden-section-maximum';
import { thresholdDecides } from './threshold-decides';
import type { CalibrationPoint, FitMethod, GelBoundaryFit } from './types';
import { waldEstimate } from './wald-estimate';

/**
 * Distances beyond this (in B2*) are treated as this far: a sample 40 or 250 units of B2* past the
 * boundary says no more about where the boundary lies than one 20 units past it, and leaving such
 * distances in saturates the fitted probabilities (weights → 0) and derails the fit. Winsorising
 * a covariate at fixed limits is common practice for outlying predictors.
 */
export const DISTANCE_LIMIT = 20;
const winsorised = (x: number) => Math.max(-DISTANCE_LIMIT, Math.min(DISTANCE_LIMIT, x));

/** Grid points of the first pass over the threshold; the best is refined by golden section. */
const THRESHOLD_GRID = 80;
/** The classifier accepts gel thresholds in [−100, 1] (resolveClassifierParameters). */
const THRESHOLD_RANGE: [number, number] = [-100, 1];

export interface GelBoundaryFitOptions {
  /** Fit the gel threshold too (profile likelihood); otherwise hold it at `threshold`. */
  fitThreshold: boolean;
  /** The threshold held fixed, or the default it replaces. */
  threshold: number;
}

/**
 * Fits the gel boundary to the bench: a logistic model of "the bench saw the gel side" against
 * the signed distance, in B2* along the attraction axis, from the observation to the rule's gel
 * boundary (gelBoundaryB2):
 *   logit P(gel side) = β₀ + β₁·xᵢ(t),   xᵢ(t) = G_φᵢ(t) − B2*ᵢ   (> 0: more attractive than the boundary)
 * so the sample is predicted on the gel side when B2*ᵢ − s ≤ G_φᵢ(t) with the attraction shift
 * s = β₀/β₁ (physics: B2*_effective = B2*_computed − s), and β₁ > 0 says how sharply the outcome
 * changes across the boundary (1/β₁ is the spread, in B2*, of where samples actually gel).
 * Distances along B2* rather than in normalised map coordinates: B2* is the one attraction scale
 * every map shares (extended law of corresponding states, Noro & Frenkel 2000), so observations
 * on different maps (depletion maps at several size ratios, generic maps) pool into one fit, and
 * the shift comes out in the unit the classifier applies it in.
 *
 * Estimation: maximum likelihood by iteratively reweighted least squares (logisticRegression;
 * McCullagh & Nelder 1989 §4.4). With the threshold fitted, the likelihood is maximised over t by
 * profiling: for each t the logistic fit in (β₀, β₁), over a grid of t then golden section around
 * the best. When the outcomes are perfectly separated at some t the maximum-likelihood estimate
 * does not exist (Albert & Anderson, Biometrika 71, 1 (1984)); the whole fit then uses Firth's
 * penalised likelihood instead (firthLogisticRegression) and says so in `method`.
 *
 * Uncertainty: the inverse information of (β₀, β₁, t), Σᵢ wᵢ zᵢzᵢᵀ with wᵢ = pᵢ(1 − pᵢ) and
 * zᵢ = ∂ηᵢ/∂(β₀, β₁, t) = (1, xᵢ, β₁·[t decides at φᵢ]) — the standard large-sample covariance
 * of a maximum-likelihood estimate (the Jacobian form for a predictor that is not linear in t);
 * the shift's standard error by the delta method on β₀/β₁ (crossingPoint in shared/statistics),
 * with a Wald 95 % interval. The threshold's 95 % interval is a profile-likelihood one (see
 * profileThreshold), because its likelihood is not smooth enough for a Wald interval; an end the
 * observations do not bound is null.
 *
 * @throws CalibrationRefused 'no-trend' when β₁ ≤ 0 (gels are not more likely at stronger
 *   attraction), 'threshold-not-identified' when no observation lets the threshold decide or
 *   its information is singular, 'shift-out-of-range' when |s| > 20 (the classifier's limit).
 */
export function fitGelBoundary(points: CalibrationPoint[], options: GelBoundaryFitOptions): GelBoundaryFit {
  const outcomes = points.map((p) => p.outcome);
  const features = (t: number) => points.map((p) => [winsorised(gelBoundaryB2(p.onset, t)! - p.reducedB2)]);
  const fitAt = (t: number, method: FitMethod): LogisticFit | null => {
    try {
      return method === 'firth' ? firthLogisticRegression(features(t), outcomes) : logisticRegression(features(t), outcomes);
    } catch (error) {
      if (method === 'maximum-likelihood' && /separated|convergence/.test((error as Error).message)) throw new SeparatedAt(t);
      return null;
    }
  };

  const run = (method: FitMethod): ThresholdProfile =>
    options.fitThreshold ? profileThreshold(points, (t) => fitAt(t, method)) : { threshold: options.threshold, fit: fitAt(options.threshold, method), interval: [NaN, NaN] };
  let method: FitMethod = 'maximum-likelihood';
  let profile: ThresholdProfile;
  try {
    profile = run(method);
  } catch (error) {
    if (!(error instanceof SeparatedAt)) throw error;
    method = 'firth';
    profile = run(method);
  }
  const { threshold, fit, interval } = profile;
  if (!fit) throw new CalibrationRefused('no-trend', 'The logistic fit did not converge on these observations: check the recorded states.');
  const [intercept, sharpness] = fit.coefficients;
  if (!(sharpness > 0)) {
    throw new CalibrationRefused('no-trend', 'The observations do not show gels becoming more likely at stronger attraction, so there is no gel boundary to fit: check the recorded states and attractions.');
  }

  const decides = points.filter((p) => thresholdDecides(p.onset, threshold)).length;
  const covariance = informationInverse(points, fit.coefficients, threshold, options.fitThreshold);
  if (!covariance && !options.fitThreshold) {
    throw new CalibrationRefused('no-trend', 'The observations all sit at the same distance from the gel boundary, so its position cannot be fitted: record samples at several attractions.');
  }
  if (!covariance || (options.fitThreshold && !(covariance[2][2] > 0 && Number.isFinite(covariance[2][2])))) {
    throw new CalibrationRefused(
      'threshold-not-identified',
      `The gel threshold is not pinned down by these observations: at the best fit it decides the gel call of ${decides} of them, and those do not separate it from the shift. Fit the attraction shift alone, or record samples between the binodal and the spinodal.`,
      { thresholdDecides: decides },
    );
  }
  const crossing = crossingPoint([intercept, sharpness], [[covariance[0][0], covariance[0][1]], [covariance[1][0], covariance[1][1]]]);
  const shift = -crossing.value;
  if (Math.abs(shift) > 20) {
    throw new CalibrationRefused('shift-out-of-range', `The fitted attraction shift (${shift.toFixed(1)} B2*) is beyond ±20, the classifier's limit: the theory's boundary does not describe these observations.`);
  }
  return {
    method,
    attractionShift: waldEstimate(shift, crossing.standardError),
    gelB2Threshold: options.fitThreshold ? { value: threshold, standardError: Math.sqrt(covariance[2][2]), low: Number.isFinite(interval[0]) ? interval[0] : null, high: Number.isFinite(interval[1]) ? interval[1] : null } : null,
    threshold,
    sharpness: waldEstimate(sharpness, Math.sqrt(covariance[1][1])),
    logLikelihood: fit.logLikelihood,
    covariance,
    thresholdDecides: decides,
  };
}

/** Raised inside the maximum-likelihood pass when some threshold separates the outcomes. */
class SeparatedAt extends Error {
  constructor(readonly threshold: number) {
    super(`outcomes separated at threshold ${threshold}`);
  }
}

/** χ²₁ at 0.95, halved: the drop of the profile log-likelihood at the ends of a 95 % interval. */
const HALF_CHI_SQUARE_95 = 3.841458820694124 / 2;

interface ThresholdProfile {
  threshold: number;
  fit: LogisticFit | null;
  /** 95 % profile-likelihood interval; an end is ±Infinity when the likelihood never drops enough within the search range. */
  interval: [number, number];
}

/**
 * The threshold maximising the profile log-likelihood, and its 95 % profile-likelihood
 * interval {t : 2[l(t̂) − l(t)] ≤ χ²₁(0.95)} (Venzon & Moolgavkar, Applied Statistics 37, 87
 * (1988)): the likelihood in t is piecewise smooth with kinks where t crosses an observation's
 * onset, so its curvature at t̂ alone understates the uncertainty. Beyond the extreme onsets of
 * the observations the likelihood is flat in t, so the search covers [lowest onset − 1, highest
 * binodal onset + 0.5] within the classifier's range.
 */
function profileThreshold(points: CalibrationPoint[], fitAt: (t: number) => LogisticFit | null): ThresholdProfile {
  const lows = points.map((p) => Math.min(p.onset.spinodalB2 ?? p.onset.binodalB2!, p.reducedB2));
  const highs = points.map((p) => p.onset.binodalB2!);
  const low = Math.max(THRESHOLD_RANGE[0], Math.min(...lows) - 1);
  const high = Math.min(THRESHOLD_RANGE[1], Math.max(...highs) + 0.5);
  const criterion = (t: number) => fitAt(t)?.logLikelihood ?? -Infinity;
  const step = (high - low) / THRESHOLD_GRID;
  const grid = Array.from({ length: THRESHOLD_GRID + 1 }, (_, i) => low + i * step);
  const values = grid.map(criterion);
  let bestIndex = 0;
  values.forEach((value, i) => { if (value > values[bestIndex]) bestIndex = i; });
  const refined = goldenSectionMaximum(criterion, Math.max(low, grid[bestIndex] - step), Math.min(high, grid[bestIndex] + step), 1e-6);
  const threshold = refined.value >= values[bestIndex] ? refined.x : grid[bestIndex];
  const peak = Math.max(refined.value, values[bestIndex]);
  const cut = peak - HALF_CHI_SQUARE_95;
  // Walk out from the estimate along the grid to the first point below the cut, then bisect.
  const edge = (direction: -1 | 1): number => {
    let inside = threshold;
    for (let i = bestIndex; i >= 0 && i < grid.length; i += direction) {
      if ((grid[i] - threshold) * direction <= 0) continue;
      if (values[i] < cut) {
        let outside = grid[i];
        for (let k = 0; k < 50 && Math.abs(outside - inside) > 1e-6; k++) {
          const middle = (inside + outside) / 2;
          if (criterion(middle) >= cut) inside = middle; else outside = middle;
        }
        return (inside + outside) / 2;
      }
      inside = grid[i];
    }
    return direction * Infinity;
  };
  return { threshold, fit: fitAt(threshold), interval: [edge(-1), edge(1)] };
}

/** (Σ wᵢ zᵢzᵢᵀ)⁻¹ at the estimate, or null when singular. */
function informationInverse(points: CalibrationPoint[], coefficients: number[], threshold: number, withThreshold: boolean): number[][] | null {
  const [b0, b1] = coefficients;
  const k = withThreshold ? 3 : 2;
  const information = Array.from({ length: k }, () => new Array(k).fill(0));
  for (const p of points) {
    const x = winsorised(gelBoundaryB2(p.onset, threshold)! - p.reducedB2);
    const probability = 1 / (1 + Math.exp(-(b0 + b1 * x)));
    const weight = probability * (1 - probability);
    const z = withThreshold ? [1, x, thresholdDecides(p.onset, threshold) ? b1 : 0] : [1, x];
    for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) information[i][j] += weight * z[i] * z[j];
  }
  try {
    return invertSymmetric(information);
  } catch {
    return null;
  }
}
