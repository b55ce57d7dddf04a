import type { AuditQuery } from '../../shared/schemas/team';
import { AuditEvent, User } from '../models';
import { paged } from './paging';

// Writing an audit event is one fixed statement beside its model (recordAudit in
// server/models/audit-event.ts), used by the pipeline's ctx.audit, services and seeds.

export type AuditEventWithActor = AuditEvent & { actor?: User | null };

/** One page of the audit trail, newest first, by action and actor. */
export async function listAuditEvents(query: AuditQuery) {
  const where: Record<string, unknown> = {};
  if (query.action) where.action = query.action;
  if (query.actorId) where.actorId = query.actorId;
  const { rows, count } = await AuditEvent.findAndCountAll({
    where,
    include: [{ model: User, as: 'actor', attributes: ['id', 'name', 'email'] }],
    order: [['id', 'DESC']],
    ...paged(query),
  });
  return { rows: rows as AuditEventWithActor[], count };
}
