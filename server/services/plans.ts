import { Op, Sequelize, type Transaction } from 'sequelize';
import { PHYSICS_MODEL_VERSION } from '../../shared/physics';
import { DEFAULT_BOUNDARY_UNCERTAINTY, type BoundaryUncertainty } from '../../shared/planning';
import type { PlanListQuery, PlanRequest } from '../../shared/schemas/plans';
import { STATE_LABELS } from '../../shared/states';
import type { PlanPrice } from '../../shared/views/plan';
import { badRequest, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { Calibration, Plan, PlanRecipe, Recipe, User } from '../models';
import type { LoadedPlan, StoredPlanOutcome } from '../models/plan';
import { requireProgramme } from './lookups';
import { paged } from './paging';
import { buildMapPoints } from './map-points';
import { programmeParameters } from './predictions';
import { materialsOfRecipe, plainMaterials } from './recipe-materials';
import { HeavyJobFailed, runInWorker, withHeavyJobSlot } from './heavy-jobs';
import { inOwnTransaction } from './own-transaction';
import type { PlanJob } from './plan-compute';
import { shelfLifeInput } from './shelf-life';

type Ctx = HandlerContext<unknown, unknown, unknown>;

export { COST_FORMULA, EXPERIMENT_METHOD, PLAN_METHOD, PLAN_SAMPLES, planLevels, planTemplate } from './plan-compute';

/**
 * The boundary uncertainty of a programme: the accepted calibration's fitted shift, its standard
 * error and logistic slope, or the documented default (DEFAULT_BOUNDARY_UNCERTAINTY) without one.
 */
async function boundaryUncertainty(calibration: { id: number } | null, transaction: Transaction | null): Promise<BoundaryUncertainty> {
  if (!calibration) return { ...DEFAULT_BOUNDARY_UNCERTAINTY };
  const row = await Calibration.findByPk(calibration.id, { transaction, attributes: ['id', 'attractionShift', 'attractionShiftSe', 'result'] });
  if (!row || !(row.attractionShiftSe > 0) || !Number.isFinite(row.attractionShiftSe)) return { ...DEFAULT_BOUNDARY_UNCERTAINTY, shift: row?.attractionShift ?? 0 };
  const slope = row.result?.fit?.sharpness?.value;
  return { shift: row.attractionShift, standardError: row.attractionShiftSe, sharpness: typeof slope === 'number' && slope > 0 ? slope : null, source: 'calibration' };
}

const price = (override: number | null | undefined, library: number | null): PlanPrice =>
  override !== undefined && override !== null ? { pricePerKg: override, source: 'plan' } : library !== null ? { pricePerKg: library, source: 'library' } : { pricePerKg: null, source: 'none' };

/**
 * Runs the planner for a request and stores the plan: the materials from the library (400 naming
 * the field that points nowhere), the programme's accepted calibration (programmeParameters, the
 * single source) and its uncertainty, the bench evidence, then planCompositions with every chosen
 * composition re-derived exactly as a recipe (deriveRecipe on the recipe's cached map).
 */
export async function runPlan(ctx: Ctx, input: PlanRequest) {
  const programme = await requireProgramme(input.programmeId, null);
  if (programme.archivedAt) throw badRequest('programmeId: the programme is archived', 'programmeId');
  const materials = await materialsOfRecipe(input, null);
  const { parameters, calibration } = await programmeParameters(input.programmeId, null);
  const uncertainty = await boundaryUncertainty(calibration, null);
  const kind = input.attraction.source === 'depletion' ? 'polymer' : 'salt';
  const prices = {
    particles: price(input.prices?.particles, materials.particle.pricePerKg),
    solvent: price(input.prices?.solvent, materials.solvent.pricePerKg),
    polymer: kind === 'polymer' ? price(input.prices?.depletant, materials.depletant!.pricePerKg) : null,
    salt: kind === 'salt' ? price(input.prices?.salt, materials.salt!.pricePerKg) : null,
  };
  const job: PlanJob = {
    input,
    materials: plainMaterials(materials) as PlanJob['materials'],
    parameters,
    calibration,
    uncertainty,
    points: await buildMapPoints(ctx.deps.sequelize, input.programmeId),
    prices,
    shelfLife: await shelfLifeInput(ctx.deps.sequelize, input.programmeId),
  };
  // In a worker thread: 10,000 sampled compositions classified and ranked take seconds of CPU.
  const { HEAVY_JOBS_PER_USER, HEAVY_JOB_SECONDS } = ctx.deps.config;
  let stored: StoredPlanOutcome;
  try {
    stored = await withHeavyJobSlot(ctx.user!.id, HEAVY_JOBS_PER_USER, () => runInWorker<StoredPlanOutcome>('plan', job, HEAVY_JOB_SECONDS * 1000));
  } catch (error) {
    if (error instanceof HeavyJobFailed && error.field) throw badRequest(`${error.field}: ${error.message}`, error.field);
    throw error;
  }
  const title = input.title ?? `${STATE_LABELS[input.targetState]}: ${materials.particle.name} with ${(materials.depletant ?? materials.salt)!.name}`.slice(0, 120);
  // The route is not transactional (the worker may run for seconds): the plan is written in a
  // transaction of its own once it is computed.
  return inOwnTransaction(ctx, async (transaction) => {
    // Archived while the worker ran: nothing new goes into an archived programme.
    if ((await requireProgramme(input.programmeId, transaction)).archivedAt) throw badRequest('programmeId: the programme is archived', 'programmeId');
    const created = await Plan.create(
      {
        programmeId: programme.id, title, targetState: input.targetState, attractionSource: input.attraction.source, inputs: input,
        modelVersion: PHYSICS_MODEL_VERSION, calibrationId: calibration?.id ?? null, outcome: stored,
        candidateCount: stored.outcome.candidates.length, feasible: stored.outcome.feasible, createdBy: ctx.user!.id,
      },
      { transaction },
    );
    await ctx.audit({ action: 'plan.created', entityType: 'plan', entityId: created.id, details: { programmeId: programme.id, targetState: input.targetState, candidates: stored.outcome.candidates.length, experiments: stored.outcome.experiments.items.length, calibrationId: calibration?.id ?? null } });
    return loadPlan(created.id, transaction);
  });
}

/** A plan with its author and the recipes made from it. */
export async function loadPlan(id: number, transaction: Transaction | null, lock = false): Promise<LoadedPlan> {
  const plan = await Plan.findByPk(id, {
    transaction,
    lock: lock && transaction ? transaction.LOCK.UPDATE : undefined,
    include: lock ? [] : [
      { model: User, as: 'creator', attributes: ['id', 'name'] },
      { model: PlanRecipe, as: 'made', include: [{ model: Recipe, as: 'recipe', attributes: ['id', 'code', 'name'] }] },
    ],
  });
  if (!plan) throw notFound('Plan');
  return plan as LoadedPlan;
}

/** A programme's plans, newest first, with how many recipes each has led to. */
export async function listPlans(query: PlanListQuery) {
  await requireProgramme(query.programme, null, 'field');
  const { rows, count } = await Plan.findAndCountAll({
    where: { programmeId: query.programme },
    attributes: { exclude: ['outcome', 'inputs'] },
    include: [{ model: User, as: 'creator', attributes: ['id', 'name'] }],
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
    ...paged(query),
  });
  const made = rows.length
    ? ((await PlanRecipe.findAll({ attributes: ['planId', [Sequelize.fn('COUNT', Sequelize.col('id')), 'n']], where: { planId: { [Op.in]: rows.map((r) => r.id) } }, group: ['planId'], raw: true })) as unknown as { planId: number; n: number }[])
    : [];
  const counts = new Map(made.map((m) => [m.planId, Number(m.n)]));
  return { rows: rows as (Plan & { creator?: User | null })[], count, counts };
}
