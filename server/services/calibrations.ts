import { Op, type Transaction } from 'sequelize';
import { CalibrationRefused } from '../../shared/calibration';
import { observationColumns, type BenchForFit, type ObservationRowForFit } from '../../shared/calibration/bench-for-fit';
import type { CalibrationFit } from '../../shared/calibration/types';
import { HeavyJobFailed, runInWorker, withHeavyJobSlot } from './heavy-jobs';
import { PHYSICS_MODEL_VERSION, PhysicsArgumentError } from '../../shared/physics';
import { deriveRecipe } from '../../shared/recipe-derivation';
import type { CalibrationFitInput } from '../../shared/schemas/calibrations';
import type { PredictionRecompute } from '../../shared/views/calibration';
import { conflict, HttpError, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { Calibration, Observation, Recipe, User } from '../models';
import { recipeInputOf } from '../models/recipe-shapes';
import { requireProgramme } from './lookups';
import { inOwnTransaction } from './own-transaction';
import { adhocPrediction, programmeParameters } from './predictions';
import { materialsOfRecipes, plainMaterials, type LoadedMaterials } from './recipe-materials';

type Ctx = HandlerContext<unknown, unknown, unknown>;

const people = () => [
  { model: User, as: 'fitter', attributes: ['id', 'name'] },
  { model: User, as: 'acceptor', attributes: ['id', 'name'] },
  { model: User, as: 'ender', attributes: ['id', 'name'] },
];

/** A programme's calibrations, newest first. */
export async function listCalibrations(programmeId: number) {
  await requireProgramme(programmeId, null, 'param');
  return Calibration.findAll({ where: { programmeId }, include: people(), order: [['createdAt', 'DESC'], ['id', 'DESC']] });
}

/** One calibration of the programme, or a 404 (also when it belongs to another programme). */
export async function loadCalibration(programmeId: number, id: number, transaction: Transaction | null, lock = false) {
  const calibration = await Calibration.findOne({
    where: { id, programmeId },
    include: lock ? [] : people(),
    transaction,
    lock: lock && transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!calibration) throw notFound('Calibration');
  return calibration;
}

/** The library rows of each recipe by its id, or null when one of them no longer exists. */
async function materialsByRecipe(recipes: Recipe[], transaction: Transaction | null): Promise<Map<number, LoadedMaterials | null>> {
  const found = await materialsOfRecipes(recipes.map(recipeInputOf), transaction);
  return new Map(recipes.map((r, i) => [r.id, 'missing' in found[i] ? null : (found[i] as LoadedMaterials)]));
}

/** Observation rows read per query when gathering the bench for a fit: a few ms of request-thread work each. */
const FIT_READ_PAGE_ROWS = 5000;

/**
 * The programme's live bench as a fit needs it: the live recipes (composition, plain library rows,
 * stored φ and B2*) and the live observations as columns, read by keyset in pages so a large bench
 * never holds the request thread for long. The maps are built by calibrationObservationsOf in the
 * fit's worker thread.
 */
export async function benchForFit(programmeId: number, transaction: Transaction | null): Promise<BenchForFit> {
  const recipes = await Recipe.findAll({ where: { programmeId, archivedAt: null }, transaction });
  const materials = await materialsByRecipe(recipes, transaction);
  const rows: ObservationRowForFit[] = [];
  for (let lastId = 0; ; ) {
    const page = (await Observation.findAll({
      where: { programmeId, archivedAt: null, id: { [Op.gt]: lastId } },
      attributes: ['id', 'recipeId', 'adhocPhi', 'adhocReducedB2', 'observedState'],
      order: [['id', 'ASC']],
      limit: FIT_READ_PAGE_ROWS,
      transaction,
      raw: true,
    })) as unknown as ObservationRowForFit[];
    for (const row of page) rows.push(row);
    if (page.length < FIT_READ_PAGE_ROWS) break;
    lastId = page[page.length - 1].id;
  }
  return {
    recipes: recipes.map((recipe) => {
      const m = materials.get(recipe.id);
      return {
        id: recipe.id,
        input: recipeInputOf(recipe),
        materials: m ? plainMaterials(m) : null,
        phi: recipe.derived.phi,
        reducedB2: recipe.derived.reducedB2,
      };
    }),
    observations: observationColumns(rows),
  };
}

/** The 422 a refused fit answers with: what is missing, and the counts. */
function refusal(error: CalibrationRefused) {
  return new HttpError(422, 'calibration_refused', error.message, { reason: error.reason, counts: error.counts });
}

/**
 * Fits a calibration to the programme's bench and stores it as proposed. The route runs without
 * a transaction: the bench is read, the fit runs in a worker thread holding no database
 * connection (a long fit would outlast the connection's socket timeout), and the result is
 * written in a transaction of its own.
 */
export async function fitProgrammeCalibration(ctx: Ctx, programmeId: number, input: CalibrationFitInput) {
  const programme = await requireProgramme(programmeId, null, 'param');
  if (programme.archivedAt) throw conflict('The programme is archived; restore it before calibrating');
  const bench = await benchForFit(programmeId, null);
  const { HEAVY_JOBS_PER_USER, HEAVY_JOB_SECONDS } = ctx.deps.config;
  let result: CalibrationFit;
  try {
    // In a worker thread: a fit on tens of thousands of observations takes seconds of CPU.
    result = await withHeavyJobSlot(ctx.user!.id, HEAVY_JOBS_PER_USER, () =>
      runInWorker<CalibrationFit>('calibrationFit', { bench, options: { parameters: input.parameters, folds: input.folds } }, HEAVY_JOB_SECONDS * 1000),
    );
  } catch (error) {
    if (error instanceof HeavyJobFailed && error.refused) throw refusal(new CalibrationRefused(error.refused.reason as CalibrationRefused['reason'], error.message, error.refused.counts as Record<string, number>));
    throw error;
  }
  return inOwnTransaction(ctx, () => storeFit(ctx, programmeId, input, result));
}

async function storeFit(ctx: Ctx, programmeId: number, input: CalibrationFitInput, result: CalibrationFit) {
  const fit = result.fit;
  const calibration = await Calibration.create(
    {
      programmeId,
      attractionShift: result.parameters.attractionShift,
      attractionShiftSe: fit.attractionShift.standardError,
      gelB2Threshold: result.parameters.gelB2Threshold,
      gelB2ThresholdSe: fit.gelB2Threshold?.standardError ?? null,
      observationCount: result.observations.used,
      cvAccuracyBefore: result.crossValidation.before,
      cvAccuracyAfter: result.crossValidation.after,
      method: fit.method,
      modelVersion: PHYSICS_MODEL_VERSION,
      result,
      note: input.note ?? null,
      fittedBy: ctx.user!.id,
    },
    { transaction: ctx.transaction },
  );
  await ctx.audit({
    action: 'calibration.fitted',
    entityType: 'calibration',
    entityId: calibration.id,
    details: { programmeId, attractionShift: result.parameters.attractionShift, gelB2Threshold: result.parameters.gelB2Threshold, fitted: result.fitted, used: result.observations.used, verdict: result.verdict.kind },
  });
  return loadCalibration(programmeId, calibration.id, ctx.transaction);
}

/**
 * Re-derives every live recipe of the programme and re-predicts its live ad-hoc observations
 * with the programme's calibration as it now stands in this transaction (programmeParameters).
 * A recipe that cannot be derived any more stops the whole change (409), so the programme never
 * holds predictions from two calibrations. Rows are locked for update in id order; the stored
 * recipe keeps its updatedAt (no one edited it).
 */
export async function recomputePredictions(transaction: Transaction, programmeId: number): Promise<PredictionRecompute> {
  const { parameters, calibration } = await programmeParameters(programmeId, transaction);
  const recipes = await Recipe.findAll({ where: { programmeId, archivedAt: null }, order: [['id', 'ASC']], transaction, lock: transaction.LOCK.UPDATE });
  const materials = await materialsByRecipe(recipes, transaction);
  let changedStates = 0;
  for (const recipe of recipes) {
    const m = materials.get(recipe.id);
    if (!m) throw conflict(`Recipe ${recipe.code} refers to a material that no longer exists; nothing was changed`);
    let derived;
    try {
      derived = deriveRecipe(recipeInputOf(recipe), m, { parameters, calibration }).derived;
    } catch (error) {
      if (error instanceof PhysicsArgumentError) throw conflict(`Recipe ${recipe.code} could not be derived again (${error.message}); nothing was changed`);
      throw error;
    }
    if (derived.predictedState !== recipe.predictedState) changedStates++;
    recipe.set({ phi: derived.phi, reducedB2: derived.reducedB2, predictedState: derived.predictedState, margin: derived.margin, modelVersion: derived.modelVersion, derived });
    await recipe.save({ transaction, silent: true });
  }
  const adhoc = await Observation.findAll({ where: { programmeId, recipeId: null, archivedAt: null }, order: [['id', 'ASC']], transaction, lock: transaction.LOCK.UPDATE });
  for (const observation of adhoc) {
    if (observation.adhocPhi === null || observation.adhocReducedB2 === null) continue;
    const state = adhocPrediction(observation.adhocPhi, observation.adhocReducedB2, parameters);
    if (state !== observation.adhocPredictedState) {
      changedStates++;
      observation.adhocPredictedState = state;
      await observation.save({ transaction, silent: true });
    }
  }
  return { recipes: recipes.length, observations: adhoc.length, changedStates };
}

/**
 * Makes a proposed calibration the programme's own: the accepted one before it becomes
 * superseded (kept in the history), and every stored prediction of the programme is recomputed
 * with it — all in the route's one transaction, with the programme row locked for update first
 * so that accepts, withdrawals and recipe creation in the programme take turns.
 */
export async function acceptCalibration(ctx: Ctx, programmeId: number, id: number) {
  const transaction = ctx.transaction!;
  const programme = await requireProgramme(programmeId, transaction, 'param', true);
  if (programme.archivedAt) throw conflict('The programme is archived; restore it before changing its calibration');
  const calibration = await loadCalibration(programmeId, id, transaction, true);
  if (calibration.status === 'accepted') throw conflict('This calibration is already in use');
  if (calibration.status !== 'proposed') throw conflict(`A ${calibration.status} calibration cannot be accepted again; fit a new one`);
  if (calibration.modelVersion !== PHYSICS_MODEL_VERSION) throw conflict(`This calibration was fitted with physics model ${calibration.modelVersion}; the installation now runs ${PHYSICS_MODEL_VERSION}. Fit again.`);
  const now = new Date();
  const previous = await Calibration.findOne({ where: { programmeId, status: 'accepted' }, transaction, lock: transaction.LOCK.UPDATE });
  if (previous) {
    previous.set({ status: 'superseded', endedBy: ctx.user!.id, endedAt: now });
    await previous.save({ transaction });
  }
  calibration.set({ status: 'accepted', acceptedBy: ctx.user!.id, acceptedAt: now });
  await calibration.save({ transaction });
  const recomputed = await recomputePredictions(ctx.transaction!, programmeId);
  await ctx.audit({
    action: 'calibration.accepted',
    entityType: 'calibration',
    entityId: calibration.id,
    details: { programmeId, supersedes: previous?.id ?? null, attractionShift: calibration.attractionShift, gelB2Threshold: calibration.gelB2Threshold, ...recomputed },
  });
  return { calibration: await loadCalibration(programmeId, id, transaction), recomputed };
}

/** Goes back to the uncalibrated theory: the accepted calibration is withdrawn, predictions recomputed, in one transaction. */
export async function withdrawCalibration(ctx: Ctx, programmeId: number) {
  const transaction = ctx.transaction!;
  const programme = await requireProgramme(programmeId, transaction, 'param', true);
  if (programme.archivedAt) throw conflict('The programme is archived; restore it before changing its calibration');
  const accepted = await Calibration.findOne({ where: { programmeId, status: 'accepted' }, transaction, lock: transaction.LOCK.UPDATE });
  if (!accepted) throw conflict('No calibration is in use: the programme already predicts with the uncalibrated theory');
  accepted.set({ status: 'withdrawn', endedBy: ctx.user!.id, endedAt: new Date() });
  await accepted.save({ transaction });
  const recomputed = await recomputePredictions(ctx.transaction!, programmeId);
  await ctx.audit({ action: 'calibration.withdrawn', entityType: 'calibration', entityId: accepted.id, details: { programmeId, ...recomputed } });
  return { calibration: await loadCalibration(programmeId, accepted.id, transaction), recomputed };
}

