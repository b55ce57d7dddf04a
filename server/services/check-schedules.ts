import { QueryTypes, type Transaction } from 'sequelize';
import { dueSamples, type ScheduledCheck } from '../../shared/check-schedules/due-samples';
import type { CheckScheduleInput } from '../../shared/schemas/check-schedules';
import type { ObservedState } from '../../shared/states';
import type { DueChecksView } from '../../shared/views/check-schedules';
import { badRequest, conflict, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { CheckSchedule, Programme, Recipe, User } from '../models';

type Ctx = HandlerContext<unknown, unknown, unknown>;

/** JSON columns come back as text from raw queries on MariaDB (JSON is LONGTEXT there). */
const agesOf = (value: unknown): number[] => (typeof value === 'string' ? JSON.parse(value) : (value as number[]));

async function requireRecipe(id: number, transaction: Transaction | null, lock = false) {
  const recipe = await Recipe.findByPk(id, { attributes: ['id', 'code', 'programmeId', 'archivedAt'], transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!recipe) throw notFound('Recipe');
  return recipe;
}

/** The recipe's schedule (null when none is set) and who last set it; presentCheckSchedule shapes it. */
export async function loadCheckSchedule(recipeId: number, transaction: Transaction | null = null) {
  await requireRecipe(recipeId, transaction);
  const schedule = await CheckSchedule.findByPk(recipeId, { transaction });
  const updater = schedule?.updatedBy ? await User.findByPk(schedule.updatedBy, { attributes: ['id', 'name'], transaction }) : null;
  return { recipeId, schedule: schedule ? { agesDays: agesOf(schedule.agesDays), updatedAt: schedule.updatedAt } : null, updater };
}

/**
 * Sets (or, with no ages, removes) the recipe's check schedule. The recipe row is locked so two
 * scientists saving at once are applied one after the other; the recipe's version is not touched.
 */
export async function setCheckSchedule(ctx: Ctx, recipeId: number, input: CheckScheduleInput) {
  const recipe = await requireRecipe(recipeId, ctx.transaction, true);
  if (recipe.archivedAt) throw conflict(`Recipe ${recipe.code} is archived; restore it before scheduling checks`);
  const existing = await CheckSchedule.findByPk(recipeId, { transaction: ctx.transaction });
  const before = existing ? agesOf(existing.agesDays) : [];
  if (input.agesDays.length === 0) {
    if (existing) await existing.destroy({ transaction: ctx.transaction });
  } else if (existing) {
    existing.agesDays = input.agesDays;
    existing.updatedBy = ctx.user!.id;
    existing.changed('agesDays', true);
    await existing.save({ transaction: ctx.transaction });
  } else {
    await CheckSchedule.create({ recipeId, agesDays: input.agesDays, updatedBy: ctx.user!.id }, { transaction: ctx.transaction });
  }
  await ctx.audit({ action: 'check-schedule.set', entityType: 'recipe', entityId: recipeId, details: { before, after: input.agesDays } });
  return loadCheckSchedule(recipeId, ctx.transaction);
}

/**
 * Every live check of the programme's live recipes that have a schedule, with each recipe's
 * schedule: the input of dueSamples. One statement; archived checks and recipes are left out.
 */
const SCHEDULED_CHECKS = `SELECT o.id AS observation_id, o.recipe_id, o.mixed_at, o.age_days, o.observed_state, o.sample_height_mm, s.ages_days
  FROM check_schedules s
  JOIN recipes r ON r.id = s.recipe_id AND r.archived_at IS NULL AND r.programme_id = ?
  JOIN observations o ON o.recipe_id = s.recipe_id AND o.archived_at IS NULL`;

/**
 * The programme's samples due for a check at `now` (a parameter, so tests can fix the date),
 * most overdue first, at most `limit` of them, with the total.
 */
export async function listDueChecks(programmeId: number, limit: number, now: Date): Promise<DueChecksView> {
  const programme = await Programme.findByPk(programmeId, { attributes: ['id'] });
  if (!programme) throw badRequest('programme: no such programme', 'programme');
  const rows = await CheckSchedule.sequelize!.query<{ observation_id: number; recipe_id: number; mixed_at: Date | string; age_days: number; observed_state: ObservedState; sample_height_mm: number | null; ages_days: unknown }>(SCHEDULED_CHECKS, {
    type: QueryTypes.SELECT,
    replacements: [programme.id],
  });
  const schedules = new Map<number, number[]>();
  const checks: ScheduledCheck[] = rows.map((row) => {
    if (!schedules.has(row.recipe_id)) schedules.set(row.recipe_id, agesOf(row.ages_days));
    return {
      observationId: row.observation_id,
      recipeId: row.recipe_id,
      mixedAt: new Date(row.mixed_at).toISOString(),
      ageDays: Number(row.age_days),
      observedState: row.observed_state,
      sampleHeightMm: row.sample_height_mm === null ? null : Number(row.sample_height_mm),
    };
  });
  const due = dueSamples(checks, schedules, now);
  const shown = due.slice(0, limit);
  const recipes = new Map((await Recipe.findAll({ where: { id: [...new Set(shown.map((d) => d.recipeId))] }, attributes: ['id', 'code', 'name'] })).map((r) => [r.id, r]));
  return {
    items: shown.map((d) => ({ ...d, recipeCode: recipes.get(d.recipeId)!.code, recipeName: recipes.get(d.recipeId)!.name })),
    total: due.length,
    asOf: now.toISOString(),
  };
}
