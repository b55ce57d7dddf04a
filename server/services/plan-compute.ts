import {
  compositionSpace,
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
import { PhysicsArgumentError, resolveClassifierParameters, type ClassifierParameters } from '../../shared/physics';
import { deriveRecipe, recipeFieldOf, type RecipeMaterials } from '../../shared/recipe-derivation';
import type { PlanRequest } from '../../shared/schemas/plans';
import { mapAttractionOf } from '../../shared/map-placement';
import { decodeMapObservations, decodeMapRecipes } from '../../shared/views/map-points';
import type { MapPoints } from '../../shared/views/map-points';
import type { PlanPrice } from '../../shared/views/plan';
import type { RecipeDerived } from '../../shared/views/recipe';
import type { StoredPlanOutcome } from '../models/plan';
import { programmeShelfLifeModel, shelfLifeCovariatesOf, shelfLifeRequestNote, shelfLifeVerdict, type ShelfLifeRecipeInput, type ShelfLifeSampleInput } from '../../shared/shelf-life';

/**
 * The planner's computation, without the database: what runPlan read (materials as plain rows,
 * the programme's calibration and its uncertainty, the map overlay's points) in, the outcome a
 * plan stores out. It runs in a heavy-job worker thread (server/services/heavy-jobs.ts).
 */
export interface PlanJob {
  input: PlanRequest;
  materials: RecipeMaterials & { particle: RecipeMaterials['particle'] & { name: string; pricePerKg: number | null; densityGcm3: number; polydispersityPct: number }; solvent: RecipeMaterials['solvent'] & { name: string; densityGcm3: number }; depletant: (NonNullable<RecipeMaterials['depletant']> & { name: string }) | null; salt: (NonNullable<RecipeMaterials['salt']> & { name: string; molarMassGMol: number | null }) | null };
  parameters: Partial<ClassifierParameters> | undefined;
  calibration: { id: number; acceptedAt: string } | null;
  uncertainty: BoundaryUncertainty;
  points: MapPoints;
  prices: { particles: PlanPrice; solvent: PlanPrice; polymer: PlanPrice | null; salt: PlanPrice | null };
  /** The programme's recipes and bench samples for the shelf-life column (server/services/shelf-life.ts shelfLifeInput). */
  shelfLife: { recipes: ShelfLifeRecipeInput[]; samples: ShelfLifeSampleInput[] };
}

/** A physics problem of the request, with the form field it belongs to. */
export class PlanInputProblem extends Error {
  constructor(readonly field: string, message: string) {
    super(message);
  }
}

function physicsProblem(error: unknown): never {
  if (error instanceof PhysicsArgumentError) throw new PlanInputProblem(recipeFieldOf(error), error.message);
  throw error;
}

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
 * The programme's bench evidence for the planner: the latest observation of each live recipe at
 * that recipe's coordinates, and every ad-hoc observation at its own (the map overlay's data).
 * A recipe on the plan's own size ratio is placed by its polymer fraction, any other by B2*.
 */
function programmeEvidence(points: MapPoints, space: CompositionSpace): EvidenceInput[] {
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
      const attraction = mapAttractionOf(space.map, r);
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


export function computePlan(job: PlanJob): StoredPlanOutcome {
  const started = performance.now();
  const { input, materials, parameters, calibration, uncertainty, prices } = job;
  const template = planTemplate(input);
  const levels = planLevels(input);
  const kind = input.attraction.source === 'depletion' ? 'polymer' : 'salt';
  const spaceFor = (range: ValueRange) => compositionSpace(template, materials, parameters, input.phi, range);
  let space: CompositionSpace;
  try {
    space = spaceFor(levels);
  } catch (error) {
    physicsProblem(error);
  }
  const evidence = programmeEvidence(job.points, space);
  const verify = (phi: number, level: number) => {
    const recipe = plannedRecipeInput(template, phi, level, 'candidate');
    try {
      const { derived } = deriveRecipe(recipe, materials, { parameters, calibration });
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
  // Shelf life: the programme's Cox model on each listed candidate. With "stays a gel for at least
  // N days", candidates predicted to fall short keep their place among themselves but follow those
  // that meet it (or cannot be judged); a refused model leaves the ranking as it was and says so.
  const minimumDays = input.minShelfLifeDays ?? null;
  const shelfModel = programmeShelfLifeModel(job.shelfLife.recipes, job.shelfLife.samples);
  const judged = outcome.candidates.map((c) => ({ c, shelfLife: shelfModel.status === 'fitted' ? shelfLifeVerdict(shelfModel, shelfLifeCovariatesOf(c.verified!), minimumDays) : null }));
  const ranked = minimumDays === null ? judged : [...judged.filter((j) => j.shelfLife?.meets !== false), ...judged.filter((j) => j.shelfLife?.meets === false)];
  const stored: StoredPlanOutcome = {
    materials: { particle: materials.particle.name, solvent: materials.solvent.name, depletant: materials.depletant?.name ?? null, salt: materials.salt?.name ?? null },
    prices,
    levelUnit: space.level.unit,
    calibration,
    uncertainty,
    map: { model: space.map.model, parameters: resolveClassifierParameters(parameters as Partial<ClassifierParameters> | undefined), polydispersity: materials.particle.polydispersityPct, yLabel: space.map.y.label },
    outcome: {
      feasible: outcome.candidates.length > 0,
      candidates: ranked.map(({ c, shelfLife }, index) => ({
        index, phi: c.phi, level: c.level, predictedState: c.state, margin: c.margin, nearestBoundary: c.nearestBoundary, mapY: c.mapY,
        costPerLitre: c.cost, evidence: c.evidence, score: c.score, scores: c.scores, derived: c.verified!, recipe: null, shelfLife,
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
      shelfLife: { minimumDays, status: shelfModel.status, note: shelfLifeRequestNote(shelfModel, minimumDays), lastTimeDays: shelfModel.lastTimeDays },
      elapsedMs: Math.round(performance.now() - started),
    },
  };
  return stored;
}
