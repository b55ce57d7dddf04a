import express, { type Express } from 'express';
import cookieParser from 'cookie-parser';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { LIMITS } from '../shared/limits';
import { notFound } from './errors';
import { errorHandler } from './http/error-handler';
import { createLimiters } from './http/limiters';
import { mountRoutes } from './http/mount';
import { redactPath } from './http/redact';
import type { AppDeps } from './http/route';
import { knownHostsOnly, sameOriginWrites, securityHeaders } from './http/security';
import { ALL_ROUTES } from './routes';

export interface CreateAppOptions {
  /** Folder of the built client (vite build); served with a fallback to index.html. */
  clientDir?: string;
}

/** The whole HTTP surface: the JSON API under /api and the built client for everything else. */
export function createApp(deps: AppDeps, options: CreateAppOptions = {}): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.config.TRUST_PROXY ? 1 : false);
  app.set('etag', false);
  app.use(securityHeaders(deps.config));
  app.use(knownHostsOnly(deps.config));
  if (deps.config.LOG_REQUESTS) {
    app.use((req, res, next) => {
      const started = performance.now();
      res.on('finish', () => console.log(`${req.method} ${redactPath(req.originalUrl)} ${res.statusCode} ${(performance.now() - started).toFixed(1)} ms`));
      next();
    });
  }
  app.use('/api', express.json({ limit: LIMITS.jsonBodyBytes, strict: true, type: 'application/json' }));
  app.use('/api', cookieParser());
  app.use('/api', sameOriginWrites(deps.config));
  // API answers hold team data: never kept by a browser or proxy cache unless a route says
  // otherwise (the map overlay revalidates with its ETag; attachments are files).
  app.use('/api', (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });

  mountRoutes(app, ALL_ROUTES, deps, createLimiters(deps.config));
  app.use('/api', (_req, _res, next) => next(notFound('API route')));

  const clientDir = resolve(options.clientDir ?? 'dist');
  if (existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h', setHeaders: noCacheForHtml }));
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(join(clientDir, 'index.html'));
    });
  }
  app.use(errorHandler);
  return app;
}

function noCacheForHtml(res: express.Response, path: string) {
  if (path.endsWith('.html')) res.setHeader('Cache-Control', 'no-cache');
  else if (path.includes('/assets/')) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
}
