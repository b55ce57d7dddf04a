import { CalibrationRefused } from './calibration-refused';
import type { CalibrationPoint } from './types';

/** Fewest observations on each side of the gel boundary a fit needs (common practice: ~10 events per parameter, relaxed for two). */
export const MIN_PER_SIDE = 8;
/** Fewest observations between the binodal and the spinodal for fitting the gel threshold. */
export const MIN_IN_BAND = 5;

/**
 * Refuses a fit the observations cannot support, saying how many are needed and how many there
 * are: at least MIN_PER_SIDE on each side of the gel boundary (the logistic model has two
 * parameters plus the threshold; with fewer events per parameter the estimates are unreliable —
 * Peduzzi, Concato, Kemper, Holford & Feinstein, J. Clin. Epidemiol. 49, 1373 (1996), who
 * suggest about ten), and at least MIN_IN_BAND inside the binodal but outside the spinodal when the
 * gel threshold is fitted (only there does it decide anything).
 *
 * @throws CalibrationRefused 'too-few-observations'
 */
export function requireEnoughObservations(points: CalibrationPoint[], fitThreshold: boolean): void {
  const gel = points.filter((p) => p.outcome === 1).length;
  const notGel = points.length - gel;
  const inBand = points.filter((p) => p.inBand).length;
  const counts = { gelSide: gel, notGelSide: notGel, inBand, neededPerSide: MIN_PER_SIDE, neededInBand: MIN_IN_BAND };
  if (gel < MIN_PER_SIDE || notGel < MIN_PER_SIDE) {
    throw new CalibrationRefused(
      'too-few-observations',
      `A fit needs at least ${MIN_PER_SIDE} observations on each side of the gel boundary; this programme has ${gel} on the gel side (gel or collapsed) and ${notGel} not gel.`,
      counts,
    );
  }
  if (fitThreshold && inBand < MIN_IN_BAND) {
    throw new CalibrationRefused(
      'too-few-observations',
      `Fitting the gel threshold needs at least ${MIN_IN_BAND} observations inside the binodal but outside the spinodal, where the threshold decides between gel and separated; this programme has ${inBand}. Fit the attraction shift alone, or record samples there.`,
      counts,
    );
  }
}
