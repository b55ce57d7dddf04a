import { programmeIdParamSchema } from '../../../shared/schemas/calibrations';
import { shelfLifeQuerySchema } from '../../../shared/schemas/shelf-life';
import { route } from '../../http/route';
import { loadProgrammeShelfLife } from '../../services/shelf-life';

/** How long a programme's gels last on the bench, and what drives their collapse. */
export const shelfLifeRoutes = [
  route({
    method: 'get',
    path: '/api/programmes/:id/shelf-life',
    access: 'data.read',
    summary: "The programme's shelf life: survival curves per recipe, similar-recipe group and map region, and the Cox model of what drives collapse (or why it was refused)",
    params: programmeIdParamSchema,
    query: shelfLifeQuerySchema,
    async handler(ctx) {
      return { body: await loadProgrammeShelfLife(ctx, ctx.params.id, ctx.query.recipe) };
    },
  }),
];
