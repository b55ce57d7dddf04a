import { Op, Sequelize, type Transaction } from 'sequelize';
import type { RecipeInput, RecipeListQuery } from '../../shared/schemas/recipes';
import { badRequest, conflict, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { Recipe, User } from '../models';
import { attractionColumns } from '../models/recipe-shapes';
import { archivedWhere, likePattern, requireProgramme } from './lookups';
import { paged } from './paging';
import { deriveForRecipe } from './predictions';
import { standingShortlistsWith } from './shortlists';

type Ctx = HandlerContext<unknown, unknown, unknown>;

const SORT_COLUMNS: Record<RecipeListQuery['sort'], string> = {
  code: 'code',
  name: 'name',
  phi: 'phi',
  margin: 'margin',
  updatedAt: 'updatedAt',
  predictedState: 'predictedState',
};

export async function listRecipes(query: RecipeListQuery) {
  const where: Record<string | symbol, unknown> = archivedWhere(query.archived);
  if (query.programme) where.programmeId = query.programme;
  if (query.state) where.predictedState = query.state;
  if (query.q) {
    const pattern = likePattern(query.q);
    where[Op.or] = [{ code: { [Op.like]: pattern } }, { name: { [Op.like]: pattern } }, { notes: { [Op.like]: pattern } }];
  }
  return Recipe.findAndCountAll({
    where,
    include: [{ model: User, as: 'creator', attributes: ['id', 'name'] }],
    order: [[SORT_COLUMNS[query.sort], query.order.toUpperCase()], ['id', 'ASC']],
    ...paged(query),
  });
}

export async function loadRecipe(where: { id: number } | { code: string }, transaction: Transaction | null = null, lock = false) {
  const recipe = await Recipe.findOne({
    where,
    include: lock ? [] : [{ model: User, as: 'creator', attributes: ['id', 'name'] }],
    transaction,
    lock: lock && transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!recipe) throw notFound('Recipe');
  return recipe;
}

/** Derived columns kept beside the JSON so lists can filter and sort on them. */
function derivedColumns(derived: Recipe['derived']) {
  return { phi: derived.phi, reducedB2: derived.reducedB2, predictedState: derived.predictedState, margin: derived.margin, modelVersion: derived.modelVersion, derived };
}

function inputColumns(input: RecipeInput) {
  return {
    name: input.name,
    particleId: input.particleId,
    solventId: input.solventId,
    fractionKind: input.fraction.kind,
    fractionValue: input.fraction.value,
    temperatureC: input.temperatureC,
    notes: input.notes ?? null,
    ...attractionColumns(input.attraction),
  };
}

/**
 * Creates a recipe with the next code of its programme (the programme row is locked, so two
 * formulators saving at once get distinct codes) and the parameters shared/physics derives.
 */
export async function createRecipe(ctx: Ctx, input: RecipeInput, origin: string | null = null) {
  const programme = await requireProgramme(input.programmeId, ctx.transaction, 'field', true);
  if (programme.archivedAt) throw badRequest('programmeId: the programme is archived', 'programmeId');
  const derived = await deriveForRecipe(input, ctx.transaction);
  const code = `${programme.codePrefix}-${String(programme.nextCodeNumber).padStart(4, '0')}`;
  programme.nextCodeNumber += 1;
  await programme.save({ transaction: ctx.transaction });
  const recipe = await Recipe.create(
    { code, programmeId: programme.id, origin, ...inputColumns(input), ...derivedColumns(derived), createdBy: ctx.user!.id, updatedBy: ctx.user!.id },
    { transaction: ctx.transaction },
  );
  await ctx.audit({ action: 'recipe.created', entityType: 'recipe', entityId: recipe.id, details: { code, predictedState: derived.predictedState } });
  return loadRecipe({ id: recipe.id }, ctx.transaction);
}

export async function updateRecipe(ctx: Ctx, id: number, input: RecipeInput) {
  const recipe = await loadRecipe({ id }, ctx.transaction, true);
  if (input.programmeId !== recipe.programmeId) throw badRequest('programmeId: a recipe stays in its programme', 'programmeId');
  const derived = await deriveForRecipe(input, ctx.transaction);
  recipe.set({ ...inputColumns(input), ...derivedColumns(derived), updatedBy: ctx.user!.id });
  const changed = (recipe.changed() || []).filter((c) => c !== 'derived' && c !== 'updatedBy');
  // Every edit is a new version; shortlists under review or approved keep the one submitted.
  recipe.version += 1;
  await recipe.save({ transaction: ctx.transaction });
  await ctx.audit({ action: 'recipe.updated', entityType: 'recipe', entityId: id, details: { changed, version: recipe.version, predictedState: derived.predictedState } });
  return loadRecipe({ id }, ctx.transaction);
}

export async function setRecipeArchived(ctx: Ctx, id: number, archived: boolean) {
  const recipe = await loadRecipe({ id }, ctx.transaction, true);
  if (archived && !recipe.archivedAt) {
    const standing = await standingShortlistsWith(id, ctx.transaction);
    if (standing.length > 0) {
      const names = standing.map((s) => `“${s.title}” (${s.status})`).join(', ');
      throw conflict(`Recipe ${recipe.code} is on ${standing.length === 1 ? 'shortlist' : 'shortlists'} ${names}; it stays on record while ${standing.length === 1 ? 'that shortlist stands' : 'they stand'}. Archive or return the shortlist first.`, { shortlists: standing.map((s) => s.id) });
    }
  }
  if ((recipe.archivedAt != null) !== archived) {
    recipe.archivedAt = archived ? new Date() : null;
    await recipe.save({ transaction: ctx.transaction });
    await ctx.audit({ action: archived ? 'recipe.archived' : 'recipe.restored', entityType: 'recipe', entityId: id });
  }
  return loadRecipe({ id }, ctx.transaction);
}

/** How many live observations each recipe has. */
export async function observationCounts(recipeIds: number[]) {
  if (recipeIds.length === 0) return new Map<number, number>();
  const { Observation } = await import('../models');
  const rows = (await Observation.findAll({
    attributes: ['recipeId', [Sequelize.fn('COUNT', Sequelize.col('id')), 'n']],
    where: { recipeId: { [Op.in]: recipeIds }, archivedAt: null },
    group: ['recipeId'],
    raw: true,
  })) as unknown as { recipeId: number; n: number }[];
  return new Map(rows.map((r) => [r.recipeId, Number(r.n)]));
}
