import type { Request, Response, RequestHandler } from 'express';
import type { Transaction, Sequelize } from 'sequelize';
import type { z } from 'zod';
import type { Capability } from '../../shared/permissions';
import type { Config } from '../config';
import type { Mailer } from '../mail/mailer';
import type { User } from '../models';
import type { AuditInput } from '../models/audit-event';

/** Who may call a route: anyone, any signed-in user, or the roles holding a capability. */
export type Access = 'public' | 'signedIn' | Capability;

export type LimiterName = 'signInByAddress' | 'signInBackoff' | 'mailByAddress' | 'mailByAccount' | 'writes';

export interface AppDeps {
  config: Config;
  sequelize: Sequelize;
  mailer: Mailer;
}

export interface HandlerContext<B, Q, P> {
  req: Request;
  res: Response;
  /** The signed-in user; null only on public routes called without a session. */
  user: User | null;
  body: B;
  query: Q;
  params: P;
  /** Open for transactional routes (every non-GET by default), null otherwise. */
  transaction: Transaction | null;
  deps: AppDeps;
  ip: string;
  /** Adds an audit event in the route's transaction (or at once, outside one). */
  audit: (event: Omit<AuditInput, 'actorId' | 'ip'> & { actorId?: number | null }) => Promise<void>;
  /** Work to do once the transaction has committed (e.g. send mail); awaited before replying. */
  afterCommit: (task: () => Promise<void>) => void;
  /**
   * Work to start once the reply has gone out (after the commit). For side effects whose cost
   * must not show in the response time, such as a reset mail that would reveal a known address.
   */
  afterReply: (task: () => Promise<void>) => void;
}

export interface Reply {
  status?: number;
  body?: unknown;
}

/** A route's whole declaration; server/http/mount.ts turns it into the request pipeline. */
export interface RouteSpec<B = unknown, Q = unknown, P = unknown> {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  access: Access;
  summary: string;
  limiters?: LimiterName[];
  params?: z.ZodType<P>;
  query?: z.ZodType<Q>;
  body?: z.ZodType<B>;
  /** Middleware that reads a multipart body (multer); runs after authorisation. */
  upload?: (deps: AppDeps) => RequestHandler;
  /**
   * For upload routes: the record-level access check, run on the validated params before a
   * byte of the body is read (so a stranger's upload is refused without being buffered).
   */
  beforeUpload?: (ctx: { user: User; params: P; deps: AppDeps }) => Promise<void>;
  transactional?: boolean;
  /** Return a Reply to send JSON; return nothing when the handler wrote the response itself. */
  handler: (ctx: HandlerContext<B, Q, P>) => Promise<Reply | void>;
}

/** Declares a route with its types inferred from its schemas. */
export function route<B = undefined, Q = undefined, P = undefined>(spec: RouteSpec<B, Q, P>): RouteSpec {
  return spec as unknown as RouteSpec;
}
