import helmet from 'helmet';
import type { RequestHandler } from 'express';
import type { Config } from '../config';
import { forbidden, misdirected } from '../errors';

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
const LOOPBACK_HOSTS = ['127.0.0.1', 'localhost', '[::1]'];

/** The host name of a Host header, lower-cased, without its port ("[::1]:4180" → "[::1]"). */
export function hostNameOf(host: string): string {
  const lower = host.trim().toLowerCase();
  if (lower.startsWith('[')) return lower.slice(0, lower.indexOf(']') + 1);
  return lower.split(':')[0];
}

/**
 * Answers only for PUBLIC_URL's host name, loopback and ALLOWED_HOSTS. A DNS-rebinding page
 * reaches the server under the attacker's own host name, so it is refused here before any route.
 */
export function knownHostsOnly(config: Config): RequestHandler {
  const known = new Set([new URL(config.PUBLIC_URL).hostname.toLowerCase(), ...LOOPBACK_HOSTS]);
  for (const extra of config.ALLOWED_HOSTS.split(',')) if (extra.trim()) known.add(hostNameOf(extra));
  return (req, _res, next) => {
    const host = req.headers.host;
    if (!host || !known.has(hostNameOf(host))) return next(misdirected());
    next();
  };
}

/**
 * Refuses state-changing requests that a browser marks as coming from anywhere but this origin
 * (Sec-Fetch-Site cross-site or same-site: a sibling subdomain is another party) or whose Origin
 * is not PUBLIC_URL's. The Host header is never trusted for this: a rebinding page controls it.
 * With the SameSite=Strict cookie this closes cross-site request forgery; clients that send
 * neither header (curl, tests) pass.
 */
export function sameOriginWrites(config: Config): RequestHandler {
  const ownOrigin = new URL(config.PUBLIC_URL).origin;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const site = req.headers['sec-fetch-site'];
    if (site === 'cross-site' || site === 'same-site') return next(forbidden('Cross-site requests are refused'));
    const origin = req.headers.origin;
    if (origin !== undefined && origin !== ownOrigin) return next(forbidden('Cross-site requests are refused'));
    next();
  };
}
