import { errorFunction } from 'simple-statistics';
import type { BoundaryUncertainty } from './types';

/**
 * Chance that a composition shows the target state, given how far (in B2*, along the attraction
 * axis) it sits from where the target state begins or ends at the fitted shift — `offset` > 0
 * inside the target region — and the uncertainty of that boundary.
 *
 * - With a calibration's logistic slope β (per unit B2*; fitGelBoundary) and the standard error σ
 *   of its shift, the predictive probability is the logistic averaged over the normal
 *   uncertainty of the shift, ∫ σ(β(d − δ)) N(δ; 0, σ²) dδ ≈ σ(κβd), κ = (1 + πβ²σ²/8)^(−½)
 *   (the probit approximation: D. J. C. MacKay, Neural Computation 4, 720 (1992); C. M. Bishop,
 *   *Pattern Recognition and Machine Learning* (Springer, 2006), §4.5.2, eq. 4.153).
 * - Without a slope (no calibration) the boundary is sharp and only its position is uncertain:
 *   P = Φ(d/σ), the normal distribution function (Φ(z) = ½(1 + erf(z/√2)), simple-statistics).
 *
 * @param offset d in B2* units (finite).
 * @param uncertainty σ ≥ 0 (`standardError`) and β > 0 or null (`sharpness`).
 * @example targetProbability(0.5, { shift: 0, standardError: 0.5, sharpness: 2, source: 'calibration' }) // 0.6999…
 */
export function targetProbability(offset: number, uncertainty: Pick<BoundaryUncertainty, 'standardError' | 'sharpness'>): number {
  const sigma = uncertainty.standardError;
  const beta = uncertainty.sharpness;
  if (!Number.isFinite(offset)) throw new RangeError(`targetProbability: offset must be finite; got ${offset}`);
  if (!(sigma >= 0)) throw new RangeError(`targetProbability: standardError must be ≥ 0; got ${sigma}`);
  if (beta !== null && !(beta > 0)) throw new RangeError(`targetProbability: sharpness must be positive or null; got ${beta}`);
  if (beta === null) {
    if (sigma === 0) return offset > 0 ? 1 : offset < 0 ? 0 : 0.5;
    return 0.5 * (1 + errorFunction(offset / (sigma * Math.SQRT2)));
  }
  const kappa = 1 / Math.sqrt(1 + (Math.PI * beta * beta * sigma * sigma) / 8);
  return 1 / (1 + Math.exp(-kappa * beta * offset));
}
