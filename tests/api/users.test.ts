import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, User } from '../../server/models';
import { buildUser, signedInAgent } from '../support/builders';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
beforeAll(async () => {
  stack = await startTestStack();
});
afterAll(() => stack.close());

describe('PATCH /api/users/:id', () => {
  it('changes a role and audits the change with before and after', async () => {
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const target = await buildUser({ role: 'viewer' });
    const response = await admin.patch(`/api/users/${target.user.id}`).send({ role: 'formulator' });
    expect(response.status).toBe(200);
    expect(response.body.user.role).toBe('formulator');
    const event = await AuditEvent.findOne({ where: { action: 'user.role_changed', entityId: String(target.user.id) } });
    expect(event?.details).toEqual({ from: 'viewer', to: 'formulator' });
  });

  it('deactivates an account: it can no longer sign in, and reactivation restores it', async () => {
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const target = await buildUser({ role: 'scientist' });
    expect((await admin.patch(`/api/users/${target.user.id}`).send({ active: false })).status).toBe(200);
    await expect(signedInAgent(stack.app, target)).rejects.toThrow(/401/);
    expect((await admin.patch(`/api/users/${target.user.id}`).send({ active: true })).status).toBe(200);
    await expect(signedInAgent(stack.app, target)).resolves.toBeTruthy();
  });

  it('refuses to let an administrator demote or deactivate themselves', async () => {
    const me = await buildUser({ role: 'admin' });
    const admin = await signedInAgent(stack.app, me);
    const demote = await admin.patch(`/api/users/${me.user.id}`).send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    const off = await admin.patch(`/api/users/${me.user.id}`).send({ active: false });
    expect(off.status).toBe(409);
    expect((await User.findByPk(me.user.id))?.role).toBe('admin');
  });

  it('keeps at least one active administrator', async () => {
    // Make this admin the only active one in this worker's database for the duration.
    const solo = await buildUser({ role: 'admin' });
    const others = await User.findAll({ where: { role: 'admin', active: true } });
    const otherIds = others.map((u) => u.id).filter((id) => id !== solo.user.id);
    const helper = await buildUser({ role: 'admin' });
    const helperAgent = await signedInAgent(stack.app, helper);
    try {
      await User.update({ active: false }, { where: { id: otherIds } });
      // helper is active again (just created), so two admins: demoting solo works…
      expect((await helperAgent.patch(`/api/users/${solo.user.id}`).send({ role: 'manager' })).status).toBe(200);
      // …and now helper is the last one: it cannot be removed by anyone, itself included.
      const last = await helperAgent.patch(`/api/users/${helper.user.id}`).send({ active: false });
      expect(last.status).toBe(409);
    } finally {
      await User.update({ active: true }, { where: { id: otherIds } });
    }
  });

  it('cannot reactivate a person who never accepted the invitation', async () => {
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const pending = await buildUser({ role: 'viewer', active: false, password: null });
    const response = await admin.patch(`/api/users/${pending.user.id}`).send({ active: true });
    expect(response.status).toBe(409);
  });
});

describe('GET /api/users and GET /api/audit-events', () => {
  it('list people and events for an administrator, never a password hash', async () => {
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const users = await admin.get('/api/users');
    expect(users.status).toBe(200);
    expect(users.body.items.length).toBeGreaterThan(0);
    expect(JSON.stringify(users.body)).not.toMatch(/\$2[aby]\$|passwordHash/);
    const events = await admin.get('/api/audit-events?action=session.signed_in');
    expect(events.status).toBe(200);
    expect(events.body.items.every((e: { action: string }) => e.action === 'session.signed_in')).toBe(true);
  });
});
