import { idParamSchema, pageQuerySchema } from '../../../shared/schemas/common';
import { updateUserSchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { presentPage } from '../../presenters/page';
import { presentUser } from '../../presenters/user';
import { listUsers, updateUser } from '../../services/team';

export const userRoutes = [
  route({
    method: 'get',
    path: '/api/users',
    access: 'team.manage',
    summary: 'Everyone in the installation',
    query: pageQuerySchema,
    async handler({ query }) {
      const { rows, count } = await listUsers(query);
      return { body: presentPage(query, rows.map(presentUser), count) };
    },
  }),
  route({
    method: 'patch',
    path: '/api/users/:id',
    access: 'team.manage',
    summary: 'Change a role, a name, or deactivate / reactivate an account',
    params: idParamSchema,
    body: updateUserSchema,
    async handler(ctx) {
      const user = await updateUser(ctx, ctx.params.id, ctx.body);
      return { body: { user: presentUser(user) } };
    },
  }),
];
