import jwt from 'jsonwebtoken';
import type { Config } from '../../server/config';
import { SESSION_COOKIE } from '../../server/http/session-cookie';

const b64 = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

/** Cookie headers carrying broken sessions for a real user id: each must be refused. */
export function hostileSessionCookies(config: Config, userId: number) {
  const expired = jwt.sign({ role: 'admin' }, config.SESSION_SECRET, { algorithm: 'HS256', subject: String(userId), issuer: 'gelwright', expiresIn: -60 });
  const valid = jwt.sign({ role: 'viewer' }, config.SESSION_SECRET, { algorithm: 'HS256', subject: String(userId), issuer: 'gelwright', expiresIn: 600 });
  const [header, , signature] = valid.split('.');
  const tampered = `${header}.${b64({ role: 'admin', sub: String(userId), iss: 'gelwright', exp: Math.floor(Date.now() / 1000) + 600 })}.${signature}`;
  const algNone = `${b64({ alg: 'none', typ: 'JWT' })}.${b64({ role: 'admin', sub: String(userId), iss: 'gelwright', exp: Math.floor(Date.now() / 1000) + 600 })}.`;
  const otherSecret = jwt.sign({ role: 'admin' }, 'another-installation-secret-of-32-characters', { algorithm: 'HS256', subject: String(userId), issuer: 'gelwright', expiresIn: 600 });
  const cookie = (token: string) => `${SESSION_COOKIE}=${token}`;
  return {
    expired: cookie(expired),
    tampered: cookie(tampered),
    algNone: cookie(algNone),
    otherSecret: cookie(otherSecret),
  };
}
