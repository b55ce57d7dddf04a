import { modelMedianDays, modelSurvivalAt, type ShelfLifeCovariates, type ShelfLifeModel, type ShelfLifeModelFitted } from './shelf-life-model';

/** What the programme's model says of one composition against "stays a gel for at least N days". */
export interface ShelfLifeVerdict {
  /** Predicted median days to collapse; null beyond what the bench has watched. */
  medianDays: number | null;
  /** Predicted chance of still standing at N days; null when N lies beyond what the bench has watched, or none was asked. */
  survivalAtMinimum: number | null;
  /** Whether the predicted median reaches N: null when none was asked or the model cannot tell (N beyond the bench's watch). */
  meets: boolean | null;
}

/**
 * Judges a composition against a shelf-life minimum of N days with the programme's Cox model:
 * it meets it when the predicted median time to collapse is at least N (more than half of such
 * samples still stand at N days); a median beyond the longest watch meets any N up to that watch
 * and cannot be judged beyond it.
 * @example shelfLifeVerdict(model, { attractionKt: 5, phi: 0.2, log10Peclet: null }, 30) // with H₀ = 0.2, 0.7, 1.5 at 10, 20, 40 d centred there: { medianDays: 20, survivalAtMinimum: 0.4966, meets: false }
 */
export function shelfLifeVerdict(model: ShelfLifeModelFitted, covariates: Partial<ShelfLifeCovariates>, minimumDays: number | null): ShelfLifeVerdict {
  const medianDays = modelMedianDays(model, covariates);
  if (minimumDays === null) return { medianDays, survivalAtMinimum: null, meets: null };
  const survivalAtMinimum = modelSurvivalAt(model, covariates, minimumDays);
  const meets = medianDays !== null ? medianDays >= minimumDays : minimumDays <= model.lastTimeDays ? true : null;
  return { medianDays, survivalAtMinimum, meets };
}

/**
 * The planner's words on its shelf-life column and request: what was asked, how it was used, or
 * why it could not be honoured (the model's refusal), e.g.
 * "Asked to stay a gel for at least 30 days: cannot be honoured — Cannot fit … 4 collapses seen; …
 * The candidates are ranked as before."
 */
export function shelfLifeRequestNote(model: ShelfLifeModel, minimumDays: number | null): string {
  const asked = minimumDays === null ? null : `stay a gel for at least ${minimumDays} day${minimumDays === 1 ? '' : 's'}`;
  if (model.status === 'refused') {
    return asked
      ? `Asked to ${asked}: cannot be honoured. ${model.message} The candidates are ranked as before.`
      : `No shelf-life prediction: ${model.message}`;
  }
  const base = `Predicted median days to collapse from the programme's Cox model (${model.sampleCount} samples, ${model.eventCount} collapses), with any quantity the model does not use at its typical value.`;
  if (!asked) return base;
  const beyond = minimumDays! > model.lastTimeDays ? ` The bench has watched samples for at most ${model.lastTimeDays} days, so a candidate whose median lies beyond that cannot be judged against ${minimumDays} days.` : '';
  return `${base} Asked to ${asked}: candidates predicted to fall short are kept but listed after those that meet it, marked "short".${beyond}`;
}
