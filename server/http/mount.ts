import type { Express, NextFunction, Request, RequestHandler, Response } from 'express';
import { can } from '../../shared/permissions';
import { badRequest, forbidden, payloadTooLarge, unauthorized, unsupportedMediaType } from '../errors';
import { recordAudit } from '../models/audit-event';
import { currentUser } from './authenticate';
import type { AppDeps, HandlerContext, LimiterName, RouteSpec } from './route';
import { parseOrThrow } from './validate';

type Limiters = Record<LimiterName, RequestHandler>;

/**
 * Turns each declaration into one Express route whose pipeline always reads:
 * rate limits → authenticate → authorise (role) → upload → validate → transaction → handler.
 */
export function mountRoutes(app: Express, specs: RouteSpec[], deps: AppDeps, limiters: Limiters) {
  for (const spec of specs) {
    const chain: RequestHandler[] = (spec.limiters ?? []).map((name) => limiters[name]);
    chain.push(authenticateAndAuthorise(spec, deps));
    if (spec.upload) {
      chain.push(accessBeforeUpload(spec, deps));
      chain.push(readableUpload(spec.upload(deps), deps.config.UPLOAD_MAX_REQUEST_BYTES));
    }
    chain.push(runHandler(spec, deps));
    app[spec.method](spec.path, ...chain);
  }
}

/** Validates the params and runs the route's record-level check before the body is read. */
function accessBeforeUpload(spec: RouteSpec, deps: AppDeps): RequestHandler {
  return async (req, res, next) => {
    try {
      const params = spec.params ? parseOrThrow(spec.params, req.params, 'params') : undefined;
      if (spec.beforeUpload) await spec.beforeUpload({ user: res.locals.user, params, deps });
      next();
    } catch (error) {
      refuseUnreadBody(req, res);
      next(error);
    }
  };
}

/** The answer goes out without reading the rest of the body; the connection closes after it. */
function refuseUnreadBody(req: Request, res: Response) {
  res.setHeader('Connection', 'close');
  res.once('finish', () => req.destroy());
}

/**
 * Reads a multipart body with multer, cut off at `maxBytes` for the whole request: a declared
 * length above it is refused before reading, and a body that grows past it while streaming is
 * dropped there. Multer reports its own limits as MulterError (the error middleware maps those);
 * anything else it throws means the body could not be read: a 400, not a 500.
 */
function readableUpload(upload: RequestHandler, maxBytes: number): RequestHandler {
  const tooLarge = () => payloadTooLarge(`The upload is larger than ${Math.round(maxBytes / 1024 / 1024)} MB in all`);
  return (req, res, next) => {
    let done = false;
    const finish = (error?: unknown) => {
      if (done) return;
      done = true;
      next(error);
    };
    if (Number(req.headers['content-length'] ?? 0) > maxBytes) {
      refuseUnreadBody(req, res);
      return finish(tooLarge());
    }
    let seen = 0;
    const count = (chunk: Buffer) => {
      seen += chunk.length;
      if (seen <= maxBytes) return;
      req.off('data', count);
      req.unpipe();
      refuseUnreadBody(req, res);
      finish(tooLarge());
    };
    req.on('data', count);
    upload(req, res, (error?: unknown) => {
      req.off('data', count);
      if (!error || (error as { name?: string }).name === 'MulterError') return finish(error);
      finish(badRequest(`The upload could not be read: ${String((error as Error).message ?? error).slice(0, 120)}`, 'files'));
    });
  };
}

function authenticateAndAuthorise(spec: RouteSpec, deps: AppDeps): RequestHandler {
  return async (req, res, next) => {
    try {
      const user = await currentUser(deps.config, req, res);
      if (spec.access !== 'public') {
        if (!user) throw unauthorized();
        if (spec.access !== 'signedIn' && !can(user.role, spec.access)) throw forbidden();
      }
      res.locals.user = user;
      next();
    } catch (error) {
      next(error);
    }
  };
}

function runHandler(spec: RouteSpec, deps: AppDeps): RequestHandler {
  const transactional = spec.transactional ?? spec.method !== 'get';
  return async (req: Request, res: Response, next: NextFunction) => {
    try {
      const params = spec.params ? parseOrThrow(spec.params, req.params, 'params') : undefined;
      const query = spec.query ? parseOrThrow(spec.query, req.query, 'query') : undefined;
      const body = spec.body && !spec.upload ? parseJsonBody(spec, req) : spec.upload ? req.body : undefined;
      const tasks: (() => Promise<void>)[] = [];
      const replyTasks: (() => Promise<void>)[] = [];
      const ctx: HandlerContext<unknown, unknown, unknown> = {
        req,
        res,
        user: res.locals.user ?? null,
        body,
        query,
        params,
        transaction: null,
        deps,
        ip: req.ip ?? '',
        audit: (event) =>
          recordAudit({ actorId: ctx.user?.id ?? null, ip: ctx.ip, ...event }, ctx.transaction ?? undefined),
        afterCommit: (task) => void tasks.push(task),
        afterReply: (task) => void replyTasks.push(task),
      };
      const reply = transactional
        ? await deps.sequelize.transaction(async (transaction) => {
            ctx.transaction = transaction;
            return spec.handler(ctx);
          })
        : await spec.handler(ctx);
      ctx.transaction = null;
      for (const task of tasks) {
        // The write is committed: a failed side effect (mail) is logged, never undoes it.
        await task().catch((error: Error) => console.warn(`after-commit task failed: ${error.message}`));
      }
      if (reply && !res.headersSent) res.status(reply.status ?? 200).json(reply.body ?? null);
      runAfterReply(replyTasks);
    } catch (error) {
      next(error);
    }
  };
}

/** Started once the reply is on its way; a failure is logged, the committed write stands. */
function runAfterReply(tasks: (() => Promise<void>)[]) {
  if (tasks.length === 0) return;
  setImmediate(async () => {
    for (const task of tasks) await task().catch((error: Error) => console.warn(`after-reply task failed: ${error.message}`));
  });
}

function parseJsonBody(spec: RouteSpec, req: Request) {
  const hasBody = Number(req.headers['content-length'] ?? 0) > 0 || req.headers['transfer-encoding'] !== undefined;
  if (hasBody && !req.is('application/json')) throw unsupportedMediaType();
  if (req.body === undefined || req.body === null || typeof req.body !== 'object' || Array.isArray(req.body)) {
    throw badRequest('body: send a JSON object', 'body');
  }
  return parseOrThrow(spec.body!, req.body, 'body');
}
