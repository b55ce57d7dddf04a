import { Op, QueryTypes, Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import type { ObservationInput, ObservationListQuery } from '../../shared/schemas/observations';
import { AGREEING_OTHER_STATES } from '../../shared/states';
import { badRequest, forbidden, notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { programmeWritten } from '../models/write-events';
import { Attachment, Observation, Programme, Recipe, User } from '../models';
import { requireLiveProgramme } from './lookups';
import { paged } from './paging';
import { claimIdempotencyKey, idempotencyKeyOf, sha256 } from './idempotency';
import { predictAdhoc } from './predictions';

type Ctx = HandlerContext<unknown, unknown, unknown>;

export const observationIncludes = () => [
  { model: Recipe, as: 'recipe', attributes: ['id', 'code', 'predictedState', 'programmeId'] },
  { model: User, as: 'observer', attributes: ['id', 'name'] },
  { model: Attachment, as: 'attachments', include: [{ model: User, as: 'uploader', attributes: ['id', 'name'] }] },
];

/** One page of the bench log, newest first, with the list's filters. */
export async function listObservations(query: ObservationListQuery) {
  return Observation.findAndCountAll({
    where: observationWhere(query),
    include: observationIncludes(),
    order: [['mixedAt', 'DESC'], ['id', 'DESC']],
    ...paged(query),
    distinct: true,
  });
}

export async function loadObservation(id: number, transaction: Transaction | null) {
  const observation = await Observation.findByPk(id, { include: observationIncludes(), transaction });
  if (!observation) throw notFound('Observation');
  return observation;
}

/** The where-clause of a bench-log query; "disagreeing" compares with the recipe's current prediction. */
export function observationWhere(query: ObservationListQuery): WhereOptions {
  const where: Record<string | symbol, unknown> = {};
  if (query.archived !== 'all') where.archivedAt = query.archived === 'true' ? { [Op.ne]: null } : null;
  if (query.programme) where.programmeId = query.programme;
  if (query.recipe) where.recipeId = query.recipe;
  if (query.state) where.observedState = query.state;
  if (query.method) where.method = query.method;
  if (query.minAgeDays !== undefined || query.maxAgeDays !== undefined) {
    where.ageDays = { ...(query.minAgeDays !== undefined ? { [Op.gte]: query.minAgeDays } : {}), ...(query.maxAgeDays !== undefined ? { [Op.lte]: query.maxAgeDays } : {}) };
  }
  if (query.disagreeing) {
    // Compared with the recipe's current prediction, or the ad-hoc one; "unclear" never disagrees.
    // A correlated subquery, not the joined alias: paged queries put the joins outside the WHERE.
    const predicted = 'COALESCE((SELECT r.predicted_state FROM recipes r WHERE r.id = `Observation`.`recipe_id`), `Observation`.`adhoc_predicted_state`)';
    // observationAgrees (shared/states.ts) in SQL: the pairs come from the same list, as literals
    // of the states enum (never user input).
    const observed = 'CAST(`Observation`.`observed_state` AS CHAR)';
    const alsoAgree = AGREEING_OTHER_STATES.map(([o, p]) => ` AND NOT (${observed} = '${o}' AND CAST(${predicted} AS CHAR) = '${p}')`).join('');
    const disagrees = `(\`Observation\`.\`observed_state\` <> 'unclear' AND ${predicted} IS NOT NULL AND ${observed} <> CAST(${predicted} AS CHAR)${alsoAgree})`;
    where[Op.and] = [Sequelize.literal(query.disagreeing === 'true' ? disagrees : `NOT ${disagrees}`)];
  }
  return where;
}

async function resolveSubject(ctx: Ctx, input: ObservationInput) {
  if (input.recipeId !== undefined) {
    // Only what the record and its answer need (as observationIncludes), not the recipe's whole row.
    // The programme comes in the same statement: nothing new goes into an archived one.
    const recipe = await Recipe.findByPk(input.recipeId, {
      attributes: ['id', 'code', 'predictedState', 'programmeId', 'archivedAt'],
      include: [{ model: Programme, as: 'programme', attributes: ['id', 'name', 'archivedAt'] }],
      transaction: ctx.transaction,
    });
    if (!recipe) throw badRequest('recipeId: no such recipe', 'recipeId');
    if (recipe.archivedAt) throw badRequest(`recipeId: recipe ${recipe.code} is archived`, 'recipeId');
    const programme = (recipe as Recipe & { programme?: Programme }).programme;
    if (programme?.archivedAt) throw badRequest(`recipeId: programme ${programme.name} is archived; restore it before adding to it`, 'recipeId');
    return { recipe, fields: { programmeId: recipe.programmeId, recipeId: recipe.id, adhocPhi: null, adhocReducedB2: null, adhocDescription: null, adhocPredictedState: null } };
  }
  const adhoc = input.adhoc!;
  await requireLiveProgramme(adhoc.programmeId, ctx.transaction, 'adhoc.programmeId');
  return {
    recipe: null,
    fields: {
      programmeId: adhoc.programmeId,
      recipeId: null,
      adhocPhi: adhoc.phi,
      adhocReducedB2: adhoc.reducedB2,
      adhocDescription: adhoc.description ?? null,
      adhocPredictedState: await predictAdhoc(adhoc.programmeId, adhoc.phi, adhoc.reducedB2, ctx.transaction),
    },
  };
}

function measured(input: ObservationInput) {
  return {
    mixedAt: new Date(input.mixedAt),
    ageDays: input.ageDays,
    observedState: input.observedState,
    method: input.method,
    storageModulusPa: input.storageModulusPa ?? null,
    yieldStressPa: input.yieldStressPa ?? null,
    settledHeightPct: input.settledHeightPct ?? null,
    sampleHeightMm: input.sampleHeightMm ?? null,
    notes: input.notes ?? null,
  };
}

/**
 * One fixed statement for the busiest write: the body is already checked by the route's zod
 * schema, so the model's build, validation and query building add nothing but CPU.
 */
const INSERT_OBSERVATION = `INSERT INTO observations
  (programme_id, recipe_id, adhoc_phi, adhoc_reduced_b2, adhoc_description, adhoc_predicted_state, mixed_at, age_days,
   observed_state, method, storage_modulus_pa, yield_stress_pa, settled_height_pct, sample_height_mm, notes, observer_id,
   import_batch_id, archived_at, created_at, updated_at)
  VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, NULL, NULL, ?, ?)`;

export async function createObservation(ctx: Ctx, input: ObservationInput) {
  const { recipe, fields } = await resolveSubject(ctx, input);
  const values = { ...fields, ...measured(input), observerId: ctx.user!.id, importBatchId: null };
  const now = new Date();
  const [insertId] = await Observation.sequelize!.query(INSERT_OBSERVATION, {
    type: QueryTypes.INSERT,
    transaction: ctx.transaction,
    replacements: [
      values.programmeId, values.recipeId, values.adhocPhi, values.adhocReducedB2, values.adhocDescription, values.adhocPredictedState,
      values.mixedAt, values.ageDays, values.observedState, values.method, values.storageModulusPa, values.yieldStressPa,
      values.settledHeightPct, values.sampleHeightMm, values.notes, values.observerId, now, now,
    ],
  });
  const observation = Observation.build({ ...values, id: Number(insertId), archivedAt: null, createdAt: now, updatedAt: now }, { isNewRecord: false, raw: true });
  programmeWritten(values.programmeId, ctx.transaction);
  await ctx.audit({ action: 'observation.created', entityType: 'observation', entityId: observation.id, details: { recipeId: fields.recipeId, state: input.observedState } });
  // Everything the answer shows is at hand: no need to read the new row back with its joins.
  return Object.assign(observation, { recipe, observer: ctx.user, attachments: [] }) as Awaited<ReturnType<typeof loadObservation>>;
}

/**
 * POST /api/observations: records the observation, once per Idempotency-Key when one is sent
 * (a retry after a lost answer gets the first answer back, marked with Idempotent-Replayed).
 * The router passes its presenter, since the answer stored for a replay is the presented record.
 */
export async function recordObservationOnce<View>(ctx: Ctx, input: ObservationInput, keyHeader: string | undefined, present: (observation: Awaited<ReturnType<typeof createObservation>>) => View) {
  const key = idempotencyKeyOf(keyHeader);
  const claim = key
    ? await claimIdempotencyKey({ userId: ctx.user!.id, scope: 'observation.create', key, requestSha256: sha256(JSON.stringify(input)), what: 'observation' }, ctx.transaction)
    : null;
  if (claim && 'replay' in claim) {
    ctx.res.setHeader('Idempotent-Replayed', 'true');
    return claim.replay;
  }
  const body = { observation: present(await createObservation(ctx, input)) };
  if (claim) await claim.settle(201, body);
  return { status: 201, body };
}

/** Before an upload is read: the observation exists and is the user's own (or the user is an administrator). */
export async function requireOwnObservation(user: User, id: number) {
  const observation = await Observation.findByPk(id, { attributes: ['id', 'observerId'] });
  if (!observation) throw notFound('Observation');
  if (observation.observerId !== user.id && user.role !== 'admin') throw forbidden('Only the observer or an administrator may change this record');
}

/** A bench record is changed by the person who observed it, or an administrator. */
export async function lockOwnObservation(ctx: Ctx, id: number) {
  const observation = await Observation.findByPk(id, { transaction: ctx.transaction, lock: ctx.transaction?.LOCK.UPDATE });
  if (!observation) throw notFound('Observation');
  if (observation.observerId !== ctx.user!.id && ctx.user!.role !== 'admin') throw forbidden('Only the observer or an administrator may change this record');
  return observation;
}

export async function updateObservation(ctx: Ctx, id: number, input: ObservationInput) {
  const observation = await lockOwnObservation(ctx, id);
  const { fields } = await resolveSubject(ctx, input);
  observation.set({ ...fields, ...measured(input) });
  const changed = observation.changed() || [];
  await observation.save({ transaction: ctx.transaction });
  await ctx.audit({ action: 'observation.updated', entityType: 'observation', entityId: id, details: { changed } });
  return loadObservation(id, ctx.transaction);
}

export async function archiveObservation(ctx: Ctx, id: number) {
  const observation = await lockOwnObservation(ctx, id);
  if (!observation.archivedAt) {
    observation.archivedAt = new Date();
    await observation.save({ transaction: ctx.transaction });
    await ctx.audit({ action: 'observation.archived', entityType: 'observation', entityId: id });
  }
  return loadObservation(id, ctx.transaction);
}
