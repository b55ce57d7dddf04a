import { QueryTypes, type Sequelize } from 'sequelize';
import { attractionToMapY, PhysicsArgumentError } from '../../shared/physics';
import { mapPosition } from '../../shared/planning/map-position';
import { COLLAPSE_PHYSICS_CONTEXT, shelfLifeCovariatesOf, type ProgrammeShelfLife, type ShelfLifeRecipeInput, type ShelfLifeSampleInput } from '../../shared/shelf-life';
import { survivalRecordsFromChecks, type SampleCheck } from '../../shared/shelf-life/survival-records-from-checks';
import { cachedStateMap } from '../../shared/state-map-cache';
import type { ObservedState } from '../../shared/states';
import type { ProgrammeShelfLifeView } from '../../shared/views/shelf-life';
import type { RecipeDerived } from '../../shared/views/recipe';
import { notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { runInWorker, withHeavyJobSlot } from './heavy-jobs';
import { requireProgramme } from './lookups';

type Ctx = HandlerContext<unknown, unknown, unknown>;

/** What the shelf-life job reads: the programme's live recipes and their samples (plain data for a worker). */
export interface ShelfLifeJob {
  recipes: ShelfLifeRecipeInput[];
  samples: ShelfLifeSampleInput[];
  focusRecipeId?: number;
}

/**
 * The programme's live recipes as the shelf-life analysis reads them, from their stored
 * derivation: φ and contact attraction U/kT, log₁₀ of the gravitational Péclet number, the
 * predicted state (the map region), and a place on one common map for the whole programme
 * (φ/φ_cp and B2* on the generic mean-field B2* map, the map ad-hoc samples are placed on), so
 * recipes of every size ratio are comparable for grouping. And their samples: each recipe's live
 * bench checks turned into survival records (survivalRecordsFromChecks: one sample per mixing
 * date, with the latest fill height recorded among its checks). Ad-hoc samples have no recipe and
 * are left out. Two plain queries, no model objects.
 */
export async function shelfLifeInput(sequelize: Sequelize, programmeId: number): Promise<Omit<ShelfLifeJob, 'focusRecipeId'>> {
  const rows = await sequelize.query<{ id: number; code: string; name: string; particle_id: number; depletant_id: number | null; solvent_id: number; derived: string | RecipeDerived }>(
    'SELECT id, code, name, particle_id, depletant_id, solvent_id, derived FROM recipes WHERE programme_id = ? AND archived_at IS NULL ORDER BY id',
    { replacements: [programmeId], type: QueryTypes.SELECT },
  );
  const map = cachedStateMap({ kind: 'generic', theory: 'meanField', axis: 'b2' });
  const recipes = rows.map((r): ShelfLifeRecipeInput => {
    const d = (typeof r.derived === 'string' ? JSON.parse(r.derived) : r.derived) as RecipeDerived;
    let position: ShelfLifeRecipeInput['position'] = null;
    try {
      if (d.reducedB2 !== null && d.phi > 0) {
        const placed = mapPosition(map, d.phi, attractionToMapY(map, { kind: 'b2', value: d.reducedB2 }));
        if (Number.isFinite(placed.x) && Number.isFinite(placed.u)) position = placed;
      }
    } catch (error) {
      if (!(error instanceof PhysicsArgumentError)) throw error;
    }
    return {
      id: r.id, code: r.code, name: r.name, particleId: r.particle_id, depletantId: r.depletant_id, solventId: r.solvent_id,
      position,
      region: d.predictedState,
      covariates: shelfLifeCovariatesOf(d),
    };
  });
  const checks = await sequelize.query<{ id: number; recipe_id: number; mixed_at: Date | string; age_days: number; observed_state: ObservedState; sample_height_mm: number | null }>(
    `SELECT o.id, o.recipe_id, o.mixed_at, o.age_days, o.observed_state, o.sample_height_mm
       FROM observations o JOIN recipes r ON r.id = o.recipe_id
      WHERE o.programme_id = ? AND o.archived_at IS NULL AND r.archived_at IS NULL`,
    { replacements: [programmeId], type: QueryTypes.SELECT },
  );
  const byRecipe = new Map<number, SampleCheck[]>();
  for (const c of checks) {
    const list = byRecipe.get(c.recipe_id) ?? [];
    list.push({
      observationId: c.id,
      mixedAt: c.mixed_at instanceof Date ? c.mixed_at.toISOString() : String(c.mixed_at),
      ageDays: Number(c.age_days),
      observedState: c.observed_state,
      sampleHeightMm: c.sample_height_mm === null ? null : Number(c.sample_height_mm),
    });
    byRecipe.set(c.recipe_id, list);
  }
  const samples = [...byRecipe].flatMap(([recipeId, list]) => survivalRecordsFromChecks(list).map((s) => ({ recipeId, ...s })));
  return { recipes, samples };
}

/**
 * The programme's shelf-life analysis (programmeShelfLife), computed in a heavy-job worker so the
 * request thread stays free; with `recipeId`, only that recipe and its group (404 when it is not
 * a live recipe of the programme). Holds one of the user's heavy-job slots while it runs.
 */
export async function loadProgrammeShelfLife(ctx: Ctx, programmeId: number, recipeId?: number): Promise<ProgrammeShelfLifeView> {
  await requireProgramme(programmeId, null, 'param');
  const input = await shelfLifeInput(ctx.deps.sequelize, programmeId);
  if (recipeId !== undefined && !input.recipes.some((r) => r.id === recipeId)) throw notFound('Recipe');
  const { HEAVY_JOBS_PER_USER, HEAVY_JOB_SECONDS } = ctx.deps.config;
  const analysis = await withHeavyJobSlot(ctx.user!.id, HEAVY_JOBS_PER_USER, () =>
    runInWorker<ProgrammeShelfLife>('shelfLife', { ...input, focusRecipeId: recipeId } satisfies ShelfLifeJob, HEAVY_JOB_SECONDS * 1000),
  );
  return { programmeId, ...analysis, context: COLLAPSE_PHYSICS_CONTEXT };
}
