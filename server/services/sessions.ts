import type { Transaction } from 'sequelize';
import type { SignInInput } from '../../shared/schemas/auth';
import { User } from '../models';
import { recordAudit } from '../models/audit-event';
import { passwordMatches } from './passwords';

/**
 * Ends every session of the user: their session version moves on, so each token issued before
 * is refused on its next request (server/http/authenticate.ts compares the two).
 */
export async function endSessions(user: User, transaction: Transaction | null) {
  user.sessionVersion += 1;
  await user.save({ transaction });
}

/** Sign-out: ends this user's sessions everywhere, not only the cookie in this browser. */
export async function signOut(userId: number, transaction: Transaction | null) {
  await User.increment('sessionVersion', { by: 1, where: { id: userId }, transaction });
}

/**
 * Checks an e-mail and password and records the sign-in (or the refusal, with its reason) in the
 * audit trail outside any transaction, so a refusal is kept. Returns the user, or null for a
 * wrong e-mail, a wrong password and an inactive account alike.
 */
export async function signIn(credentials: SignInInput, ip: string, bcryptCost: number): Promise<User | null> {
  const user = await User.findOne({ where: { email: credentials.email } });
  const ok = await passwordMatches(credentials.password, user?.passwordHash ?? null, bcryptCost);
  if (!user || !ok || !user.active) {
    await recordAudit({
      actorId: null,
      action: 'session.sign_in_failed',
      entityType: 'user',
      entityId: user?.id ?? null,
      details: { email: credentials.email, reason: !user ? 'unknown e-mail' : !ok ? 'wrong password' : 'inactive' },
      ip,
    });
    return null;
  }
  user.lastSignInAt = new Date();
  await user.save();
  await recordAudit({ actorId: user.id, action: 'session.signed_in', entityType: 'user', entityId: user.id, ip });
  return user;
}
