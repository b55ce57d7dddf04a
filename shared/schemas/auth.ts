import { z } from 'zod';
import { emailSchema, newPasswordSchema } from './common';
import { LIMITS } from '../limits';

export const signInSchema = z.object({
  email: emailSchema,
  // Any string up to the limit: a sign-in must not reveal the password policy.
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(1000, 'Password is too long'),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const tokenSchema = z
  .string({ error: 'The link is incomplete' })
  .regex(/^[A-Za-z0-9_-]{20,200}$/, 'The link is incomplete or damaged');

export const acceptInvitationSchema = z.object({
  token: tokenSchema,
  password: newPasswordSchema,
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

export const requestPasswordResetSchema = z.object({ email: emailSchema });
export type RequestPasswordResetInput = z.infer<typeof requestPasswordResetSchema>;

export const confirmPasswordResetSchema = z.object({
  token: tokenSchema,
  password: newPasswordSchema,
});
export type ConfirmPasswordResetInput = z.infer<typeof confirmPasswordResetSchema>;

/** The client's form adds a repeat field; the server only needs the password. */
export const setPasswordFormSchema = z
  .object({ password: newPasswordSchema, repeat: z.string() })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], message: 'The two passwords differ' });
export type SetPasswordFormInput = z.infer<typeof setPasswordFormSchema>;

export { LIMITS };
