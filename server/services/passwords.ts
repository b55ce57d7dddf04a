import bcrypt from 'bcryptjs';
import { randomBytes } from 'node:crypto';

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

const decoys = new Map<number, Promise<string>>();

/** A real hash of a random secret, made once per cost factor. */
function decoyHash(cost: number) {
  if (!decoys.has(cost)) decoys.set(cost, bcrypt.hash(randomBytes(18).toString('base64'), cost));
  return decoys.get(cost)!;
}

/**
 * Checks a password. When the account is unknown or has no password yet, it compares
 * against a decoy of the same cost, so every failed sign-in takes the same time.
 */
export async function passwordMatches(password: string, hash: string | null, cost: number): Promise<boolean> {
  const matches = await bcrypt.compare(password, hash ?? (await decoyHash(cost)));
  return hash !== null && matches;
}

/** The cost factor a stored hash was made with (the two digits after the version). */
export function bcryptCost(hash: string): number {
  return Number(hash.split('$')[2]);
}
