import type { Transaction } from 'sequelize';
import { User } from '../models';

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
