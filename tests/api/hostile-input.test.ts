import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ALL_ROUTES } from '../../server/routes';
import { buildUser } from '../support/builders';
import { hostileBodies } from '../support/hostile-bodies';
import { concretePath, routeKey } from '../support/role-matrix';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let adminCookie: string;
beforeAll(async () => {
  stack = await startTestStack();
  const admin = await buildUser({ role: 'admin' });
  const response = await request(stack.app).post('/api/session').send({ email: admin.email, password: admin.password });
  adminCookie = String(response.headers['set-cookie']).split(';')[0];
});
afterAll(() => stack.close());

/** Answers must not leak internals: no stack frames, SQL, file paths or library names. */
const LEAK = /\bat \S+ \(|\/work\/|node_modules|\bSELECT\b|\bINSERT\b|\bUPDATE `|Sequelize|mariadb|ER_[A-Z_]+|\.ts:\d+/i;

// Sign-out takes no body and only clears a cookie; every other writing route is attacked.
const WRITING = ALL_ROUTES.filter((r) => r.method !== 'get' && routeKey(r) !== 'DELETE /api/session');
const BODIES_PER_ROUTE = 60;

describe('hostile request bodies on every writing route (seeded)', () => {
  it(`answers ${WRITING.length} routes × ${BODIES_PER_ROUTE} malformed bodies without a 5xx or a leak, and changes nothing`, async () => {
    const before = await tableCounts(stack.sequelize);
    const failures: string[] = [];
    const statuses = new Map<number, number>();
    let sent = 0;
    for (const [index, spec] of WRITING.entries()) {
      for (const body of hostileBodies(1000 + index, BODIES_PER_ROUTE)) {
        const call = (request(stack.app) as unknown as Record<string, (p: string) => request.Test>)[spec.method](concretePath(spec)).set('Cookie', adminCookie).set('Content-Type', body.contentType);
        const response = await call.send(body.payload as string);
        sent++;
        statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
        if (response.status >= 500) failures.push(`${routeKey(spec)} ${body.kind}: ${response.status} ${response.text.slice(0, 120)}`);
        if (LEAK.test(response.text)) failures.push(`${routeKey(spec)} ${body.kind}: leaks ${response.text.slice(0, 160)}`);
      }
    }
    expect(failures).toEqual([]);
    expect(sent).toBe(WRITING.length * BODIES_PER_ROUTE);
    expect(sent).toBeGreaterThan(1000);
    // Still up, and not a row added or removed anywhere.
    expect((await request(stack.app).get('/api/health')).status).toBe(200);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
    // Refusals, not successes: every answer was a 4xx.
    expect([...statuses.keys()].every((s) => s >= 400 && s < 500)).toBe(true);
  }, 240_000);
});
