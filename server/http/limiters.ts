import { rateLimit, type Options } from 'express-rate-limit';
import type { Request, RequestHandler } from 'express';
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
    signInByAccount: rateLimit({ ...base, limit: config.SIGNIN_LIMIT_PER_ACCOUNT, skipSuccessfulRequests: true, keyGenerator: accountKey }),
    mailByAddress: rateLimit({ ...base, limit: config.SIGNIN_LIMIT_PER_ADDRESS }),
    mailByAccount: rateLimit({ ...base, limit: config.SIGNIN_LIMIT_PER_ACCOUNT, keyGenerator: accountKey }),
    writes: rateLimit({ ...base, windowMs: 60_000, limit: 6000 }),
  };
}
