import { z } from 'zod';
import { Op, type ModelStatic, type Model } from 'sequelize';
import { MATERIAL_SCHEMAS, type MaterialKind } from '../../../shared/schemas/materials';
import { idParamSchema } from '../../../shared/schemas/common';
import { route, type RouteSpec } from '../../http/route';
import { notFound } from '../../errors';
import { Depletant, ParticleSystem, Salt, Solvent } from '../../models';
import { presentDepletant, presentParticle, presentSalt, presentSolvent } from '../../presenters/materials';

interface Kind {
  model: ModelStatic<Model & { id: number; archivedAt: Date | null; name: string }>;
  present: (m: never) => unknown;
  label: string;
  entity: string;
}

const KINDS: Record<MaterialKind, Kind> = {
  particles: { model: ParticleSystem as never, present: presentParticle as never, label: 'Particle system', entity: 'particle_system' },
  depletants: { model: Depletant as never, present: presentDepletant as never, label: 'Depletant', entity: 'depletant' },
  solvents: { model: Solvent as never, present: presentSolvent as never, label: 'Solvent', entity: 'solvent' },
  salts: { model: Salt as never, present: presentSalt as never, label: 'Salt', entity: 'salt' },
};

const listQuery = z.object({
  archived: z.enum(['true', 'false', 'all']).default('false'),
  q: z.string().trim().max(120).optional(),
});

/** The same six routes for each kind of library entry; PUT replaces the whole entry. */
function materialRoutes(kind: MaterialKind): RouteSpec[] {
  const { model, present, label, entity } = KINDS[kind];
  const schema = MATERIAL_SCHEMAS[kind] as z.ZodType<Record<string, unknown>>;
  const base = `/api/materials/${kind}`;
  const find = async (id: number, transaction: import('sequelize').Transaction | null) => {
    const record = await model.findByPk(id, { transaction, lock: transaction?.LOCK.UPDATE });
    if (!record) throw notFound(label);
    return record;
  };
  return [
    route({
      method: 'get',
      path: base,
      access: 'data.read',
      summary: `The library's ${kind}`,
      query: listQuery,
      async handler({ query }) {
        const where: Record<string | symbol, unknown> = {};
        if (query.archived !== 'all') where.archivedAt = query.archived === 'true' ? { [Op.ne]: null } : null;
        if (query.q) where.name = { [Op.like]: `%${query.q.replace(/[%_\\]/g, '\\$&')}%` };
        const rows = await model.findAll({ where, order: [['name', 'ASC']] });
        return { body: { items: rows.map((r) => present(r as never)) } };
      },
    }),
    route({
      method: 'get',
      path: `${base}/:id`,
      access: 'data.read',
      summary: `One of the library's ${kind}`,
      params: idParamSchema,
      async handler({ params }) {
        return { body: { item: present((await find(params.id, null)) as never) } };
      },
    }),
    route({
      method: 'post',
      path: base,
      access: 'materials.write',
      summary: `Add to the library's ${kind}`,
      body: schema,
      async handler({ body, user, transaction, audit }) {
        const record = await model.create({ ...body, createdBy: user!.id } as never, { transaction });
        await audit({ action: `${entity}.created`, entityType: entity, entityId: record.id, details: { name: record.name } });
        return { status: 201, body: { item: present(record as never) } };
      },
    }),
    route({
      method: 'put',
      path: `${base}/:id`,
      access: 'materials.write',
      summary: `Replace one of the library's ${kind}`,
      params: idParamSchema,
      body: schema,
      async handler({ params, body, transaction, audit }) {
        const record = await find(params.id, transaction);
        const blank = Object.fromEntries(Object.keys(schema instanceof z.ZodObject ? schema.shape : {}).map((k) => [k, null]));
        record.set({ ...blank, ...body } as never);
        const changed = record.changed() || [];
        await record.save({ transaction });
        await audit({ action: `${entity}.updated`, entityType: entity, entityId: record.id, details: { changed } });
        return { body: { item: present(record as never) } };
      },
    }),
    route({
      method: 'post',
      path: `${base}/:id/archive`,
      access: 'materials.write',
      summary: `Archive one of the library's ${kind} (recipes keep using it)`,
      params: idParamSchema,
      async handler({ params, transaction, audit }) {
        const record = await find(params.id, transaction);
        if (!record.archivedAt) {
          record.archivedAt = new Date();
          await record.save({ transaction });
          await audit({ action: `${entity}.archived`, entityType: entity, entityId: record.id });
        }
        return { body: { item: present(record as never) } };
      },
    }),
    route({
      method: 'post',
      path: `${base}/:id/restore`,
      access: 'materials.write',
      summary: `Bring one of the library's ${kind} back from the archive`,
      params: idParamSchema,
      async handler({ params, transaction, audit }) {
        const record = await find(params.id, transaction);
        if (record.archivedAt) {
          record.archivedAt = null;
          await record.save({ transaction });
          await audit({ action: `${entity}.restored`, entityType: entity, entityId: record.id });
        }
        return { body: { item: present(record as never) } };
      },
    }),
  ];
}

export const materialRouteList: RouteSpec[] = (['particles', 'depletants', 'solvents', 'salts'] as const).flatMap(materialRoutes);
