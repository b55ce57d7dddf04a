import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { UserToken, User } from '../models';
import type { TokenPurpose } from '../models/user-token';

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Makes a new one-time link token for a user; older unused ones of the same purpose stop working. */
export async function issueToken(
  input: { userId: number; purpose: TokenPurpose; lifetimeMs: number; createdBy: number | null },
  transaction: Transaction | null,
): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await UserToken.update(
    { usedAt: new Date() },
    { where: { userId: input.userId, purpose: input.purpose, usedAt: null }, transaction },
  );
  await UserToken.create(
    {
      userId: input.userId,
      purpose: input.purpose,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + input.lifetimeMs),
      usedAt: null,
      createdBy: input.createdBy,
    },
    { transaction },
  );
  return token;
}

/** Spends every unused link of this purpose for the user; returns how many were live. */
export async function revokeTokens(userId: number, purpose: TokenPurpose, transaction: Transaction | null): Promise<number> {
  const [count] = await UserToken.update(
    { usedAt: new Date() },
    { where: { userId, purpose, usedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction },
  );
  return count;
}

/** The live token row and its user, locked for the transaction, or null if unknown, used or expired. */
export async function findLiveToken(token: string, purpose: TokenPurpose, transaction: Transaction | null) {
  const row = await UserToken.findOne({
    where: { tokenHash: hashToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: new Date() } },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!row) return null;
  const user = await User.findByPk(row.userId, { transaction });
  return user ? { row, user } : null;
}
