import { QueryTypes, type Transaction } from 'sequelize';
import { AuditEvent } from '../models';

export interface AuditInput {
  actorId: number | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  details?: Record<string, unknown> | null;
  ip?: string | null;
}

/**
 * One fixed statement: every write appends an audit row, so this skips the model's build,
 * validation and query building (the columns are bounded here instead). created_at is the
 * database's clock in UTC (the pool sets time_zone '+00:00').
 */
const INSERT_AUDIT =
  'INSERT INTO audit_events (actor_id, action, entity_type, entity_id, details, ip, created_at) VALUES (?, ?, ?, ?, ?, ?, NOW(3))';

/** Appends one audit event, inside the caller's transaction when it has one. */
export async function recordAudit(event: AuditInput, transaction?: Transaction) {
  await AuditEvent.sequelize!.query(INSERT_AUDIT, {
    type: QueryTypes.INSERT,
    transaction,
    replacements: [
      event.actorId,
      event.action.slice(0, 64),
      event.entityType.slice(0, 40),
      event.entityId === undefined || event.entityId === null ? null : String(event.entityId).slice(0, 64),
      event.details ? JSON.stringify(event.details) : null,
      event.ip ? event.ip.slice(0, 64) : null,
    ],
  });
}
