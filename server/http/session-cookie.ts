import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Request, Response } from 'express';
import type { Config } from '../config';
import type { Role } from '../../shared/roles';

export const SESSION_COOKIE = 'gw_session';
const ISSUER = 'gelwright';
/** Only this algorithm is accepted: tokens claiming `none` or another one are refused. */
const ALGORITHMS: jwt.Algorithm[] = ['HS256'];

const keys = new Map<string, KeyObject>();

/** The HMAC key as a KeyObject, made once: jsonwebtoken would otherwise make one per call. */
function keyOf(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) {
    key = createSecretKey(Buffer.from(secret, 'utf8'));
    keys.set(secret, key);
  }
  return key;
}

export interface SessionClaims {
  sub: string;
  role: Role;
  /** The user's session version when the token was issued. */
  sv: number | null;
}

export function signSession(config: Config, user: { id: number; role: Role; sessionVersion: number }): string {
  return jwt.sign({ role: user.role, sv: user.sessionVersion }, keyOf(config.SESSION_SECRET), {
    algorithm: 'HS256',
    subject: String(user.id),
    issuer: ISSUER,
    expiresIn: Math.round(config.SESSION_HOURS * 3600),
  });
}

/** Returns the claims, or null for a missing, tampered, expired or foreign token. */
export function verifySession(config: Config, token: string | undefined): SessionClaims | null {
  if (!token) return null;
  try {
    const claims = jwt.verify(token, keyOf(config.SESSION_SECRET), { algorithms: ALGORITHMS, issuer: ISSUER });
    if (typeof claims === 'string' || typeof claims.sub !== 'string') return null;
    return { sub: claims.sub, role: claims.role as Role, sv: Number.isSafeInteger(claims.sv) ? (claims.sv as number) : null };
  } catch {
    return null;
  }
}

function cookieOptions(config: Config, req: Request) {
  const secure = config.COOKIE_SECURE === 'true' || (config.COOKIE_SECURE === 'auto' && req.secure);
  return { httpOnly: true, sameSite: 'strict' as const, secure, path: '/' };
}

export function setSessionCookie(config: Config, req: Request, res: Response, token: string) {
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(config, req), maxAge: config.SESSION_HOURS * 3600 * 1000 });
}

export function clearSessionCookie(config: Config, req: Request, res: Response) {
  res.clearCookie(SESSION_COOKIE, cookieOptions(config, req));
}
