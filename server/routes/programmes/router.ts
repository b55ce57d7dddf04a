import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { programmeInputSchema, programmeUpdateSchema } from '../../../shared/schemas/programmes';
import { route } from '../../http/route';
import { presentProgramme } from '../../presenters/programme';
import { requireProgramme } from '../../services/lookups';
import { archiveProgramme, countsByProgramme, createProgramme, listProgrammes, updateProgramme } from '../../services/programmes';

export const programmeRoutes = [
  route({
    method: 'get',
    path: '/api/programmes',
    access: 'data.read',
    summary: 'Programmes with their recipe and observation counts',
    query: z.object({ archived: z.enum(['true', 'false', 'all']).default('false') }),
    async handler({ query }) {
      const rows = await listProgrammes(query.archived);
      const counts = await countsByProgramme();
      return { body: { items: rows.map((p) => presentProgramme(p, counts.get(p.id))) } };
    },
  }),
  route({
    method: 'get',
    path: '/api/programmes/:id',
    access: 'data.read',
    summary: 'One programme',
    params: idParamSchema,
    async handler({ params }) {
      const programme = await requireProgramme(params.id, null, 'param');
      const counts = await countsByProgramme();
      return { body: { programme: presentProgramme(programme, counts.get(programme.id)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes',
    access: 'programmes.write',
    summary: 'Start a programme',
    body: programmeInputSchema,
    async handler(ctx) {
      return { status: 201, body: { programme: presentProgramme(await createProgramme(ctx, ctx.body)) } };
    },
  }),
  route({
    method: 'patch',
    path: '/api/programmes/:id',
    access: 'programmes.write',
    summary: 'Rename a programme, change its goal or notes',
    params: idParamSchema,
    body: programmeUpdateSchema,
    async handler(ctx) {
      return { body: { programme: presentProgramme(await updateProgramme(ctx, ctx.params.id, ctx.body)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes/:id/archive',
    access: 'programmes.write',
    summary: 'Archive a programme (its records stay)',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { programme: presentProgramme(await archiveProgramme(ctx, ctx.params.id)) } };
    },
  }),
];
