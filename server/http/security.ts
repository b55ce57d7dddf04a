import helmet from 'helmet';
import type { RequestHandler } from 'express';
import type { Config } from '../config';
import { forbidden } from '../errors';

/** Security headers: a strict content security policy, nosniff, no framing. */
export function securityHeaders(config: Config): RequestHandler {
  const https = config.PUBLIC_URL.startsWith('https:');
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        // d3 and React set style attributes; no style sheet comes from elsewhere.
        'style-src': ["'self'", "'unsafe-inline'"],
        'img-src': ["'self'", 'data:', 'blob:'],
        'font-src': ["'self'"],
        'connect-src': ["'self'"],
        'object-src': ["'none'"],
        'base-uri': ["'self'"],
        'form-action': ["'self'"],
        'frame-ancestors': ["'none'"],
        ...(https ? { 'upgrade-insecure-requests': [] } : {}),
      },
    },
    strictTransportSecurity: https ? { maxAge: 15552000 } : false,
    frameguard: { action: 'deny' },
    crossOriginEmbedderPolicy: false,
  });
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests that a browser marks as coming from another site
 * (Sec-Fetch-Site) or that name a foreign Origin. With the SameSite=Strict cookie this
 * closes cross-site request forgery; clients that send neither header (curl, tests) pass.
 */
export function sameOriginWrites(config: Config): RequestHandler {
  const ownOrigin = new URL(config.PUBLIC_URL).origin;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const site = req.headers['sec-fetch-site'];
    if (site === 'cross-site') return next(forbidden('Cross-site requests are refused'));
    const origin = req.headers.origin;
    if (origin && origin !== 'null') {
      const host = req.headers.host;
      const sameHost = host !== undefined && (origin === `http://${host}` || origin === `https://${host}`);
      if (origin !== ownOrigin && !sameHost) return next(forbidden('Cross-site requests are refused'));
    } else if (origin === 'null') {
      return next(forbidden('Cross-site requests are refused'));
    }
    next();
  };
}
