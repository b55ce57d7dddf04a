import type { z } from 'zod';
import { badRequest } from '../errors';

/** Parses one part of a request; the first issue names the field in the message. */
export function parseOrThrow<T>(schema: z.ZodType<T>, value: unknown, part: 'body' | 'query' | 'params'): T {
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
