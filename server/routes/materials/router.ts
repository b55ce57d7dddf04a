import { z } from 'zod';
import { MATERIAL_SCHEMAS, type MaterialKind } from '../../../shared/schemas/materials';
import { idParamSchema } from '../../../shared/schemas/common';
import { route, type RouteSpec } from '../../http/route';
import { presentDepletant, presentParticle, presentSalt, presentSolvent } from '../../presenters/materials';
import { createMaterial, findMaterial, listMaterials, replaceMaterial, setMaterialArchived } from '../../services/materials';

const PRESENT: Record<MaterialKind, (m: never) => unknown> = {
  particles: presentParticle as never,
  depletants: presentDepletant as never,
  solvents: presentSolvent as never,
  salts: presentSalt as never,
};

const listQuery = z.object({
  archived: z.enum(['true', 'false', 'all']).default('false'),
  q: z.string().trim().max(120).optional(),
});

/** The same six routes for each kind of library entry; PUT replaces the whole entry. */
function materialRoutes(kind: MaterialKind): RouteSpec[] {
  const present = PRESENT[kind];
  const schema = MATERIAL_SCHEMAS[kind] as z.ZodType<Record<string, unknown>>;
  const base = `/api/materials/${kind}`;
  return [
    route({
      method: 'get',
      path: base,
      access: 'data.read',
      summary: `The library's ${kind}`,
      query: listQuery,
      async handler({ query }) {
        const rows = await listMaterials(kind, query);
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
        return { body: { item: present((await findMaterial(kind, params.id, null)) as never) } };
      },
    }),
    route({
      method: 'post',
      path: base,
      access: 'materials.write',
      summary: `Add to the library's ${kind}`,
      body: schema,
      async handler(ctx) {
        return { status: 201, body: { item: present((await createMaterial(ctx, kind, ctx.body)) as never) } };
      },
    }),
    route({
      method: 'put',
      path: `${base}/:id`,
      access: 'materials.write',
      summary: `Replace one of the library's ${kind}`,
      params: idParamSchema,
      body: schema,
      async handler(ctx) {
        return { body: { item: present((await replaceMaterial(ctx, kind, ctx.params.id, ctx.body)) as never) } };
      },
    }),
    route({
      method: 'post',
      path: `${base}/:id/archive`,
      access: 'materials.write',
      summary: `Archive one of the library's ${kind} (recipes keep using it)`,
      params: idParamSchema,
      async handler(ctx) {
        return { body: { item: present((await setMaterialArchived(ctx, kind, ctx.params.id, true)) as never) } };
      },
    }),
    route({
      method: 'post',
      path: `${base}/:id/restore`,
      access: 'materials.write',
      summary: `Bring one of the library's ${kind} back from the archive`,
      params: idParamSchema,
      async handler(ctx) {
        return { body: { item: present((await setMaterialArchived(ctx, kind, ctx.params.id, false)) as never) } };
      },
    }),
  ];
}

export const materialRouteList: RouteSpec[] = (['particles', 'depletants', 'solvents', 'salts'] as const).flatMap(materialRoutes);
