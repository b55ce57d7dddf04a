import { z } from 'zod';
import { Op, type Model, type ModelStatic, type Transaction } from 'sequelize';
import { MATERIAL_SCHEMAS, type MaterialKind } from '../../shared/schemas/materials';
import { notFound } from '../errors';
import type { HandlerContext } from '../http/route';
import { Depletant, ParticleSystem, Salt, Solvent } from '../models';
import { archivedWhere, likePattern } from './lookups';

type Ctx = HandlerContext<unknown, unknown, unknown>;
type LibraryRow = Model & { id: number; archivedAt: Date | null; name: string };

interface Kind {
  model: ModelStatic<LibraryRow>;
  /** How a 404 names it. */
  label: string;
  /** How the audit trail names it. */
  entity: string;
}

const KINDS: Record<MaterialKind, Kind> = {
  particles: { model: ParticleSystem as never, label: 'Particle system', entity: 'particle_system' },
  depletants: { model: Depletant as never, label: 'Depletant', entity: 'depletant' },
  solvents: { model: Solvent as never, label: 'Solvent', entity: 'solvent' },
  salts: { model: Salt as never, label: 'Salt', entity: 'salt' },
};

/** The library's entries of one kind by name: live, archived or all, optionally matching a text. */
export async function listMaterials(kind: MaterialKind, query: { archived: 'true' | 'false' | 'all'; q?: string }) {
  const where: Record<string | symbol, unknown> = archivedWhere(query.archived);
  if (query.q) where.name = { [Op.like]: likePattern(query.q) };
  return KINDS[kind].model.findAll({ where, order: [['name', 'ASC']] });
}

/** One library entry, locked for update inside a transaction, or a 404 naming its kind. */
export async function findMaterial(kind: MaterialKind, id: number, transaction: Transaction | null) {
  const { model, label } = KINDS[kind];
  const record = await model.findByPk(id, { transaction, lock: transaction?.LOCK.UPDATE });
  if (!record) throw notFound(label);
  return record;
}

export async function createMaterial(ctx: Ctx, kind: MaterialKind, input: Record<string, unknown>) {
  const { model, entity } = KINDS[kind];
  const record = await model.create({ ...input, createdBy: ctx.user!.id } as never, { transaction: ctx.transaction });
  await ctx.audit({ action: `${entity}.created`, entityType: entity, entityId: record.id, details: { name: record.name } });
  return record;
}

/** Replaces the whole entry: a field left out of the input is cleared. */
export async function replaceMaterial(ctx: Ctx, kind: MaterialKind, id: number, input: Record<string, unknown>) {
  const schema = MATERIAL_SCHEMAS[kind] as z.ZodType<Record<string, unknown>>;
  const record = await findMaterial(kind, id, ctx.transaction);
  const blank = Object.fromEntries(Object.keys(schema instanceof z.ZodObject ? schema.shape : {}).map((k) => [k, null]));
  record.set({ ...blank, ...input } as never);
  const changed = record.changed() || [];
  await record.save({ transaction: ctx.transaction });
  const { entity } = KINDS[kind];
  await ctx.audit({ action: `${entity}.updated`, entityType: entity, entityId: record.id, details: { changed } });
  return record;
}

/** Archives an entry (recipes keep using it) or brings it back; doing it twice changes nothing. */
export async function setMaterialArchived(ctx: Ctx, kind: MaterialKind, id: number, archived: boolean) {
  const record = await findMaterial(kind, id, ctx.transaction);
  if ((record.archivedAt !== null) !== archived) {
    record.archivedAt = archived ? new Date() : null;
    await record.save({ transaction: ctx.transaction });
    const { entity } = KINDS[kind];
    await ctx.audit({ action: `${entity}.${archived ? 'archived' : 'restored'}`, entityType: entity, entityId: record.id });
  }
  return record;
}
