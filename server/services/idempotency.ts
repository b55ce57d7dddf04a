import { createHash } from 'node:crypto';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { badRequest, conflict } from '../errors';
import { IdempotentRequest } from '../models';

export const sha256 = (bytes: string | Buffer) => createHash('sha256').update(bytes).digest('hex');

/** The Idempotency-Key header, checked; null when none was sent. */
export function idempotencyKeyOf(header: string | undefined): string | null {
  if (header === undefined) return null;
  if (!/^[\w.:-]{8,200}$/.test(header)) throw badRequest('Idempotency-Key: use 8 to 200 letters, digits, dots, colons, dashes or underscores', 'Idempotency-Key');
  return header;
}

export const keyReused = (what: string) =>
  conflict(`This Idempotency-Key was used before for a different ${what}; use a new key for a new ${what}`, { field: 'Idempotency-Key' });

export type Claim = { replay: { status: number; body: unknown } } | { settle: (status: number, body: unknown) => Promise<void> };

/**
 * Claims `key` for this user and scope in the write's own transaction (a unique index holds it).
 * A key seen before with the same request replays the stored answer; with another request it
 * is a 409. A concurrent twin waits on the index, then finds the winner's committed row.
 */
export async function claimIdempotencyKey(
  input: { userId: number; scope: string; key: string; requestSha256: string; what: string },
  transaction: Transaction | null,
): Promise<Claim> {
  const where = { userId: input.userId, scope: input.scope, idempotencyKey: input.key };
  const answerFrom = (row: IdempotentRequest): Claim => {
    if (row.requestSha256 !== input.requestSha256) throw keyReused(input.what);
    return { replay: { status: row.responseStatus ?? 200, body: row.responseBody } };
  };
  const earlier = await IdempotentRequest.findOne({ where, transaction });
  if (earlier) return answerFrom(earlier);
  let row: IdempotentRequest;
  try {
    row = await IdempotentRequest.create({ ...where, requestSha256: input.requestSha256, responseStatus: null, responseBody: null }, { transaction });
  } catch (error) {
    if (!(error instanceof UniqueConstraintError)) throw error;
    // A locking read sees the twin's committed row, which this transaction's snapshot does not.
    const twin = await IdempotentRequest.findOne({ where, transaction, lock: transaction?.LOCK.SHARE });
    if (!twin) throw error;
    return answerFrom(twin);
  }
  return {
    settle: async (status, body) => {
      row.responseStatus = status;
      row.responseBody = body;
      await row.save({ transaction });
    },
  };
}
