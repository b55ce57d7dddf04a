import { idParamSchema, pageQuerySchema } from '../../../shared/schemas/common';
import { updateUserSchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { User } from '../../models';
import { presentUser } from '../../presenters/user';
import { updateUser } from '../../services/team';

export const userRoutes = [
  route({
    method: 'get',
    path: '/api/users',
    access: 'team.manage',
    summary: 'Everyone in the installation',
    query: pageQuerySchema,
    async handler({ query }) {
      const { rows, count } = await User.findAndCountAll({
        order: [['name', 'ASC']],
        limit: query.pageSize,
        offset: (query.page - 1) * query.pageSize,
      });
      return { body: { items: rows.map(presentUser), total: count, page: query.page, pageSize: query.pageSize } };
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
