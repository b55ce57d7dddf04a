import type { ErrorRequestHandler } from 'express';
import { randomUUID } from 'node:crypto';
import { redactPath } from './redact';
import { HttpError, badRequest, conflict, internal, payloadTooLarge, serviceUnavailable, unsupportedMediaType } from '../errors';

/**
 * The one place errors become responses: { error: { id, message, field?, issues? } }.
 * Never a stack trace, SQL or a path; unexpected errors are logged with a reference.
 */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const httpError = toHttpError(error);
  if (httpError.status >= 500) {
    const reference = randomUUID().slice(0, 8);
    if (httpError.report) console.error(`[${reference}] ${req.method} ${redactPath(req.path)}: ${describe(error)}`);
    httpError.extra.reference = reference;
  }
  if (res.headersSent) return res.end();
  if (httpError.status === 503) res.setHeader('Retry-After', '2');
  res.status(httpError.status).json({ error: { id: httpError.id, message: httpError.message, ...clean(httpError.extra) } });
};

function toHttpError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  const e = error as { type?: string; code?: string; name?: string; status?: number; original?: { code?: string; fatal?: boolean }; errors?: { path?: string; message?: string }[] };
  // body-parser
  if (e.type === 'entity.too.large') return payloadTooLarge();
  if (e.type === 'entity.parse.failed') return badRequest('body: not valid JSON', 'body');
  if (e.type === 'encoding.unsupported' || e.type === 'charset.unsupported') return unsupportedMediaType('Send UTF-8 JSON');
  if (e.type === 'entity.verify.failed' || e.type === 'request.aborted') return badRequest('The request body could not be read', 'body');
  if (e.type === 'parameters.too.many') return payloadTooLarge('Too many parameters');
  // multer
  if (e.name === 'MulterError') {
    if (e.code === 'LIMIT_FILE_SIZE') return payloadTooLarge('The file is larger than the upload limit');
    if (e.code === 'LIMIT_FILE_COUNT') return badRequest('Too many files in one upload', 'files');
    return badRequest(`Upload refused: ${e.code?.toLowerCase().replaceAll('_', ' ')}`, 'files');
  }
  // Sequelize / MariaDB
  if (isDatabaseUnavailable(e)) return serviceUnavailable();
  // Two transactions wanted the same rows at once (a deadlock, a lock wait that ran out, or a
  // Galera certification failure): nothing was written; the client may simply try again.
  if (e.original?.code === 'ER_LOCK_DEADLOCK' || e.original?.code === 'ER_LOCK_WAIT_TIMEOUT') {
    return conflict('Someone changed the same record at the same moment; nothing was saved, try again', { retry: true });
  }
  if (e.name === 'SequelizeUniqueConstraintError') return conflict('A record with these values exists already');
  if (e.name === 'SequelizeValidationError') {
    const first = e.errors?.[0];
    return badRequest(`${first?.path ?? 'body'}: ${first?.message ?? 'invalid value'}`, first?.path);
  }
  if (e.name === 'SequelizeForeignKeyConstraintError') return conflict('A related record is missing or still in use');
  if (e.status && e.status >= 400 && e.status < 500) return new HttpError(e.status, 'bad_request', 'The request could not be read');
  return internal();
}

const UNAVAILABLE_NAMES = new Set([
  'SequelizeConnectionError',
  'SequelizeConnectionRefusedError',
  'SequelizeConnectionAcquireTimeoutError',
  'SequelizeConnectionTimedOutError',
  'SequelizeHostNotReachableError',
  'SequelizeAccessDeniedError',
]);
const UNAVAILABLE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ER_SOCKET_UNEXPECTED_CLOSE', 'ER_CONNECTION_TIMEOUT', 'ER_GET_CONNECTION_TIMEOUT', 'ER_CMD_CONNECTION_CLOSED', 'ER_SERVER_SHUTDOWN', 'EPIPE', 'ETIMEDOUT', 'ER_SOCKET_TIMEOUT', 'ER_POOL_ALREADY_CLOSED']);

export function isDatabaseUnavailable(e: { name?: string; original?: { code?: string; fatal?: boolean }; code?: string }): boolean {
  if (e.name && UNAVAILABLE_NAMES.has(e.name)) return true;
  const code = e.original?.code ?? e.code;
  if (code && UNAVAILABLE_CODES.has(code)) return true;
  return e.original?.fatal === true;
}

function describe(error: unknown) {
  return error instanceof Error ? `${error.name}: ${error.message}\n${error.stack ?? ''}` : String(error);
}

function clean(extra: Record<string, unknown>) {
  return Object.fromEntries(Object.entries(extra).filter(([, v]) => v !== undefined));
}
