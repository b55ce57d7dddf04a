import { z } from 'zod';
import { acceptInvitationSchema, tokenSchema } from '../../../shared/schemas/auth';
import { createInvitationSchema } from '../../../shared/schemas/team';
import { route } from '../../http/route';
import { badRequest } from '../../errors';
import { presentUser } from '../../presenters/user';
import { findLiveToken } from '../../services/one-time-links';
import { inviteUser, setPasswordThroughLink } from '../../services/team';

const EXPIRED = () => badRequest('This invitation link has expired or was used already; ask an administrator for a new one', 'token');

export const invitationRoutes = [
  route({
    method: 'post',
    path: '/api/invitations',
    access: 'team.manage',
    summary: 'Invite a person with a role; e-mails them a one-time link',
    body: createInvitationSchema,
    async handler(ctx) {
      const user = await inviteUser(ctx, ctx.body);
      return { status: 201, body: { user: presentUser(user) } };
    },
  }),
  route({
    method: 'get',
    path: '/api/invitations/:token',
    access: 'public',
    summary: 'Who an invitation link is for (to greet the invitee)',
    params: z.object({ token: tokenSchema }),
    async handler({ params, transaction }) {
      const live = await findLiveToken(params.token, 'invitation', transaction);
      if (!live) throw EXPIRED();
      return { body: { name: live.user.name, email: live.user.email, role: live.user.role } };
    },
  }),
  route({
    method: 'post',
    path: '/api/invitations/accept',
    access: 'public',
    summary: 'Set a password through an invitation link and activate the account',
    limiters: ['mailByAddress'],
    body: acceptInvitationSchema,
    async handler(ctx) {
      const user = await setPasswordThroughLink(ctx, { ...ctx.body, purpose: 'invitation', refusal: EXPIRED, action: 'invitation.accepted' });
      return { body: { user: presentUser(user) } };
    },
  }),
];
