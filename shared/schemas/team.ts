import { z } from 'zod';
import { ROLES } from '../roles';
import { decimalId, emailSchema, pageQuerySchema, personNameSchema } from './common';

export const roleSchema = z.enum(ROLES, { error: `role must be one of ${ROLES.join(', ')}` });

export const createInvitationSchema = z
  .object({
    email: emailSchema,
    name: personNameSchema,
    role: roleSchema,
  })
  .strict();
export type CreateInvitationInput = z.infer<typeof createInvitationSchema>;

export const updateUserSchema = z
  .object({
    role: roleSchema.optional(),
    active: z.boolean({ error: 'active must be true or false' }).optional(),
    name: personNameSchema.optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined || v.name !== undefined, {
    message: 'Give role, active or name',
  });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export const auditQuerySchema = pageQuerySchema.extend({
  action: z.string().max(64).optional(),
  actorId: decimalId('actorId').optional(),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const outboxQuerySchema = pageQuerySchema.extend({
  to: z.string().max(254).optional(),
});
export type OutboxQuery = z.infer<typeof outboxQuerySchema>;
