import { idParamSchema } from '../../../shared/schemas/common';
import { outboxQuerySchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { presentOutboxMessage } from '../../presenters/outbox-message';
import { presentPage } from '../../presenters/page';
import { listOutbox, loadOutboxMessage } from '../../services/outbox';

export const outboxRoutes = [
  route({
    method: 'get',
    path: '/api/outbox',
    access: 'team.manage',
    summary: 'Every e-mail the installation sent, newest first',
    query: outboxQuerySchema,
    async handler({ query }) {
      const { rows, count } = await listOutbox(query);
      return { body: presentPage(query, rows.map((m) => presentOutboxMessage(m, false)), count) };
    },
  }),
  route({
    method: 'get',
    path: '/api/outbox/:id',
    access: 'team.manage',
    summary: 'One e-mail with its body',
    params: idParamSchema,
    async handler({ params }) {
      return { body: { message: presentOutboxMessage(await loadOutboxMessage(params.id), true) } };
    },
  }),
];
