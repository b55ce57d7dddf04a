import { Op } from 'sequelize';
import { idParamSchema } from '../../../shared/schemas/common';
import { outboxQuerySchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { notFound } from '../../errors';
import { OutboxMessage } from '../../models';

function present(m: OutboxMessage, withBody: boolean) {
  return {
    id: m.id,
    sender: m.sender,
    recipients: m.recipients,
    subject: m.subject,
    transport: m.transport,
    createdAt: m.createdAt.toISOString(),
    ...(withBody ? { text: m.textBody, html: m.htmlBody } : { preview: (m.textBody ?? '').slice(0, 160) }),
  };
}

export const outboxRoutes = [
  route({
    method: 'get',
    path: '/api/outbox',
    access: 'team.manage',
    summary: 'Every e-mail the installation sent, newest first',
    query: outboxQuerySchema,
    async handler({ query }) {
      const where = query.to ? { recipients: { [Op.like]: `%${query.to.replace(/[%_\\]/g, '\\$&')}%` } } : {};
      const { rows, count } = await OutboxMessage.findAndCountAll({
        where,
        order: [['id', 'DESC']],
        limit: query.pageSize,
        offset: (query.page - 1) * query.pageSize,
      });
      return { body: { items: rows.map((m) => present(m, false)), total: count, page: query.page, pageSize: query.pageSize } };
    },
  }),
  route({
    method: 'get',
    path: '/api/outbox/:id',
    access: 'team.manage',
    summary: 'One e-mail with its body',
    params: idParamSchema,
    async handler({ params }) {
      const message = await OutboxMessage.findByPk(params.id);
      if (!message) throw notFound('Message');
      return { body: { message: present(message, true) } };
    },
  }),
];
