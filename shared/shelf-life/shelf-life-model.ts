import { median } from 'simple-statistics';
import { breslowBaselineHazard, type BaselineHazard } from './breslow-baseline-hazard';
import { CoxFitRefused, MIN_COX_EVENTS, type CoxRefusalReason } from './cox-fit-refused';
import { coxProportionalHazards, type CoxCovariate, type CoxTerm } from './cox-proportional-hazards';
import { predictedMedianDays, predictedSurvivalAt } from './predicted-survival';

/**
 * What a programme's shelf-life model is fitted on: attraction depth, φ and gravity against
 * thermal motion (the recipe's), and the sample's fill height (the bench's, per sample: taller
 * samples of a weak gel collapse sooner, Starrs et al. 2002).
 */
export const SHELF_LIFE_COVARIATES = [
  { key: 'attractionKt', label: 'attraction', unit: 'kT', step: 1 },
  { key: 'phi', label: 'φ', unit: '', step: 0.01 },
  { key: 'log10Peclet', label: 'log₁₀ gravitational Péclet number', unit: '', step: 1 },
  { key: 'sampleHeightMm', label: 'sample height', unit: 'mm', step: 10 },
] as const satisfies readonly CoxCovariate[];
export type ShelfLifeCovariateKey = (typeof SHELF_LIFE_COVARIATES)[number]['key'];
export type ShelfLifeCovariates = Record<ShelfLifeCovariateKey, number | null>;
/** The covariates a recipe carries (from its derivation); the fill height belongs to each sample. */
export type ShelfLifeRecipeCovariates = Omit<ShelfLifeCovariates, 'sampleHeightMm'>;

/**
 * How a covariate unknown for some samples is spoken of: a recipe's quantity is "not known"; a
 * sample's height, which the bench gives or not, is "not recorded on the bench log".
 */
const MISSING_WORDS: Partial<Record<ShelfLifeCovariateKey, string>> = { sampleHeightMm: 'not recorded on the bench log' };

/** A covariate the fit left out, and why in plain words. */
export interface OmittedCovariate {
  key: string;
  label: string;
  why: string;
}

/** One sample as the model reads it; a covariate absent or null is unknown for that sample. */
export interface ShelfLifeModelRecord {
  timeDays: number;
  collapsed: boolean;
  covariates: Partial<ShelfLifeCovariates>;
}

interface ModelCommon {
  sampleCount: number;
  eventCount: number;
  /** The latest age any sample was seen at: predictions past it are not made. */
  lastTimeDays: number;
  omitted: OmittedCovariate[];
}

/** A fitted model: the Cox terms, Breslow's baseline and the samples' typical (median) covariates. */
export interface ShelfLifeModelFitted extends ModelCommon {
  status: 'fitted';
  terms: CoxTerm[];
  coefficients: Record<string, number>;
  baseline: BaselineHazard;
  typical: Record<string, number>;
}

export interface ShelfLifeModelRefused extends ModelCommon {
  status: 'refused';
  reason: CoxRefusalReason;
  /** Plain words, e.g. "Cannot fit what drives collapse: 4 collapses seen; at least 10 are needed." */
  message: string;
}

export type ShelfLifeModel = ShelfLifeModelFitted | ShelfLifeModelRefused;

/**
 * A programme's model of what drives collapse: coxProportionalHazards on the covariates of
 * SHELF_LIFE_COVARIATES that every sample has and that vary across the samples (the others are
 * listed in `omitted` with the reason: so sample height is used only when every sample in the
 * fit has a recorded height, and otherwise left out with the count of samples without one), then
 * Breslow's baseline (breslowBaselineHazard) for predictions. Refusals (too few collapses,
 * nothing varying, separation) come back as `status: 'refused'` with CoxFitRefused's words, not
 * as an exception, so a caller can show them.
 * @example fitShelfLifeModel(records).status // 'fitted' or 'refused'
 */
export function fitShelfLifeModel(records: readonly ShelfLifeModelRecord[]): ShelfLifeModel {
  const eventCount = records.reduce((n, r) => n + (r.collapsed ? 1 : 0), 0);
  const lastTimeDays = records.reduce((m, r) => Math.max(m, r.timeDays), 0);
  const omitted: OmittedCovariate[] = [];
  const used: CoxCovariate[] = [];
  for (const covariate of SHELF_LIFE_COVARIATES) {
    const values = records.map((r) => r.covariates[covariate.key] ?? null);
    const missing = values.filter((v) => v === null || !Number.isFinite(v)).length;
    if (missing > 0) omitted.push({ key: covariate.key, label: covariate.label, why: `${MISSING_WORDS[covariate.key] ?? 'not known'} for ${missing} of ${records.length} samples` });
    else if (records.length > 0 && values.every((v) => Math.abs((v as number) - (values[0] as number)) <= 1e-12 * Math.max(1, Math.abs(values[0] as number)))) {
      omitted.push({ key: covariate.key, label: covariate.label, why: `the same (${Number((values[0] as number).toPrecision(3))}) in every sample` });
    } else used.push(covariate);
  }
  const common = { sampleCount: records.length, eventCount, lastTimeDays, omitted };
  if (eventCount < MIN_COX_EVENTS || used.length === 0) {
    const message = eventCount < MIN_COX_EVENTS
      ? `Cannot fit what drives collapse: ${eventCount} collapse${eventCount === 1 ? '' : 's'} seen; at least ${MIN_COX_EVENTS} are needed.`
      : `Cannot fit what drives collapse: none of ${SHELF_LIFE_COVARIATES.map((c) => c.label).join(', ')} varies across the samples with a known value.`;
    return { status: 'refused', reason: eventCount < MIN_COX_EVENTS ? 'too-few-events' : 'no-variation', message, ...common };
  }
  const coxRecords = records.map((r) => ({ timeDays: r.timeDays, collapsed: r.collapsed, values: r.covariates as Record<string, number> }));
  try {
    const fit = coxProportionalHazards(coxRecords, used);
    const coefficients = Object.fromEntries(fit.terms.map((t) => [t.key, t.coefficient]));
    const typical = Object.fromEntries(used.map((c) => [c.key, median(coxRecords.map((r) => r.values[c.key]))]));
    return { status: 'fitted', terms: fit.terms, coefficients, baseline: breslowBaselineHazard(coxRecords, coefficients), typical, ...common };
  } catch (error) {
    if (!(error instanceof CoxFitRefused)) throw error;
    return { status: 'refused', reason: error.reason, message: error.message, ...common };
  }
}

/** The model's predicted median days for a recipe's covariates, any the model does not use taking their typical value; null past what the bench watched. */
export function modelMedianDays(model: ShelfLifeModelFitted, covariates: Partial<ShelfLifeCovariates>): number | null {
  return predictedMedianDays(model.baseline, model.coefficients, valuesFor(model, covariates));
}

/** The model's chance that a sample with these covariates still stands at `days`; null past what the bench watched. */
export function modelSurvivalAt(model: ShelfLifeModelFitted, covariates: Partial<ShelfLifeCovariates>, days: number): number | null {
  if (days > model.lastTimeDays) return null;
  return predictedSurvivalAt(model.baseline, model.coefficients, valuesFor(model, covariates), days);
}

/** The covariates the model uses, a missing one at the samples' typical (median) value. */
export function valuesFor(model: ShelfLifeModelFitted, covariates: Partial<ShelfLifeCovariates>): Record<string, number> {
  const values: Record<string, number> = {};
  for (const key of Object.keys(model.coefficients)) {
    const given = covariates[key as ShelfLifeCovariateKey];
    values[key] = given !== null && given !== undefined && Number.isFinite(given) ? given : model.typical[key];
  }
  return values;
}

/**
 * The model's prediction in words for a recipe, e.g. "the model predicts half collapsed by 40
 * days". A recipe has no fill height of its own: when the model uses the height, the words say
 * the prediction is for a sample of the programme's typical (median) height.
 */
export function describePrediction(model: ShelfLifeModelFitted, medianDays: number | null): string {
  const words = medianDays === null
    ? `the model predicts more than half still standing at ${model.lastTimeDays} days, the longest the bench has watched`
    : `the model predicts half collapsed by ${medianDays} days`;
  const height = model.typical.sampleHeightMm;
  return height === undefined ? words : `${words}, for a sample filled to the programme's typical ${Number(height.toPrecision(3))} mm`;
}

/** Published physics of delayed collapse, shown beside the fitted model as context (not as the model). */
export const COLLAPSE_PHYSICS_CONTEXT =
  'Published physics, as context and not the model: weak depletion gels can stand for a latency time and then collapse suddenly; the latency grows with the strength of attraction and falls with sample height and with the density mismatch between particles and liquid (Starrs, Poon, Hibberd & Robins, J. Phys.: Condens. Matter 14, 2485 (2002); Manley et al., Phys. Rev. Lett. 95, 048302 (2005); from memory).';
