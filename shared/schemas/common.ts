import { z } from 'zod';
import { LIMITS } from '../limits';

export const emailSchema = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .max(LIMITS.emailLength, `E-mail must be at most ${LIMITS.emailLength} characters`)
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

export const personNameSchema = z
  .string({ error: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(LIMITS.nameLength, `Name must be at most ${LIMITS.nameLength} characters`);

export const newPasswordSchema = z
  .string({ error: 'Password is required' })
  .min(LIMITS.passwordMin, `Password must be at least ${LIMITS.passwordMin} characters`)
  .refine((value) => new TextEncoder().encode(value).length <= LIMITS.passwordMaxBytes, {
    message: `Password must be at most ${LIMITS.passwordMaxBytes} bytes`,
  });

export const idParamSchema = z.object({
  id: z.coerce.number({ error: 'id must be a number' }).int('id must be a whole number').positive('id must be positive'),
});

export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1, 'page starts at 1').default(1),
  pageSize: z.coerce
    .number()
    .int()
    .min(1, 'pageSize must be at least 1')
    .max(LIMITS.pageSizeMax, `pageSize must be at most ${LIMITS.pageSizeMax}`)
    .default(LIMITS.pageSizeDefault),
});
