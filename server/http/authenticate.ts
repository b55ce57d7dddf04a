import type { Request, Response } from 'express';
import { User } from '../models';
import type { Config } from '../config';
import { SESSION_COOKIE, clearSessionCookie, verifySession } from './session-cookie';

/**
 * The user behind the request's session cookie, re-read from the database so that a
 * deactivation or a role change takes effect on the next request. Null when there is
 * no valid session; a stale cookie is cleared.
 */
export async function currentUser(config: Config, req: Request, res: Response): Promise<User | null> {
  const token: string | undefined = req.cookies?.[SESSION_COOKIE];
  if (!token) return null;
  const claims = verifySession(config, token);
  const id = claims ? Number(claims.sub) : NaN;
  const user = Number.isSafeInteger(id) ? await User.findByPk(id) : null;
  if (!user || !user.active) {
    clearSessionCookie(config, req, res);
    return null;
  }
  return user;
}
