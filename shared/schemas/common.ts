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

/**
 * A record id in a path or query string: decimal digits only (no 0x10, 1e3, +5 or spaces, which
 * Number() would accept), as a positive whole number.
 */
export const decimalId = (label: string) =>
  z.union([
    z.number({ error: `${label} must be a number` }).int(`${label} must be a whole number`).positive(`${label} must be positive`),
    z
      .string({ error: `${label} must be a number` })
      .regex(/^[1-9][0-9]{0,14}$/, `${label} must be a positive whole number in decimal digits`)
      .transform(Number),
  ], { error: `${label} must be a positive whole number in decimal digits` });

export const idParamSchema = z.object({ id: decimalId('id') });

export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1, 'page starts at 1').default(1),
  pageSize: z.coerce
    .number()
    .int()
    .min(1, 'pageSize must be at least 1')
    .max(LIMITS.pageSizeMax, `pageSize must be at most ${LIMITS.pageSizeMax}`)
    .default(LIMITS.pageSizeDefault),
});

export type PageQuery = z.infer<typeof pageQuerySchema>;

/** A finite number within [min, max], with the field's unit in the message. */
export function boundedNumber(label: string, min: number, max: number, unit = '') {
  const suffix = unit ? ` ${unit}` : '';
  return z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be a finite number`)
    .refine((v) => v >= min && v <= max, `${label} must be between ${min} and ${max}${suffix}`);
}

export const optionalText = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text` })
    .trim()
    .max(max, `${label} must be at most ${max} characters`)
    .transform((v) => (v === '' ? undefined : v))
    .optional();

export const requiredText = (label: string, max: number) =>
  z
    .string({ error: `${label} is required` })
    .trim()
    .min(1, `${label} is required`)
    .max(max, `${label} must be at most ${max} characters`);

export const optionalPrice = boundedNumber('Price per kg', 0, 1_000_000, '/kg').nullable().optional();

export const idSchema = (label: string) =>
  z.number({ error: `${label} must be a record id` }).int(`${label} must be a whole number`).positive(`${label} must be positive`);
