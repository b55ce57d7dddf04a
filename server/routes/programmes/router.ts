import { Op, QueryTypes } from 'sequelize';
import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { programmeInputSchema, programmeUpdateSchema } from '../../../shared/schemas/programmes';
import { route } from '../../http/route';
import { conflict } from '../../errors';
import { Programme } from '../../models';
import { presentProgramme } from '../../presenters/programme';
import { requireProgramme } from '../../services/lookups';

async function countsByProgramme(sequelize: import('sequelize').Sequelize) {
  const rows = await sequelize.query<{ id: number; recipes: number; observations: number }>(
    `SELECT p.id,
            (SELECT COUNT(*) FROM recipes r WHERE r.programme_id = p.id AND r.archived_at IS NULL) AS recipes,
            (SELECT COUNT(*) FROM observations o WHERE o.programme_id = p.id AND o.archived_at IS NULL) AS observations
       FROM programmes p`,
    { type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [Number(r.id), { recipes: Number(r.recipes), observations: Number(r.observations) }]));
}

export const programmeRoutes = [
  route({
    method: 'get',
    path: '/api/programmes',
    access: 'data.read',
    summary: 'Programmes with their recipe and observation counts',
    query: z.object({ archived: z.enum(['true', 'false', 'all']).default('false') }),
    async handler({ query, deps }) {
      const where = query.archived === 'all' ? {} : { archivedAt: query.archived === 'true' ? { [Op.ne]: null } : null };
      const rows = await Programme.findAll({ where, order: [['name', 'ASC']] });
      const counts = await countsByProgramme(deps.sequelize);
      const items = rows.map((p) => presentProgramme(p, counts.get(p.id)));
      return { body: { items } };
    },
  }),
  route({
    method: 'get',
    path: '/api/programmes/:id',
    access: 'data.read',
    summary: 'One programme',
    params: idParamSchema,
    async handler({ params, deps }) {
      const programme = await requireProgramme(params.id, null, 'param');
      const counts = await countsByProgramme(deps.sequelize);
      return { body: { programme: presentProgramme(programme, counts.get(programme.id)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes',
    access: 'programmes.write',
    summary: 'Start a programme',
    body: programmeInputSchema,
    async handler({ body, user, transaction, audit }) {
      if (await Programme.findOne({ where: { codePrefix: body.codePrefix }, transaction })) {
        throw conflict(`Code prefix ${body.codePrefix} is taken by another programme`, { field: 'codePrefix' });
      }
      const programme = await Programme.create({ ...body, notes: body.notes ?? null, createdBy: user!.id }, { transaction });
      await audit({ action: 'programme.created', entityType: 'programme', entityId: programme.id, details: { name: programme.name } });
      return { status: 201, body: { programme: presentProgramme(programme) } };
    },
  }),
  route({
    method: 'patch',
    path: '/api/programmes/:id',
    access: 'programmes.write',
    summary: 'Rename a programme, change its goal or notes',
    params: idParamSchema,
    body: programmeUpdateSchema,
    async handler({ params, body, transaction, audit }) {
      const programme = await requireProgramme(params.id, transaction, 'param', true);
      programme.set(body);
      const changed = programme.changed() || [];
      await programme.save({ transaction });
      await audit({ action: 'programme.updated', entityType: 'programme', entityId: programme.id, details: { changed } });
      return { body: { programme: presentProgramme(programme) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes/:id/archive',
    access: 'programmes.write',
    summary: 'Archive a programme (its records stay)',
    params: idParamSchema,
    async handler({ params, transaction, audit }) {
      const programme = await requireProgramme(params.id, transaction, 'param', true);
      if (!programme.archivedAt) {
        programme.archivedAt = new Date();
        await programme.save({ transaction });
        await audit({ action: 'programme.archived', entityType: 'programme', entityId: programme.id });
      }
      return { body: { programme: presentProgramme(programme) } };
    },
  }),
];
