import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { buildUser, signedInAgent } from '../support/builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let admin: Awaited<ReturnType<typeof signedInAgent>>;
let adminId: number;
beforeAll(async () => {
  stack = await startTestStack({ env: { SIGNIN_LIMIT_PER_ADDRESS: '1000', SIGNIN_LIMIT_PER_ACCOUNT: '1000' } });
  const who = await buildUser({ role: 'admin' });
  adminId = who.user.id;
  admin = await signedInAgent(stack.app, who);
});
afterAll(() => stack.close());

const leaks = /at \w+ \(|\/work\/|node_modules|SELECT |INSERT |Sequelize|stack/i;

describe('bad input to writing routes', () => {
  const cases: { name: string; send: (a: typeof admin) => request.Test; status: number; field?: string }[] = [
    { name: 'invitation without an e-mail', send: (a) => a.post('/api/invitations').send({ name: 'No Mail', role: 'viewer' }), status: 400, field: 'email' },
    { name: 'invitation with a number as name', send: (a) => a.post('/api/invitations').send({ email: 'n@test.example', name: 42, role: 'viewer' }), status: 400, field: 'name' },
    { name: 'invitation with an unknown role', send: (a) => a.post('/api/invitations').send({ email: 'r@test.example', name: 'Role X', role: 'owner' }), status: 400, field: 'role' },
    { name: 'invitation with a malformed e-mail', send: (a) => a.post('/api/invitations').send({ email: 'not-an-address', name: 'Bad Mail', role: 'viewer' }), status: 400, field: 'email' },
    { name: 'a JSON array instead of an object', send: (a) => a.post('/api/invitations').send([1, 2, 3]), status: 400, field: 'body' },
    { name: 'truncated JSON', send: (a) => a.post('/api/invitations').set('Content-Type', 'application/json').send('{"email": "a@b.c", "name": '), status: 400, field: 'body' },
    { name: 'a form post instead of JSON', send: (a) => a.post('/api/invitations').type('form').send('email=a@b.c&name=x&role=viewer'), status: 415 },
    { name: 'plain text instead of JSON', send: (a) => a.post('/api/invitations').set('Content-Type', 'text/plain').send('hello'), status: 415 },
    { name: 'a 200 kB body', send: (a) => a.post('/api/invitations').send({ email: 'big@test.example', name: 'x'.repeat(200_000), role: 'viewer' }), status: 413 },
    { name: 'user update with a string for active', send: (a) => a.patch(`/api/users/${adminId}`).send({ active: 'no' }), status: 400, field: 'active' },
    { name: 'user update with an unknown field', send: (a) => a.patch(`/api/users/${adminId}`).send({ passwordHash: 'x' }), status: 400 },
    { name: 'user update on a non-numeric id', send: (a) => a.patch('/api/users/abc').send({ role: 'viewer' }), status: 400, field: 'id' },
    { name: 'user update on an unknown id', send: (a) => a.patch('/api/users/99999999').send({ role: 'viewer' }), status: 404 },
    { name: 'sign-in with a number as password', send: (a) => a.post('/api/session').send({ email: 'x@test.example', password: 12345 }), status: 400, field: 'password' },
    { name: 'reset confirm with a damaged token', send: (a) => a.post('/api/password-resets/confirm').send({ token: '../../etc/passwd', password: 'long-enough-pass' }), status: 400, field: 'token' },
    { name: 'paging beyond the cap', send: (a) => a.get('/api/users?pageSize=100000'), status: 400, field: 'pageSize' },
  ];

  for (const c of cases) {
    it(`answers ${c.name} with ${c.status}, a message, no internals, and writes nothing`, async () => {
      const before = await tableCounts(stack.sequelize);
      const response = await c.send(admin);
      expect(response.status).toBe(c.status);
      expect(typeof response.body.error?.message).toBe('string');
      if (c.field) {
        expect(response.body.error.field).toBe(c.field);
        expect(response.body.error.message).toContain(c.field);
      }
      expect(JSON.stringify(response.body)).not.toMatch(leaks);
      const after = await tableCounts(stack.sequelize);
      // Reads of the session may touch nothing; audit counts included.
      expect(after).toEqual(before);
    });
  }

  it('answers an unknown API path with a JSON 404', async () => {
    const response = await admin.get('/api/nothing-here');
    expect(response.status).toBe(404);
    expect(response.body.error.id).toBe('not_found');
  });
});
