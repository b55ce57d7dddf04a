import type { Request, Response } from 'express';
import { QueryTypes } from 'sequelize';
import { User } from '../models';
import type { Config } from '../config';
import { SESSION_COOKIE, clearSessionCookie, verifySession } from './session-cookie';

/** One fixed statement: the session lookup runs on every request, so it skips the query builder. */
const SESSION_USER_SQL =
  'SELECT id, email, name, role, password_hash, active, last_sign_in_at, invited_by, session_version, created_at, updated_at FROM users WHERE id = ?';

interface UserRow {
  id: number; email: string; name: string; role: User['role']; password_hash: string | null; active: number | boolean;
  last_sign_in_at: Date | null; invited_by: number | null; session_version: number; created_at: Date; updated_at: Date;
}

async function userById(id: number): Promise<User | null> {
  const [row] = await User.sequelize!.query<UserRow>(SESSION_USER_SQL, { replacements: [id], type: QueryTypes.SELECT });
  if (!row) return null;
  return User.build(
    {
      id: row.id, email: row.email, name: row.name, role: row.role, passwordHash: row.password_hash, active: Boolean(row.active),
      lastSignInAt: row.last_sign_in_at, invitedBy: row.invited_by, sessionVersion: row.session_version, createdAt: row.created_at, updatedAt: row.updated_at,
    },
    { isNewRecord: false, raw: true },
  );
}

/**
 * The user behind the request's session cookie, re-read from the database so that a
 * deactivation or a role change takes effect on the next request. Null when there is
 * no valid session; a stale cookie is cleared. A token whose session version is not the user's
 * current one was ended (sign-out, new password, deactivation, role change) and is refused.
 */
export async function currentUser(config: Config, req: Request, res: Response): Promise<User | null> {
  const token: string | undefined = req.cookies?.[SESSION_COOKIE];
  if (!token) return null;
  const claims = verifySession(config, token);
  const id = claims ? Number(claims.sub) : NaN;
  const user = Number.isSafeInteger(id) ? await userById(id) : null;
  if (!user || !user.active || claims?.sv !== user.sessionVersion) {
    clearSessionCookie(config, req, res);
    return null;
  }
  return user;
}
