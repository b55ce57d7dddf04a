import type { Role } from '../../shared/roles';
import type { RouteSpec } from '../../server/http/route';

export type Expectation = 'public' | 'signedIn' | readonly Role[];

export const ANYONE: Expectation = 'public';
export const SIGNED_IN: Expectation = 'signedIn';

/** The path with every :param replaced by a well-formed value that names no record. */
export function concretePath(spec: RouteSpec): string {
  return spec.path
    .replace(/:token\b/g, 'a'.repeat(43))
    .replace(/:code\b/g, 'ZZ-9999')
    .replace(/:[a-zA-Z]+/g, '999999999');
}

export const routeKey = (spec: Pick<RouteSpec, 'method' | 'path'>) => `${spec.method.toUpperCase()} ${spec.path}`;

/** What a caller should see: allowed (anything but 401/403), 401 or 403. */
export function expectedOutcome(expectation: Expectation, caller: Role | 'anonymous'): 'allowed' | 401 | 403 {
  if (expectation === 'public') return 'allowed';
  if (caller === 'anonymous') return 401;
  if (expectation === 'signedIn') return 'allowed';
  return expectation.includes(caller) ? 'allowed' : 403;
}
