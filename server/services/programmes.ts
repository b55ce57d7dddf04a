import { QueryTypes } from 'sequelize';
import type { ProgrammeInput, ProgrammeUpdate } from '../../shared/schemas/programmes';
import { conflict } from '../errors';
import type { HandlerContext } from '../http/route';
import { Programme } from '../models';
import { archivedWhere, requireProgramme } from './lookups';

type Ctx = HandlerContext<unknown, unknown, unknown>;

export interface ProgrammeCounts {
  recipes: number;
  observations: number;
}

/** Live recipes and observations per programme, in one statement. */
export async function countsByProgramme(): Promise<Map<number, ProgrammeCounts>> {
  const rows = await Programme.sequelize!.query<{ id: number; recipes: number; observations: number }>(
    `SELECT p.id,
            (SELECT COUNT(*) FROM recipes r WHERE r.programme_id = p.id AND r.archived_at IS NULL) AS recipes,
            (SELECT COUNT(*) FROM observations o WHERE o.programme_id = p.id AND o.archived_at IS NULL) AS observations
       FROM programmes p`,
    { type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [Number(r.id), { recipes: Number(r.recipes), observations: Number(r.observations) }]));
}

/** The programmes by name, live, archived or all. */
export async function listProgrammes(archived: 'true' | 'false' | 'all') {
  return Programme.findAll({ where: archivedWhere(archived), order: [['name', 'ASC']] });
}

/** Starts a programme; its code prefix must be free. */
export async function createProgramme(ctx: Ctx, input: ProgrammeInput) {
  if (await Programme.findOne({ where: { codePrefix: input.codePrefix }, transaction: ctx.transaction })) {
    throw conflict(`Code prefix ${input.codePrefix} is taken by another programme`, { field: 'codePrefix' });
  }
  const programme = await Programme.create({ ...input, notes: input.notes ?? null, createdBy: ctx.user!.id }, { transaction: ctx.transaction });
  await ctx.audit({ action: 'programme.created', entityType: 'programme', entityId: programme.id, details: { name: programme.name } });
  return programme;
}

/** Renames a programme, changes its goal or notes. */
export async function updateProgramme(ctx: Ctx, id: number, input: ProgrammeUpdate) {
  const programme = await requireProgramme(id, ctx.transaction, 'param', true);
  programme.set(input);
  const changed = programme.changed() || [];
  await programme.save({ transaction: ctx.transaction });
  await ctx.audit({ action: 'programme.updated', entityType: 'programme', entityId: programme.id, details: { changed } });
  return programme;
}

/** Archives a programme (its records stay); archiving twice changes nothing. */
export async function archiveProgramme(ctx: Ctx, id: number) {
  const programme = await requireProgramme(id, ctx.transaction, 'param', true);
  if (!programme.archivedAt) {
    programme.archivedAt = new Date();
    await programme.save({ transaction: ctx.transaction });
    await ctx.audit({ action: 'programme.archived', entityType: 'programme', entityId: programme.id });
  }
  return programme;
}
