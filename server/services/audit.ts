import type { Transaction } from 'sequelize';
import { AuditEvent } from '../models';

export interface AuditInput {
  actorId: number | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  details?: Record<string, unknown> | null;
  ip?: string | null;
}

/** Appends one audit event, inside the caller's transaction when it has one. */
export async function recordAudit(event: AuditInput, transaction?: Transaction) {
  await AuditEvent.create(
    {
      actorId: event.actorId,
      action: event.action,
      entityType: event.entityType,
      entityId: event.entityId === undefined || event.entityId === null ? null : String(event.entityId),
      details: event.details ?? null,
      ip: event.ip ? event.ip.slice(0, 64) : null,
    },
    { transaction },
  );
}
