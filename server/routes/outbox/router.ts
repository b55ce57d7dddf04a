import { Op } from 'sequelize';
import { idParamSchema } from '../../../shared/schemas/common';
import { outboxQuerySchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { notFound } from '../../errors';
import { OutboxMessage } from '../../models';

/**
 * Password-reset links are shown without their token: an administrator reading the outbox
 * must not be able to take over someone's account. (Invitation links stay: the administrator
 * issued them.) The stored message is kept as it was sent.
 */
export function hideResetTokens(text: string | null): string | null {
  return text === null ? null : text.replace(/(\/reset-password\?token=)[A-Za-z0-9_-]+/g, '$1(hidden)');
}

function present(m: OutboxMessage, withBody: boolean) {
  return {
    id: m.id,
    sender: m.sender,
    recipients: m.recipients,
    subject: m.subject,
    transport: m.transport,
    createdAt: m.createdAt.toISOString(),
    ...(withBody ? { text: hideResetTokens(m.textBody), html: hideResetTokens(m.htmlBody) } : { preview: (hideResetTokens(m.textBody) ?? '').slice(0, 160) }),
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
