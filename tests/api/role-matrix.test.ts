import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ROLES, type Role } from '../../shared/roles';
import { ALL_ROUTES } from '../../server/routes';
import { buildUser } from '../support/builders';
import { ANYONE, concretePath, expectedOutcome, routeKey, type Expectation } from '../support/role-matrix';
import { hostileSessionCookies } from '../support/session-tokens';
import { startTestStack, type TestStack } from '../support/test-stack';

const EVERY_ROLE: Expectation = ['admin', 'manager', 'formulator', 'scientist', 'viewer'];

/**
 * The declared allow-list, written out here on its own (not read from the routes), so
 * that a route whose declared access drifts from product.md fails this test. A new route
 * without an entry fails it too.
 */
const ALLOW: Record<string, Expectation> = {
  'GET /api/health': ANYONE,
  'POST /api/session': ANYONE,
  'GET /api/session': ANYONE,
  'DELETE /api/session': ANYONE,
  'POST /api/invitations': ['admin'],
  'POST /api/invitations/accept': ANYONE,
  'GET /api/invitations/:token': ANYONE,
  'POST /api/password-resets': ANYONE,
  'POST /api/password-resets/confirm': ANYONE,
  'GET /api/users': ['admin'],
  'PATCH /api/users/:id': ['admin'],
  'GET /api/audit-events': ['admin'],
  'GET /api/outbox': ['admin'],
  'GET /api/outbox/:id': ['admin'],
  ...programmes(),
  ...materials(),
  ...recipes(),
  ...observations(),
  ...shortlists(),
  'GET /api/map-points': EVERY_ROLE,
  ...calibrations(),
  ...plans(),
  ...checkSchedules(),
  'GET /api/programmes/:id/shelf-life': EVERY_ROLE,
};

function programmes(): Record<string, Expectation> {
  return {
    'GET /api/programmes': EVERY_ROLE,
    'GET /api/programmes/:id': EVERY_ROLE,
    'POST /api/programmes': ['admin', 'manager'],
    'PATCH /api/programmes/:id': ['admin', 'manager'],
    'POST /api/programmes/:id/archive': ['admin', 'manager'],
  };
}

/** The library is edited by formulators, managers and admins (issue: team data). */
function materials(): Record<string, Expectation> {
  const entries: Record<string, Expectation> = {};
  for (const kind of ['particles', 'depletants', 'solvents', 'salts']) {
    const base = `/api/materials/${kind}`;
    entries[`GET ${base}`] = EVERY_ROLE;
    entries[`GET ${base}/:id`] = EVERY_ROLE;
    entries[`POST ${base}`] = ['admin', 'manager', 'formulator'];
    entries[`PUT ${base}/:id`] = ['admin', 'manager', 'formulator'];
    entries[`POST ${base}/:id/archive`] = ['admin', 'manager', 'formulator'];
    entries[`POST ${base}/:id/restore`] = ['admin', 'manager', 'formulator'];
  }
  return entries;
}

function recipes(): Record<string, Expectation> {
  return {
    'GET /api/recipes': EVERY_ROLE,
    'GET /api/recipes/code/:code': EVERY_ROLE,
    'GET /api/recipes/:id': EVERY_ROLE,
    'POST /api/recipes': ['admin', 'formulator'],
    'PUT /api/recipes/:id': ['admin', 'formulator'],
    'POST /api/recipes/:id/archive': ['admin', 'formulator'],
    'POST /api/recipes/:id/restore': ['admin', 'formulator'],
  };
}

function observations(): Record<string, Expectation> {
  return {
    'GET /api/observations': EVERY_ROLE,
    'GET /api/observations/export': EVERY_ROLE,
    'GET /api/observations/:id': EVERY_ROLE,
    'POST /api/observations': ['admin', 'scientist'],
    'PUT /api/observations/:id': ['admin', 'scientist'],
    'POST /api/observations/:id/archive': ['admin', 'scientist'],
    'POST /api/observations/import': ['admin', 'scientist'],
    'POST /api/observations/:id/attachments': ['admin', 'scientist'],
    'GET /api/attachments/:id': EVERY_ROLE,
    'POST /api/attachments/:id/archive': ['admin', 'scientist'],
  };
}

function shortlists(): Record<string, Expectation> {
  return {
    'GET /api/shortlists': EVERY_ROLE,
    'GET /api/shortlists/:id': EVERY_ROLE,
    'POST /api/shortlists': ['admin', 'formulator'],
    'PUT /api/shortlists/:id': ['admin', 'formulator'],
    'POST /api/shortlists/:id/submit': ['admin', 'formulator'],
    'POST /api/shortlists/:id/reopen': ['admin', 'formulator'],
    'POST /api/shortlists/:id/archive': ['admin', 'formulator'],
    'POST /api/shortlists/:id/approve': ['admin', 'manager'],
    'POST /api/shortlists/:id/return': ['admin', 'manager'],
  };
}

/** Anyone who works with the data may fit; managers and admins decide (shared/permissions). */
function calibrations(): Record<string, Expectation> {
  return {
    'GET /api/programmes/:id/calibrations': EVERY_ROLE,
    'GET /api/programmes/:id/calibrations/:calibrationId': EVERY_ROLE,
    'POST /api/programmes/:id/calibrations': ['admin', 'manager', 'formulator', 'scientist'],
    'POST /api/programmes/:id/calibrations/:calibrationId/accept': ['admin', 'manager'],
    'POST /api/programmes/:id/calibrations/withdraw': ['admin', 'manager'],
  };
}

/** Formulators and admins run the planner and make recipes from plans; everyone reads them (issue: planner). */
function plans(): Record<string, Expectation> {
  return {
    'GET /api/plans': EVERY_ROLE,
    'GET /api/plans/:id': EVERY_ROLE,
    'POST /api/plans': ['admin', 'formulator'],
    'POST /api/plans/:id/recipes': ['admin', 'formulator'],
    'POST /api/plans/:id/next-experiments/recipes': ['admin', 'formulator'],
  };
}

/** Whoever records bench outcomes sets when samples are checked; everyone sees what is due (issue: shelf life). */
function checkSchedules(): Record<string, Expectation> {
  return {
    'GET /api/recipes/:id/check-schedule': EVERY_ROLE,
    'PUT /api/recipes/:id/check-schedule': ['admin', 'scientist'],
    'GET /api/due-checks': EVERY_ROLE,
  };
}

let stack: TestStack;
const cookies = {} as Record<Role, string>;
let hostile: ReturnType<typeof hostileSessionCookies>;

beforeAll(async () => {
  stack = await startTestStack({ env: { SIGNIN_LIMIT_PER_ADDRESS: '100000', SIGNIN_LIMIT_PER_ACCOUNT: '100000' } });
  for (const role of ROLES) {
    const who = await buildUser({ role });
    const response = await request(stack.app).post('/api/session').send({ email: who.email, password: who.password });
    cookies[role] = String(response.headers['set-cookie']).split(';')[0];
  }
  const admin = await buildUser({ role: 'admin' });
  hostile = hostileSessionCookies(stack.config, admin.user.id);
});
afterAll(() => stack.close());

function call(method: string, path: string, cookie?: string) {
  const agent = request(stack.app);
  const req = (agent as unknown as Record<string, (p: string) => request.Test>)[method](path);
  if (cookie) req.set('Cookie', cookie);
  return method === 'get' || method === 'delete' ? req : req.send({});
}

describe('role matrix', () => {
  it('has a declared expectation for every route, and every declared route exists', () => {
    const actual = ALL_ROUTES.map(routeKey).sort();
    expect(actual).toEqual(Object.keys(ALLOW).sort());
  });

  it('answers every route × every role and anonymous callers as declared', async () => {
    const mismatches: string[] = [];
    let checked = 0;
    // Signing out ends every session of the user, so that route is asked last.
    const signOutLast = [...ALL_ROUTES.filter((r) => routeKey(r) !== 'DELETE /api/session'), ...ALL_ROUTES.filter((r) => routeKey(r) === 'DELETE /api/session')];
    for (const spec of signOutLast) {
      const expectation = ALLOW[routeKey(spec)];
      for (const caller of ['anonymous', ...ROLES] as const) {
        const response = await call(spec.method, concretePath(spec), caller === 'anonymous' ? undefined : cookies[caller]);
        const wanted = expectedOutcome(expectation, caller);
        const got = response.status === 401 || response.status === 403 ? response.status : 'allowed';
        if (got !== wanted) mismatches.push(`${routeKey(spec)} as ${caller}: wanted ${wanted}, got ${response.status}`);
        if (response.status >= 500) mismatches.push(`${routeKey(spec)} as ${caller}: server error ${response.status}`);
        checked++;
      }
    }
    expect(mismatches).toEqual([]);
    expect(checked).toBe(ALL_ROUTES.length * (ROLES.length + 1));
  });

  it('treats expired, tampered, alg-none and foreign tokens as no session on every non-public route', async () => {
    const mismatches: string[] = [];
    for (const spec of ALL_ROUTES) {
      if (ALLOW[routeKey(spec)] === ANYONE) continue;
      for (const [kind, cookie] of Object.entries(hostile)) {
        const response = await call(spec.method, concretePath(spec), cookie);
        if (response.status !== 401) mismatches.push(`${routeKey(spec)} with ${kind} token: ${response.status}`);
      }
    }
    expect(mismatches).toEqual([]);
  });
});
