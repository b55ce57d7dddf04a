/**
 * Errors the API answers with. Each factory sets the HTTP status, a stable id that
 * clients and tests can rely on, a message safe to show, and whether to report it.
 */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly id: string,
    message: string,
    readonly extra: { field?: string; issues?: { path: string; message: string }[]; [key: string]: unknown } = {},
    readonly report = false,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, field?: string, issues?: { path: string; message: string }[]) =>
  new HttpError(400, 'invalid_input', message, { field, issues });
export const unauthorized = (message = 'Sign in first') => new HttpError(401, 'not_signed_in', message);
export const forbidden = (message = 'Your role may not do this') => new HttpError(403, 'forbidden', message);
export const misdirected = (message = 'This server does not answer for that host name') =>
  new HttpError(421, 'unknown_host', message);
export const notFound = (what = 'Record') => new HttpError(404, 'not_found', `${what} not found`);
export const conflict = (message: string, extra: Record<string, unknown> = {}) =>
  new HttpError(409, 'conflict', message, extra);
export const payloadTooLarge = (message = 'The request is too large') => new HttpError(413, 'too_large', message);
export const unsupportedMediaType = (message = 'Send JSON with Content-Type: application/json') =>
  new HttpError(415, 'unsupported_media_type', message);
export const tooManyRequests = (message = 'Too many attempts; wait a few minutes and try again') =>
  new HttpError(429, 'too_many_requests', message);
export const serviceUnavailable = (message = 'The database is not reachable just now; try again shortly') =>
  new HttpError(503, 'unavailable', message, {}, true);
export const internal = () => new HttpError(500, 'internal', 'Something went wrong on the server', {}, true);
