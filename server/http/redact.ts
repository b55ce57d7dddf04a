/** A request path fit for a log line: one-time link tokens in the path are masked. */
export function redactPath(path: string): string {
  return path.replace(/(\/api\/invitations\/)[A-Za-z0-9_-]{20,}/g, '$1(token)').replace(/([?&]token=)[^&]+/g, '$1(token)');
}
