import { rateLimit, type Options } from 'express-rate-limit';
import type { Request, RequestHandler } from 'express';
import { HttpError } from '../errors';
import type { Config } from '../config';
import { tooManyRequests } from '../errors';
import type { LimiterName } from './route';

function accountKey(req: Request) {
  const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
  return `account:${email}`;
}

/**
 * Rate limits, made per app so that each test's app starts with fresh counters. The
 * counters live in process memory: behind a load balancer, give express-rate-limit a
 * shared store (docs/scaling.md). Only failed sign-ins count; a success does not.
 */
export function createLimiters(config: Config): Record<LimiterName, RequestHandler> {
  const windowMs = config.SIGNIN_WINDOW_MINUTES * 60_000;
  const base: Partial<Options> = {
    windowMs,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(tooManyRequests()),
  };
  return {
    signInByAddress: rateLimit({ ...base, limit: config.SIGNIN_LIMIT_PER_ADDRESS, skipSuccessfulRequests: true }),
    signInBackoff: signInBackoff(config),
    mailByAddress: rateLimit({ ...base, limit: config.SIGNIN_LIMIT_PER_ADDRESS }),
    mailByAccount: rateLimit({ ...base, limit: config.SIGNIN_LIMIT_PER_ACCOUNT, keyGenerator: accountKey }),
    writes: rateLimit({ ...base, windowMs: 60_000, limit: 6000 }),
  };
}

/**
 * Failed sign-ins to one account from one address: after SIGNIN_LIMIT_PER_ACCOUNT of them, each
 * further attempt from that address waits 1 s, then 2 s, 4 s … (at most the sign-in window).
 * Keyed by account *and* address, so a guesser slows only themselves: the owner signing in from
 * elsewhere is never locked out (the per-address limit caps a guesser across accounts).
 * A successful sign-in clears the count; counters live in process memory like the others.
 */
export function signInBackoff(config: Config): RequestHandler {
  const free = config.SIGNIN_LIMIT_PER_ACCOUNT;
  const windowMs = config.SIGNIN_WINDOW_MINUTES * 60_000;
  const failures = new Map<string, { count: number; waitUntil: number; lastAt: number }>();
  const sweep = () => {
    const now = Date.now();
    for (const [key, entry] of failures) if (now - entry.lastAt > windowMs && now > entry.waitUntil) failures.delete(key);
  };
  return (req, res, next) => {
    if (failures.size > 10_000) sweep();
    const key = `${accountKey(req)}|${req.ip ?? ''}`;
    const now = Date.now();
    const entry = failures.get(key);
    if (entry && now - entry.lastAt > windowMs && now > entry.waitUntil) failures.delete(key);
    const current = failures.get(key);
    if (current && now < current.waitUntil) {
      const seconds = Math.ceil((current.waitUntil - now) / 1000);
      res.setHeader('Retry-After', String(seconds));
      return next(new HttpError(429, 'too_many_requests', `Too many failed sign-ins for this account from your address; wait ${seconds} s and try again`, { retryAfterSeconds: seconds }));
    }
    res.on('finish', () => {
      if (res.statusCode === 201) return void failures.delete(key);
      if (res.statusCode !== 401) return;
      const at = Date.now();
      const next = { count: (failures.get(key)?.count ?? 0) + 1, waitUntil: 0, lastAt: at };
      if (next.count >= free) next.waitUntil = at + Math.min(1000 * 2 ** (next.count - free), windowMs);
      failures.set(key, next);
    });
    next();
  };
}
