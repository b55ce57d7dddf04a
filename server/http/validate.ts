import type { z } from 'zod';
import { badRequest } from '../errors';

/** A UTF-16 surrogate without its partner: valid in JSON's \u escapes, not text anything can store. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** The path of the first string (or key) holding a lone surrogate, or null. */
export function loneSurrogatePath(value: unknown, path: string[] = []): string[] | null {
  if (typeof value === 'string') return LONE_SURROGATE.test(value) ? path : null;
  if (value === null || typeof value !== 'object') return null;
  for (const [key, inner] of Object.entries(value)) {
    if (LONE_SURROGATE.test(key)) return [...path, key];
    const found = loneSurrogatePath(inner, [...path, key]);
    if (found) return found;
  }
  return null;
}

/** Parses one part of a request; the first issue names the field in the message. */
export function parseOrThrow<T>(schema: z.ZodType<T>, value: unknown, part: 'body' | 'query' | 'params'): T {
  const broken = loneSurrogatePath(value);
  if (broken) {
    const field = broken.join('.') || part;
    throw badRequest(`${field}: contains a broken character (a lone UTF-16 surrogate); send valid Unicode text`, field);
  }
  const result = schema.safeParse(value ?? (part === 'body' ? undefined : {}));
  if (result.success) return result.data;
  const issues = result.error.issues.map((issue) => ({
    path: issue.path.map(String).join('.') || part,
    message: issue.message,
  }));
  const first = issues[0];
  const message = first.path === part ? `${part}: ${first.message}` : `${first.path}: ${first.message}`;
  throw badRequest(message, first.path, issues);
}
