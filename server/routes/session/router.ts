import { signInSchema } from '../../../shared/schemas/auth';
import { route } from '../../http/route';
import { clearSessionCookie, setSessionCookie, signSession } from '../../http/session-cookie';
import { HttpError } from '../../errors';
import { presentUser } from '../../presenters/user';
import { signIn, signOut } from '../../services/sessions';

const WRONG = () => new HttpError(401, 'sign_in_failed', 'E-mail or password is wrong');

export const sessionRoutes = [
  route({
    method: 'post',
    path: '/api/session',
    access: 'public',
    summary: 'Sign in with e-mail and password',
    limiters: ['signInByAddress', 'signInBackoff'],
    body: signInSchema,
    // The failed-sign-in audit event must survive the refusal, so no surrounding transaction.
    transactional: false,
    async handler({ body, deps, req, res, ip }) {
      const user = await signIn(body, ip, deps.config.BCRYPT_COST);
      // Known and unknown e-mails, wrong passwords and inactive accounts get the same answer.
      if (!user) throw WRONG();
      setSessionCookie(deps.config, req, res, signSession(deps.config, user));
      return { status: 201, body: { user: presentUser(user) } };
    },
  }),
  route({
    method: 'get',
    path: '/api/session',
    access: 'public',
    summary: 'The signed-in user, or null for a visitor (so a page can ask without an error)',
    async handler({ user, res }) {
      res.setHeader('Cache-Control', 'no-store');
      return { body: { user: user ? presentUser(user) : null } };
    },
  }),
  route({
    method: 'delete',
    path: '/api/session',
    access: 'public',
    summary: 'Sign out (clears the session cookie and ends every session of the user)',
    async handler({ user, deps, req, res, audit, transaction }) {
      if (user) {
        await signOut(user.id, transaction);
        await audit({ action: 'session.signed_out', entityType: 'user', entityId: user.id });
      }
      clearSessionCookie(deps.config, req, res);
      return { status: 204 };
    },
  }),
];
