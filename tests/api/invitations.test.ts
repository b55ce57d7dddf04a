import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { AuditEvent, User, UserToken } from '../../server/models';
import { hashToken } from '../../server/services/one-time-links';
import { buildUser, latestMailTo, linkIn, mailArrivingFor, signedInAgent, uniqueEmail } from '../support/builders';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let admin: Awaited<ReturnType<typeof signedInAgent>>;
beforeAll(async () => {
  stack = await startTestStack({ env: { SIGNIN_LIMIT_PER_ADDRESS: '1000' } });
  admin = await signedInAgent(stack.app, await buildUser({ role: 'admin', name: 'Ada Admin' }));
});
afterAll(() => stack.close());

describe('invitations', () => {
  it('admin invites a person; the mail lands in the outbox; the link sets a password and the invitee signs in', async () => {
    const email = uniqueEmail('invitee');
    const invited = await admin.post('/api/invitations').send({ email, name: 'Nadia Invitee', role: 'scientist' });
    expect(invited.status).toBe(201);
    expect(invited.body.user).toMatchObject({ email, role: 'scientist', active: false, invitationPending: true });

    const mail = await latestMailTo(email);
    expect(mail?.subject).toBe('You are invited to Gelwright');
    expect(mail?.transport).toBe('catcher');
    expect(mail?.textBody).toContain('Ada Admin');
    const link = linkIn(mail!.textBody, '/accept-invitation');
    const token = link.searchParams.get('token')!;
    expect(link.origin).toBe(stack.config.PUBLIC_URL.replace(/\/$/, ''));

    const greeting = await request(stack.app).get(`/api/invitations/${token}`);
    expect(greeting.body).toEqual({ name: 'Nadia Invitee', email, role: 'scientist' });

    const accepted = await request(stack.app).post('/api/invitations/accept').send({ token, password: 'a-fresh-long-password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ active: true, invitationPending: false });

    const signIn = await request(stack.app).post('/api/session').send({ email, password: 'a-fresh-long-password' });
    expect(signIn.status).toBe(201);
    expect(await AuditEvent.count({ where: { action: 'invitation.created', entityId: String(invited.body.user.id) } })).toBe(1);
    expect(await AuditEvent.count({ where: { action: 'invitation.accepted', entityId: String(invited.body.user.id) } })).toBe(1);
  });

  it('PATCH /api/users/:id with active: false withdraws a pending invitation: the link no longer greets, accepts or activates', async () => {
    const email = uniqueEmail('withdrawn');
    const invited = await admin.post('/api/invitations').send({ email, name: 'Wendell Withdrawn', role: 'manager' });
    const token = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    const revoked = await admin.patch(`/api/users/${invited.body.user.id}`).send({ active: false });
    expect(revoked.status).toBe(200);
    expect((await request(stack.app).get(`/api/invitations/${token}`)).status).toBe(400);
    const accept = await request(stack.app).post('/api/invitations/accept').send({ token, password: 'a-sneaky-long-password' });
    expect(accept.status).toBe(400);
    expect(accept.body.error.field).toBe('token');
    const stored = await User.findByPk(invited.body.user.id);
    expect(stored).toMatchObject({ active: false, passwordHash: null });
    expect((await request(stack.app).post('/api/session').send({ email, password: 'a-sneaky-long-password' })).status).toBe(401);
    expect(await AuditEvent.count({ where: { action: 'invitation.revoked', entityId: String(invited.body.user.id) } })).toBe(1);
  });

  it('a link works once', async () => {
    const email = uniqueEmail('once');
    await admin.post('/api/invitations').send({ email, name: 'Once Only', role: 'viewer' });
    const token = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    expect((await request(stack.app).post('/api/invitations/accept').send({ token, password: 'first-password-ok' })).status).toBe(200);
    const again = await request(stack.app).post('/api/invitations/accept').send({ token, password: 'second-password-no' });
    expect(again.status).toBe(400);
    expect(again.body.error.field).toBe('token');
  });

  it('an expired link is refused and sets nothing', async () => {
    const email = uniqueEmail('late');
    const invited = await admin.post('/api/invitations').send({ email, name: 'Late Comer', role: 'viewer' });
    const token = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    await UserToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(token) } });
    const response = await request(stack.app).post('/api/invitations/accept').send({ token, password: 'too-late-password' });
    expect(response.status).toBe(400);
    const user = await User.findByPk(invited.body.user.id);
    expect(user?.passwordHash).toBeNull();
    expect(user?.active).toBe(false);
  });

  it('re-inviting a pending person replaces the old link; inviting a member is 409', async () => {
    const email = uniqueEmail('twice');
    await admin.post('/api/invitations').send({ email, name: 'Twice Asked', role: 'viewer' });
    const first = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    const again = await admin.post('/api/invitations').send({ email, name: 'Twice Asked', role: 'formulator' });
    expect(again.status).toBe(201);
    expect(again.body.user.role).toBe('formulator');
    const second = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    expect(second).not.toBe(first);
    expect((await request(stack.app).post('/api/invitations/accept').send({ token: first, password: 'old-link-password' })).status).toBe(400);
    expect((await request(stack.app).post('/api/invitations/accept').send({ token: second, password: 'new-link-password' })).status).toBe(200);
    const member = await admin.post('/api/invitations').send({ email, name: 'Twice Asked', role: 'viewer' });
    expect(member.status).toBe(409);
  });

  it('stores only the hash of a link token', async () => {
    const email = uniqueEmail('hashed');
    const invited = await admin.post('/api/invitations').send({ email, name: 'Hash Check', role: 'viewer' });
    const token = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    const rows = await UserToken.findAll({ where: { userId: invited.body.user.id } });
    expect(rows.map((r) => r.tokenHash)).toContain(hashToken(token));
    expect(rows.map((r) => r.tokenHash)).not.toContain(token);
  });
});

describe('password reset', () => {
  it('mails a one-time link to an active user; the new password works and the old one not', async () => {
    const who = await buildUser({ role: 'formulator' });
    const asked = await request(stack.app).post('/api/password-resets').send({ email: who.email });
    expect(asked.status).toBe(202);
    const mail = await mailArrivingFor(who.email);
    expect(mail?.subject).toBe('Reset your Gelwright password');
    const token = linkIn(mail!.textBody, '/reset-password').searchParams.get('token')!;
    const done = await request(stack.app).post('/api/password-resets/confirm').send({ token, password: 'brand-new-password' });
    expect(done.status).toBe(200);
    expect((await request(stack.app).post('/api/session').send({ email: who.email, password: who.password })).status).toBe(401);
    expect((await request(stack.app).post('/api/session').send({ email: who.email, password: 'brand-new-password' })).status).toBe(201);
    expect((await request(stack.app).post('/api/password-resets/confirm').send({ token, password: 'third-password-x' })).status).toBe(400);
  });

  it('answers an unknown address exactly like a known one and sends nothing', async () => {
    const who = await buildUser({ role: 'viewer' });
    const known = await request(stack.app).post('/api/password-resets').send({ email: who.email });
    const stranger = uniqueEmail('stranger');
    const unknown = await request(stack.app).post('/api/password-resets').send({ email: stranger });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    expect(await latestMailTo(stranger)).toBeNull();
  });

  it('POST /api/password-resets answers a known address as fast as an unknown one (median of 20 tries differs by under 20 ms)', async () => {
    const app = stack.appWith({ SIGNIN_LIMIT_PER_ADDRESS: '1000', SIGNIN_LIMIT_PER_ACCOUNT: '1000' });
    const who = await buildUser({ role: 'formulator' });
    const timed = async (email: string) => {
      const start = performance.now();
      const response = await request(app).post('/api/password-resets').send({ email });
      expect(response.status).toBe(202);
      return performance.now() - start;
    };
    await timed(who.email); // warm-up: first mail connection, first statements
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 20; i++) {
      known.push(await timed(who.email));
      unknown.push(await timed(uniqueEmail('nobody')));
    }
    const median = (values: number[]) => values.slice().sort((a, b) => a - b)[Math.floor(values.length / 2)];
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(20);
    await mailArrivingFor(who.email);
  });

  it('refuses a weak new password with a message naming the field', async () => {
    const who = await buildUser({ role: 'viewer' });
    await request(stack.app).post('/api/password-resets').send({ email: who.email });
    const token = linkIn((await mailArrivingFor(who.email)).textBody, '/reset-password').searchParams.get('token')!;
    const response = await request(stack.app).post('/api/password-resets/confirm').send({ token, password: 'short' });
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('password');
    expect(response.body.error.message).toMatch(/^password: /);
  });
});

describe('outbox', () => {
  it('admins read a message with its body; other roles are refused', async () => {
    const email = uniqueEmail('reader');
    await admin.post('/api/invitations').send({ email, name: 'Outbox Reader', role: 'viewer' });
    const list = await admin.get(`/api/outbox?to=${encodeURIComponent(email)}`);
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    const one = await admin.get(`/api/outbox/${list.body.items[0].id}`);
    expect(one.body.message.text).toContain('/accept-invitation?token=');
    const viewer = await signedInAgent(stack.app, await buildUser({ role: 'manager' }));
    expect((await viewer.get('/api/outbox')).status).toBe(403);
  });
});
