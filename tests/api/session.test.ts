import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { AuditEvent, User } from '../../server/models';
import { bcryptCost } from '../../server/services/passwords';
import { buildUser, linkIn, mailArrivingFor, signedInAgent, uniqueEmail } from '../support/builders';
import { hostileSessionCookies } from '../support/session-tokens';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
beforeAll(async () => {
  stack = await startTestStack();
});
afterAll(() => stack.close());

describe('POST /api/session', () => {
  it('signs in with the right password, sets an httpOnly SameSite=Strict cookie and audits it', async () => {
    const who = await buildUser({ role: 'formulator' });
    const response = await request(stack.app).post('/api/session').send({ email: who.email, password: who.password });
    expect(response.status).toBe(201);
    expect(response.body.user).toMatchObject({ email: who.email, role: 'formulator' });
    expect(JSON.stringify(response.body)).not.toMatch(/passwordHash|\$2[aby]\$/);
    const cookie = String(response.headers['set-cookie']);
    expect(cookie).toMatch(/^gw_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Strict/i);
    expect(cookie).not.toMatch(/Secure/); // served over plain HTTP in the test
    const events = await AuditEvent.count({ where: { action: 'session.signed_in', entityId: String(who.user.id) } });
    expect(events).toBe(1);
  });

  it('accepts the e-mail in any letter case and with spaces around it', async () => {
    const who = await buildUser({ role: 'viewer' });
    const response = await request(stack.app).post('/api/session').send({ email: `  ${who.email.toUpperCase()} `, password: who.password });
    expect(response.status).toBe(201);
  });

  it('answers a wrong password and an unknown e-mail with the same 401 and audits both', async () => {
    const who = await buildUser({ role: 'scientist' });
    const wrong = await request(stack.app).post('/api/session').send({ email: who.email, password: 'not-the-password' });
    const unknownEmail = uniqueEmail('nobody');
    const unknown = await request(stack.app).post('/api/session').send({ email: unknownEmail, password: 'whatever-it-is' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.headers['set-cookie']).toBeUndefined();
    const failed = await AuditEvent.findAll({ where: { action: 'session.sign_in_failed' } });
    const mine = failed.filter((e) => [who.email, unknownEmail].includes(String(e.details?.email)));
    expect(mine).toHaveLength(2);
  });

  it('refuses a deactivated account with the same answer as a wrong password', async () => {
    const who = await buildUser({ role: 'viewer', active: false });
    const response = await request(stack.app).post('/api/session').send({ email: who.email, password: who.password });
    expect(response.status).toBe(401);
    expect(response.body.error.message).toBe('E-mail or password is wrong');
  });

  it('stores bcrypt hashes with a cost of 10 or more', async () => {
    const who = await buildUser({ role: 'viewer' });
    const stored = await User.findByPk(who.user.id);
    expect(bcryptCost(stored!.passwordHash!)).toBeGreaterThanOrEqual(10);
  });
});

describe('sign-in rate limits', () => {
  it('after 5 failed sign-ins from one address, that address waits (1 s, then 2 s …) while the owner signs in from another at once', async () => {
    const app = stack.appWith({ TRUST_PROXY: 'true' });
    const who = await buildUser({ role: 'formulator' });
    const fromGuesser = () => request(app).post('/api/session').set('X-Forwarded-For', '203.0.113.7');
    for (let i = 0; i < 5; i++) expect((await fromGuesser().send({ email: who.email, password: `wrong-${i}` })).status).toBe(401);
    const slowed = await fromGuesser().send({ email: who.email, password: `wrong-again` });
    expect(slowed.status).toBe(429);
    expect(slowed.body.error.message).toMatch(/wait 1 s/);
    expect(slowed.headers['retry-after']).toBe('1');
    // The owner, elsewhere, is not locked out.
    const owner = await request(app).post('/api/session').set('X-Forwarded-For', '198.51.100.20').send({ email: who.email, password: who.password });
    expect(owner.status).toBe(201);
    // After the wait the guesser may try once more, and a failure doubles the wait.
    await new Promise((done) => setTimeout(done, 1100));
    expect((await fromGuesser().send({ email: who.email, password: 'wrong-6' })).status).toBe(401);
    const doubled = await fromGuesser().send({ email: who.email, password: 'wrong-7' });
    expect(doubled.status).toBe(429);
    expect(doubled.body.error.message).toMatch(/wait 2 s/);
  });

  it('limits failed sign-ins per address across many accounts, the same for unknown e-mails', async () => {
    const limited = stack.appWith({ SIGNIN_LIMIT_PER_ADDRESS: '4' });
    const answers = [];
    for (let i = 0; i < 5; i++) {
      answers.push((await request(limited).post('/api/session').send({ email: uniqueEmail('spray'), password: 'guess-guess' })).status);
    }
    expect(answers).toEqual([401, 401, 401, 401, 429]);
  });
});

describe('GET /api/session and DELETE /api/session', () => {
  it('returns the signed-in user without the password hash', async () => {
    const who = await buildUser({ role: 'manager' });
    const agent = await signedInAgent(stack.app, who);
    const response = await agent.get('/api/session');
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ id: who.user.id, role: 'manager', invitationPending: false });
    expect(Object.keys(response.body.user)).not.toContain('passwordHash');
  });

  it('answers a visitor with no user, not an error', async () => {
    const response = await request(stack.app).get('/api/session');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ user: null });
  });

  it('signs out: the cookie is cleared and the next request is anonymous', async () => {
    const who = await buildUser({ role: 'viewer' });
    const agent = await signedInAgent(stack.app, who);
    const out = await agent.delete('/api/session');
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(/gw_session=;/);
    expect((await agent.get('/api/session')).body.user).toBeNull();
  });

  it('refuses expired, tampered, alg-none and foreign tokens', async () => {
    const who = await buildUser({ role: 'admin' });
    const cookies = hostileSessionCookies(stack.config, who.user.id);
    for (const [kind, cookie] of Object.entries(cookies)) {
      const response = await request(stack.app).get('/api/session').set('Cookie', cookie);
      expect(response.body.user, kind).toBeNull();
      // …and a route that needs a session refuses it.
      expect((await request(stack.app).get('/api/users').set('Cookie', cookie)).status, kind).toBe(401);
    }
  });

  it('ends the session of a user who was deactivated after signing in', async () => {
    const who = await buildUser({ role: 'scientist' });
    const agent = await signedInAgent(stack.app, who);
    await User.update({ active: false }, { where: { id: who.user.id } });
    expect((await agent.get('/api/session')).body.user).toBeNull();
  });
});

describe('ending sessions', () => {
  const sessionCookie = (response: request.Response) => String(response.headers['set-cookie']).split(';')[0];

  it('DELETE /api/session ends every session of the user: a copied cookie and a second browser are refused afterwards', async () => {
    const who = await buildUser({ role: 'formulator' });
    const first = await request(stack.app).post('/api/session').send({ email: who.email, password: who.password });
    const copied = sessionCookie(first);
    const elsewhere = await signedInAgent(stack.app, who);
    expect((await request(stack.app).delete('/api/session').set('Cookie', copied)).status).toBe(204);
    expect((await request(stack.app).get('/api/session').set('Cookie', copied)).body.user).toBeNull();
    expect((await request(stack.app).get('/api/recipes').set('Cookie', copied)).status).toBe(401);
    expect((await elsewhere.get('/api/session')).body.user).toBeNull();
    // Signing in again works.
    expect((await (await signedInAgent(stack.app, who)).get('/api/session')).body.user.id).toBe(who.user.id);
  });

  it('POST /api/password-resets/confirm ends the sessions opened with the old password', async () => {
    const who = await buildUser({ role: 'scientist' });
    const before = await signedInAgent(stack.app, who);
    await request(stack.app).post('/api/password-resets').send({ email: who.email });
    const token = linkIn((await mailArrivingFor(who.email)).textBody, '/reset-password').searchParams.get('token')!;
    expect((await request(stack.app).post('/api/password-resets/confirm').send({ token, password: 'a-fresh-password-7' })).status).toBe(200);
    expect((await before.get('/api/session')).body.user).toBeNull();
  });

  it('PATCH /api/users/:id ends the sessions of a person whose role changes or who is deactivated (and reactivation does not revive them)', async () => {
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const promoted = await buildUser({ role: 'formulator' });
    const promotedAgent = await signedInAgent(stack.app, promoted);
    expect((await admin.patch(`/api/users/${promoted.user.id}`).send({ role: 'viewer' })).status).toBe(200);
    expect((await promotedAgent.get('/api/session')).body.user).toBeNull();

    const paused = await buildUser({ role: 'scientist' });
    const pausedAgent = await signedInAgent(stack.app, paused);
    expect((await admin.patch(`/api/users/${paused.user.id}`).send({ active: false })).status).toBe(200);
    expect((await admin.patch(`/api/users/${paused.user.id}`).send({ active: true })).status).toBe(200);
    expect((await pausedAgent.get('/api/session')).body.user).toBeNull();

    const renamed = await buildUser({ role: 'viewer' });
    const renamedAgent = await signedInAgent(stack.app, renamed);
    expect((await admin.patch(`/api/users/${renamed.user.id}`).send({ name: 'A New Name' })).status).toBe(200);
    expect((await renamedAgent.get('/api/session')).body.user?.id).toBe(renamed.user.id);
  });
});
