import type { AuditEvent, User } from '../models';

/** An audit event with who did it (null for a visitor, e.g. a failed sign-in). */
export function presentAuditEvent(e: AuditEvent & { actor?: User | null }) {
  const actor = e.actor;
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
}
