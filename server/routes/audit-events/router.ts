import { auditQuerySchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { presentAuditEvent } from '../../presenters/audit-event';
import { presentPage } from '../../presenters/page';
import { listAuditEvents } from '../../services/audit';

export const auditRoutes = [
  route({
    method: 'get',
    path: '/api/audit-events',
    access: 'team.manage',
    summary: 'The audit trail, newest first',
    query: auditQuerySchema,
    async handler({ query }) {
      const { rows, count } = await listAuditEvents(query);
      return { body: presentPage(query, rows.map(presentAuditEvent), count) };
    },
  }),
];
