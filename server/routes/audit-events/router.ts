import { auditQuerySchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { AuditEvent, User } from '../../models';

export const auditRoutes = [
  route({
    method: 'get',
    path: '/api/audit-events',
    access: 'team.manage',
    summary: 'The audit trail, newest first',
    query: auditQuerySchema,
    async handler({ query }) {
      const where: Record<string, unknown> = {};
      if (query.action) where.action = query.action;
      if (query.actorId) where.actorId = query.actorId;
      const { rows, count } = await AuditEvent.findAndCountAll({
        where,
        include: [{ model: User, as: 'actor', attributes: ['id', 'name', 'email'] }],
        order: [['id', 'DESC']],
        limit: query.pageSize,
        offset: (query.page - 1) * query.pageSize,
      });
      const items = rows.map((e) => {
        const actor = (e as AuditEvent & { actor?: User }).actor;
        return {
          id: Number(e.id),
          action: e.action,
          entityType: e.entityType,
          entityId: e.entityId,
          details: e.details,
          ip: e.ip,
          actor: actor ? { id: actor.id, name: actor.name, email: actor.email } : null,
          createdAt: e.createdAt.toISOString(),
        };
      });
      return { body: { items, total: count, page: query.page, pageSize: query.pageSize } };
    },
  }),
];
