import { confirmPasswordResetSchema, requestPasswordResetSchema } from '../../../shared/schemas/auth';
import { route } from '../../http/route';
import { badRequest } from '../../errors';
import { requestPasswordReset, setPasswordThroughLink } from '../../services/team';

export const passwordResetRoutes = [
  route({
    method: 'post',
    path: '/api/password-resets',
    access: 'public',
    summary: 'E-mail a one-time password-reset link (same answer for every address)',
    limiters: ['mailByAddress', 'mailByAccount'],
    body: requestPasswordResetSchema,
    async handler(ctx) {
      await requestPasswordReset(ctx, ctx.body.email);
      return { status: 202, body: { message: 'If that address belongs to an active account, a reset link is on its way.' } };
    },
  }),
  route({
    method: 'post',
    path: '/api/password-resets/confirm',
    access: 'public',
    summary: 'Set a new password through a reset link',
    limiters: ['mailByAddress'],
    body: confirmPasswordResetSchema,
    async handler(ctx) {
      await setPasswordThroughLink(ctx, {
        ...ctx.body,
        purpose: 'reset',
        refusal: () => badRequest('This reset link has expired or was used already; ask for a new one', 'token'),
        action: 'password_reset.completed',
      });
      return { body: { message: 'Password changed; sign in with the new one.' } };
    },
  }),
];
