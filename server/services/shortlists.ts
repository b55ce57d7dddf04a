import { Op, type Transaction } from 'sequelize';
import { can } from '../../shared/permissions';
import { isAuthorOrAdmin } from '../../shared/shortlist-moves';
import { SHORTLIST_TRANSITIONS, type ShortlistStatus } from '../../shared/states';
import type { ShortlistInput, ShortlistListQuery } from '../../shared/schemas/shortlists';
import { badRequest, conflict, forbidden, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { shortlistDecidedMail, shortlistSubmittedMail } from '../mail/shortlist-mails';
import { Programme, Recipe, Shortlist, ShortlistEvent, ShortlistItem, User } from '../models';
import { requireLiveProgramme } from './lookups';
import { paged } from './paging';
import { snapshotOf } from '../models/recipe-shapes';

type Ctx = HandlerContext<unknown, unknown, unknown>;

/** One page of the live shortlists, by programme and status, last changed first, with how many recipes each holds. */
export async function listShortlists(query: ShortlistListQuery) {
  const where: Record<string, unknown> = { archivedAt: null };
  if (query.programme) where.programmeId = query.programme;
  if (query.status) where.status = query.status;
  const { rows, count } = await Shortlist.findAndCountAll({
    where,
    include: [
      { model: User, as: 'author', attributes: ['id', 'name'] },
      { model: User, as: 'reviewer', attributes: ['id', 'name'] },
    ],
    order: [['updatedAt', 'DESC']],
    ...paged(query),
    distinct: true,
  });
  const counted = rows.length
    ? await ShortlistItem.count({ where: { shortlistId: { [Op.in]: rows.map((r) => r.id) } }, group: ['shortlistId'] })
    : [];
  const itemCounts = new Map((counted as unknown as { shortlistId: number; count: number }[]).map((c) => [c.shortlistId, Number(c.count)]));
  return { rows, count, itemCounts };
}

/** A shortlist with everything its view shows. */
export async function loadShortlist(id: number, transaction: Transaction | null) {
  const shortlist = await Shortlist.findByPk(id, {
    transaction,
    include: [
      { model: ShortlistItem, as: 'items', include: [{ model: Recipe, as: 'recipe' }] },
      { model: ShortlistEvent, as: 'events', include: [{ model: User, as: 'actor', attributes: ['id', 'name'] }] },
      { model: User, as: 'author', attributes: ['id', 'name'] },
      { model: User, as: 'reviewer', attributes: ['id', 'name'] },
    ],
  });
  if (!shortlist) throw notFound('Shortlist');
  return shortlist;
}

/** Locks the row for the transaction, so concurrent transitions on it queue up. */
async function lockShortlist(id: number, transaction: Transaction | null) {
  const shortlist = await Shortlist.findByPk(id, { transaction, lock: transaction?.LOCK.UPDATE });
  if (!shortlist) throw notFound('Shortlist');
  return shortlist;
}

async function checkItems(input: ShortlistInput, transaction: Transaction | null) {
  const ids = input.items.map((i) => i.recipeId);
  const recipes = ids.length ? await Recipe.findAll({ where: { id: { [Op.in]: ids } }, transaction }) : [];
  const byId = new Map(recipes.map((r) => [r.id, r]));
  input.items.forEach((item, index) => {
    const recipe = byId.get(item.recipeId);
    const field = `items.${index}.recipeId`;
    if (!recipe) throw badRequest(`${field}: no such recipe`, field);
    if (recipe.programmeId !== input.programmeId) throw badRequest(`${field}: recipe ${recipe.code} belongs to another programme`, field);
    if (recipe.archivedAt) throw badRequest(`${field}: recipe ${recipe.code} is archived`, field);
  });
}

async function writeItems(shortlistId: number, input: ShortlistInput, transaction: Transaction | null) {
  await ShortlistItem.destroy({ where: { shortlistId }, transaction });
  await ShortlistItem.bulkCreate(
    input.items.map((item, position) => ({ shortlistId, recipeId: item.recipeId, position, reason: item.reason })),
    { transaction },
  );
}

/** Only the author or an administrator changes a shortlist's content or sends it on. */
function requireAuthorOrAdmin(ctx: Ctx, shortlist: Shortlist) {
  if (!isAuthorOrAdmin(ctx.user!, shortlist.authorId)) throw forbidden('Only the author or an administrator may change this shortlist');
}

export async function createShortlist(ctx: Ctx, input: ShortlistInput) {
  await requireLiveProgramme(input.programmeId, ctx.transaction);
  await checkItems(input, ctx.transaction);
  const shortlist = await Shortlist.create(
    { programmeId: input.programmeId, title: input.title, purpose: input.purpose ?? null, targetState: input.targetState, status: 'draft', authorId: ctx.user!.id, reviewerId: null, decisionComment: null, submittedAt: null, decidedAt: null },
    { transaction: ctx.transaction },
  );
  await writeItems(shortlist.id, input, ctx.transaction);
  await ShortlistEvent.create({ shortlistId: shortlist.id, fromStatus: null, toStatus: 'draft', actorId: ctx.user!.id, comment: null }, { transaction: ctx.transaction });
  await ctx.audit({ action: 'shortlist.created', entityType: 'shortlist', entityId: shortlist.id, details: { items: input.items.length } });
  return loadShortlist(shortlist.id, ctx.transaction);
}

export async function updateShortlist(ctx: Ctx, id: number, input: ShortlistInput) {
  const shortlist = await lockShortlist(id, ctx.transaction);
  requireAuthorOrAdmin(ctx, shortlist);
  if (shortlist.status !== 'draft') throw conflict(`A ${shortlist.status} shortlist cannot be edited${shortlist.status === 'returned' ? '; reopen it as a draft first' : ''}`, { status: shortlist.status });
  if (input.programmeId !== shortlist.programmeId) throw badRequest('programmeId: a shortlist stays in its programme', 'programmeId');
  await requireLiveProgramme(input.programmeId, ctx.transaction);
  await checkItems(input, ctx.transaction);
  shortlist.set({ title: input.title, purpose: input.purpose ?? null, targetState: input.targetState });
  await shortlist.save({ transaction: ctx.transaction });
  await writeItems(shortlist.id, input, ctx.transaction);
  await ctx.audit({ action: 'shortlist.updated', entityType: 'shortlist', entityId: shortlist.id, details: { items: input.items.length } });
  return loadShortlist(shortlist.id, ctx.transaction);
}

const link = (ctx: Ctx, id: number) => new URL(`/shortlists/${id}`, ctx.deps.config.PUBLIC_URL).toString();

/**
 * Moves a shortlist along draft → submitted → approved | returned, returned → draft.
 * The row is locked first, so of two concurrent moves one commits and the other sees the
 * new status and gets a 409. Anything not in SHORTLIST_TRANSITIONS is a 409 too.
 */
export async function transitionShortlist(ctx: Ctx, id: number, to: ShortlistStatus, comment: string | null) {
  const shortlist = await lockShortlist(id, ctx.transaction);
  const from = shortlist.status;
  if (!SHORTLIST_TRANSITIONS[from].includes(to)) {
    throw conflict(`A ${from} shortlist cannot become ${to}`, { status: from, allowed: SHORTLIST_TRANSITIONS[from] });
  }
  const actor = ctx.user!;
  if (to === 'submitted' || to === 'draft') requireAuthorOrAdmin(ctx, shortlist);
  if (to === 'approved' || to === 'returned') {
    if (!can(actor.role, 'shortlists.decide')) throw forbidden();
    if (shortlist.authorId === actor.id) throw forbidden(`You cannot ${to === 'approved' ? 'approve' : 'return'} a shortlist you wrote; another manager must decide`);
  }
  if (to === 'submitted') await snapshotItems(id, ctx.transaction);
  if (to === 'draft') await ShortlistItem.update({ snapshot: null }, { where: { shortlistId: id }, transaction: ctx.transaction });
  shortlist.status = to;
  if (to === 'submitted') {
    shortlist.submittedAt = new Date();
    shortlist.reviewerId = null;
    shortlist.decisionComment = null;
    shortlist.decidedAt = null;
  }
  if (to === 'approved' || to === 'returned') {
    shortlist.reviewerId = actor.id;
    shortlist.decisionComment = comment;
    shortlist.decidedAt = new Date();
  }
  await shortlist.save({ transaction: ctx.transaction });
  await ShortlistEvent.create({ shortlistId: id, fromStatus: from, toStatus: to, actorId: actor.id, comment }, { transaction: ctx.transaction });
  await ctx.audit({ action: `shortlist.${to}`, entityType: 'shortlist', entityId: id, details: { from, to, comment } });
  await queueTransitionMail(ctx, shortlist, to, comment);
  return loadShortlist(id, ctx.transaction);
}

/**
 * Freezes each item at the recipe version being submitted (the recipe rows are locked so an
 * edit racing the submission lands either wholly before or wholly after the snapshot).
 */
async function snapshotItems(shortlistId: number, transaction: Transaction | null) {
  const items = await ShortlistItem.findAll({ where: { shortlistId }, transaction });
  if (items.length === 0) throw conflict('Add at least one recipe before submitting');
  const recipes = await Recipe.findAll({ where: { id: { [Op.in]: items.map((i) => i.recipeId) } }, transaction, lock: transaction?.LOCK.UPDATE });
  const byId = new Map(recipes.map((r) => [r.id, r]));
  for (const item of items) {
    const recipe = byId.get(item.recipeId)!;
    if (recipe.archivedAt) throw conflict(`Recipe ${recipe.code} is archived; take it off the shortlist before submitting`);
    item.snapshot = snapshotOf(recipe);
    await item.save({ transaction });
  }
}

/** Shortlists under review or approved that hold this recipe (it cannot be archived while they stand). */
export async function standingShortlistsWith(recipeId: number, transaction: Transaction | null) {
  return Shortlist.findAll({
    where: { status: { [Op.in]: ['submitted', 'approved'] }, archivedAt: null },
    include: [{ model: ShortlistItem, as: 'items', where: { recipeId }, attributes: ['id'] }],
    transaction,
  });
}

async function queueTransitionMail(ctx: Ctx, shortlist: Shortlist, to: ShortlistStatus, comment: string | null) {
  const transaction = ctx.transaction;
  if (to === 'submitted') {
    const managers = await User.findAll({ where: { role: 'manager', active: true }, transaction });
    const programme = await Programme.findByPk(shortlist.programmeId, { transaction });
    const count = await ShortlistItem.count({ where: { shortlistId: shortlist.id }, transaction });
    if (managers.length === 0) return;
    const mail = shortlistSubmittedMail({ to: managers.map((m) => m.email), title: shortlist.title, author: ctx.user!.name, programme: programme?.name ?? '', link: link(ctx, shortlist.id), count });
    ctx.afterCommit(() => ctx.deps.mailer.send(mail));
  }
  if (to === 'approved' || to === 'returned') {
    const author = shortlist.authorId ? await User.findByPk(shortlist.authorId, { transaction }) : null;
    if (!author) return;
    const mail = shortlistDecidedMail({ to: author.email, title: shortlist.title, decision: to, reviewer: ctx.user!.name, comment, link: link(ctx, shortlist.id) });
    ctx.afterCommit(() => ctx.deps.mailer.send(mail));
  }
}

export async function archiveShortlist(ctx: Ctx, id: number) {
  const shortlist = await lockShortlist(id, ctx.transaction);
  requireAuthorOrAdmin(ctx, shortlist);
  if (shortlist.status === 'approved') throw conflict('An approved shortlist is frozen and stays on record');
  if (!shortlist.archivedAt) {
    shortlist.archivedAt = new Date();
    await shortlist.save({ transaction: ctx.transaction });
    await ctx.audit({ action: 'shortlist.archived', entityType: 'shortlist', entityId: id });
  }
  return loadShortlist(id, ctx.transaction);
}
