import { checkScheduleInputSchema, dueChecksQuerySchema } from '../../../shared/schemas/check-schedules';
import { idParamSchema } from '../../../shared/schemas/common';
import { route } from '../../http/route';
import { presentCheckSchedule } from '../../presenters/check-schedule';
import { listDueChecks, loadCheckSchedule, setCheckSchedule } from '../../services/check-schedules';

export const checkScheduleRoutes = [
  route({
    method: 'get',
    path: '/api/recipes/:id/check-schedule',
    access: 'data.read',
    summary: "A recipe's check schedule: the ages (days after mixing) at which its samples are looked at",
    params: idParamSchema,
    async handler({ params }) {
      const { recipeId, schedule, updater } = await loadCheckSchedule(params.id);
      return { body: { schedule: presentCheckSchedule(recipeId, schedule, updater) } };
    },
  }),
  route({
    method: 'put',
    path: '/api/recipes/:id/check-schedule',
    access: 'observations.write',
    summary: "Set a recipe's check schedule (an empty list of ages removes it)",
    params: idParamSchema,
    body: checkScheduleInputSchema,
    async handler(ctx) {
      const { recipeId, schedule, updater } = await setCheckSchedule(ctx, ctx.params.id, ctx.body);
      return { body: { schedule: presentCheckSchedule(recipeId, schedule, updater) } };
    },
  }),
  route({
    method: 'get',
    path: '/api/due-checks',
    access: 'data.read',
    summary: "A programme's samples whose next scheduled check has come, most overdue first (at most `limit`)",
    query: dueChecksQuerySchema,
    async handler({ query }) {
      return { body: await listDueChecks(query.programme, query.limit, new Date()) };
    },
  }),
];
