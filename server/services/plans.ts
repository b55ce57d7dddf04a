import { Op, Sequelize, type Transaction } from 'sequelize';
import { PhysicsArgumentError, PHYSICS_MODEL_VERSION, resolveClassifierParameters, type ClassifierParameters } from '../../shared/physics';
import {
  compositionSpace,
  DEFAULT_BOUNDARY_UNCERTAINTY,
  DEFAULT_RANKING_WEIGHTS,
  materialCostPerLitre,
  planCompositions,
  plannedRecipeInput,
  type BoundaryUncertainty,
  type CompositionSpace,
  type EvidenceInput,
  type PlanTemplate,
  type ValueRange,
} from '../../shared/planning';
import { deriveRecipe, recipeFieldOf, recipeStateMap } from '../../shared/recipe-derivation';
import type { PlanListQuery, PlanRequest } from '../../shared/schemas/plans';
import { STATE_LABELS, type ObservedState } from '../../shared/states';
import type { PlanPrice } from '../../shared/views/plan';
import type { RecipeDerived } from '../../shared/views/team-data';
import { badRequest, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { Calibration, Depletant, ParticleSystem, Plan, PlanRecipe, Recipe, Salt, Solvent, User } from '../models';
import type { StoredPlanOutcome } from '../models/plan';
import { requireProgramme } from './lookups';
import { decodeMapObservations, decodeMapRecipes } from '../../shared/views/map-points';
import { buildMapPoints } from './map-points';
import { programmeParameters, recipeMaterials } from './predictions';

type Ctx = HandlerContext<unknown, unknown, unknown>;

/** Compositions each plan samples (the Halton points of planCompositions). */
export const PLAN_SAMPLES = 10_000;

export const PLAN_METHOD =
  'Compositions sampled by the two-dimensional Halton sequence (Halton, Numerische Mathematik 2, 84 (1960)) over the φ and dose ranges, rounded to bench precision and classified one by one with the state map’s classifier; those in the target state with at least the asked margin ranked by a weighted sum of margin, cost per litre and nearby bench evidence (simple additive weighting, Hwang & Yoon 1981), chosen spread apart, and each re-derived exactly as the recipe it would become.';
export const EXPERIMENT_METHOD =
  'Uncertainty sampling (Settles, Active Learning Literature Survey, University of Wisconsin–Madison, 2009, §3.1): compositions where the model’s chance of the target state is closest to 50/50 under the uncertainty of the boundary, away from existing bench samples and spread along the boundary.';
export const COST_FORMULA =
  'Per litre of sample: φ·ρ_particles kg of particles, (1 − φ)·ρ_solvent kg of solvent, c·(1 − φ)/1000 kg of polymer (c in g per litre of solvent) or c·(1 − φ)·M/10⁶ kg of salt (c in mM, M in g/mol), each times its price per kg. Volumes assumed additive; the polymer’s and salt’s own volumes neglected.';

/** The plan's recipe shape: programme, materials and temperature shared by every composition. */
export function planTemplate(input: PlanRequest): PlanTemplate {
  const a = input.attraction;
  return {
    programmeId: input.programmeId,
    particleId: input.particleId,
    solventId: input.solventId,
    temperatureC: input.temperatureC,
    attraction: a.source === 'depletion' ? { source: 'depletion', depletantId: a.depletantId } : { source: 'salt', saltId: a.saltId },
  };
}

export const planLevels = (input: PlanRequest): ValueRange => (input.attraction.source === 'depletion' ? input.attraction.concentrationGL : input.attraction.concentrationMM);

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

/**
 * The programme's bench evidence for the planner: the latest observation of each live recipe at
 * that recipe's coordinates, and every ad-hoc observation at its own (the map overlay's data).
 * A recipe on the plan's own size ratio is placed by its polymer fraction, any other by B2*.
 */
async function programmeEvidence(sequelize: Sequelize, programmeId: number, space: CompositionSpace): Promise<EvidenceInput[]> {
  const points = await buildMapPoints(sequelize, programmeId);
  const mapQ = space.map.model.kind === 'depletion' ? space.map.model.q : null;
  const recipeList = decodeMapRecipes(points);
  const recipes = new Map(recipeList.map((r) => [r.id, r]));
  const latest = new Map<string, EvidenceInput>();
  for (const o of decodeMapObservations(points, recipeList)) {
    const { id, recipeId, observedState, ageDays } = o;
    if (observedState === 'unclear') continue;
    let item: EvidenceInput | null = null;
    if (recipeId !== null) {
      const r = recipes.get(recipeId);
      if (!r || r.phi === null) continue;
      const { polymerReservoir, sizeRatio, reducedB2: rB2 } = r;
      const attraction = mapQ !== null && polymerReservoir !== null && sizeRatio !== null && Math.abs(sizeRatio - mapQ) <= 1e-5 * mapQ
        ? { kind: 'depletion' as const, q: mapQ, polymerReservoir }
        : rB2 !== null ? { kind: 'b2' as const, value: rB2 } : null;
      if (attraction) item = { id, label: r.code ?? `recipe ${recipeId}`, phi: r.phi, attraction, observedState, ageDays };
    } else if (o.phi !== null && o.reducedB2 !== null) {
      item = { id, label: `ad-hoc sample ${id}`, phi: o.phi, attraction: { kind: 'b2', value: o.reducedB2 }, observedState, ageDays };
    }
    if (!item) continue;
    const key = recipeId !== null ? `r${recipeId}` : `o${id}`;
    const before = latest.get(key);
    if (!before || item.ageDays >= before.ageDays) latest.set(key, item);
  }
  return [...latest.values()];
}

/** The library rows a plan uses (the same lookup as a recipe's), or a 400 naming the field. */
const planMaterials = (input: PlanRequest, transaction: Transaction | null) => recipeMaterials(input, transaction);

const price = (override: number | null | undefined, library: number | null): PlanPrice =>
  override !== undefined && override !== null ? { pricePerKg: override, source: 'plan' } : library !== null ? { pricePerKg: library, source: 'library' } : { pricePerKg: null, source: 'none' };

function physicsProblem(error: unknown): never {
  if (error instanceof PhysicsArgumentError) {
    const field = recipeFieldOf(error);
    throw badRequest(`${field}: ${error.message}`, field);
  }
  throw error;
}

/**
 * Runs the planner for a request and stores the plan: the materials from the library (400 naming
 * the field that points nowhere), the programme's accepted calibration (programmeParameters, the
 * single source) and its uncertainty, the bench evidence, then planCompositions with every chosen
 * composition re-derived exactly as a recipe (deriveRecipe on the cached programme map).
 */
export async function runPlan(ctx: Ctx, input: PlanRequest) {
  const started = performance.now();
  const programme = await requireProgramme(input.programmeId, ctx.transaction);
  if (programme.archivedAt) throw badRequest('programmeId: the programme is archived', 'programmeId');
  const template = planTemplate(input);
  const levels = planLevels(input);
  const materials = await planMaterials(input, ctx.transaction);
  const { parameters, calibration } = await programmeParameters(input.programmeId, ctx.transaction);
  const uncertainty = await boundaryUncertainty(calibration, ctx.transaction);
  const kind = input.attraction.source === 'depletion' ? 'polymer' : 'salt';
  const prices = {
    particles: price(input.prices?.particles, materials.particle.pricePerKg),
    solvent: price(input.prices?.solvent, materials.solvent.pricePerKg),
    polymer: kind === 'polymer' ? price(input.prices?.depletant, materials.depletant!.pricePerKg) : null,
    salt: kind === 'salt' ? price(input.prices?.salt, materials.salt!.pricePerKg) : null,
  };
  const spaceFor = (range: ValueRange) => compositionSpace(template, materials, parameters, input.phi, range);
  let space: CompositionSpace;
  try {
    space = spaceFor(levels);
  } catch (error) {
    physicsProblem(error);
  }
  const evidence = await programmeEvidence(ctx.deps.sequelize, input.programmeId, space);
  const verify = (phi: number, level: number) => {
    const recipe = plannedRecipeInput(template, phi, level, 'candidate');
    try {
      const derived = deriveRecipe(recipe, materials, { parameters, map: recipeStateMap(recipe, materials, parameters), calibration });
      return { state: derived.predictedState, margin: derived.margin, detail: derived };
    } catch (error) {
      if (error instanceof PhysicsArgumentError) return null;
      throw error;
    }
  };
  const plan = () => planCompositions<RecipeDerived>({
    space: (range) => (range === levels ? space : spaceFor(range)),
    phi: input.phi,
    level: levels,
    target: input.targetState,
    minMargin: input.minMargin,
    count: input.candidateCount,
    experimentCount: input.experimentCount,
    samples: PLAN_SAMPLES,
    weights: input.ranking ?? DEFAULT_RANKING_WEIGHTS,
    cost: (phi, level) => materialCostPerLitre(phi, level, kind, {
      particleDensity: materials.particle.densityGcm3,
      solventDensity: materials.solvent.densityGcm3,
      saltMolarMass: materials.salt?.molarMassGMol ?? null,
      prices: { particles: prices.particles.pricePerKg, solvent: prices.solvent.pricePerKg, polymer: prices.polymer?.pricePerKg ?? null, salt: prices.salt?.pricePerKg ?? null },
    }),
    evidence,
    uncertainty,
    verify,
  });
  let outcome: ReturnType<typeof plan>;
  try {
    outcome = plan();
  } catch (error) {
    physicsProblem(error);
  }
  const stored: StoredPlanOutcome = {
    materials: { particle: materials.particle.name, solvent: materials.solvent.name, depletant: materials.depletant?.name ?? null, salt: materials.salt?.name ?? null },
    prices,
    levelUnit: space.level.unit,
    calibration,
    uncertainty,
    map: { model: space.map.model, parameters: resolveClassifierParameters(parameters as Partial<ClassifierParameters> | undefined), polydispersity: materials.particle.polydispersityPct, yLabel: space.map.y.label },
    outcome: {
      feasible: outcome.candidates.length > 0,
      candidates: outcome.candidates.map((c, index) => ({
        index, phi: c.phi, level: c.level, predictedState: c.state, margin: c.margin, nearestBoundary: c.nearestBoundary, mapY: c.mapY,
        costPerLitre: c.cost, evidence: c.evidence, score: c.score, scores: c.scores, derived: c.verified!, recipe: null,
      })),
      counts: outcome.counts,
      bestInRange: outcome.bestInRange,
      advice: outcome.advice,
      window: outcome.window,
      experiments: {
        items: outcome.experiments.items.filter((e) => e.verified).map((e, index) => ({
          index, phi: e.phi, level: e.level, predictedState: e.state, probability: e.probability, boundaryOffset: e.boundaryOffset,
          nearestBoundary: e.nearestBoundary, mapY: e.mapY, evidence: e.evidence, derived: e.verified!, recipe: null,
        })),
        summary: outcome.experiments.summary,
        band: outcome.experiments.band,
        method: EXPERIMENT_METHOD,
      },
      method: PLAN_METHOD,
      costFormula: COST_FORMULA,
      notes: outcome.notes,
      elapsedMs: Math.round(performance.now() - started),
    },
  };
  const title = input.title ?? `${STATE_LABELS[input.targetState]}: ${materials.particle.name} with ${(materials.depletant ?? materials.salt)!.name}`.slice(0, 120);
  const created = await Plan.create(
    {
      programmeId: programme.id, title, targetState: input.targetState, attractionSource: input.attraction.source, inputs: input,
      modelVersion: PHYSICS_MODEL_VERSION, calibrationId: calibration?.id ?? null, outcome: stored,
      candidateCount: stored.outcome.candidates.length, feasible: stored.outcome.feasible, createdBy: ctx.user!.id,
    },
    { transaction: ctx.transaction },
  );
  await ctx.audit({ action: 'plan.created', entityType: 'plan', entityId: created.id, details: { programmeId: programme.id, targetState: input.targetState, candidates: stored.outcome.candidates.length, experiments: stored.outcome.experiments.items.length, calibrationId: calibration?.id ?? null } });
  return loadPlan(created.id, ctx.transaction);
}

export type LoadedPlan = Plan & { creator?: User | null; made?: (PlanRecipe & { recipe?: Recipe })[] };

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
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  const made = rows.length
    ? ((await PlanRecipe.findAll({ attributes: ['planId', [Sequelize.fn('COUNT', Sequelize.col('id')), 'n']], where: { planId: { [Op.in]: rows.map((r) => r.id) } }, group: ['planId'], raw: true })) as unknown as { planId: number; n: number }[])
    : [];
  const counts = new Map(made.map((m) => [m.planId, Number(m.n)]));
  return { rows: rows as (Plan & { creator?: User | null })[], count, counts };
}
