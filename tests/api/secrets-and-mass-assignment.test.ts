import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { Observation, Programme, Recipe, Shortlist, User } from '../../server/models';
import { buildUser, latestMailTo, linkIn, mailArrivingFor, signedInAgent, uniqueEmail } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
beforeAll(async () => {
  stack = await startTestStack({ env: { LOG_REQUESTS: 'true', SIGNIN_LIMIT_PER_ADDRESS: '1000' } });
});
afterAll(() => stack.close());

/** Everything written to the console while a test runs: the server's whole log. */
let logged: string[] = [];
beforeEach(() => {
  logged = [];
  for (const method of ['log', 'info', 'warn', 'error'] as const) {
    vi.spyOn(console, method).mockImplementation((...args: unknown[]) => void logged.push(args.map(String).join(' ')));
  }
});
afterEach(() => vi.restoreAllMocks());

const BCRYPT = /\$2[aby]\$\d{2}\$[./A-Za-z0-9]{53}/;

describe('secrets never leave the server', () => {
  it('no password hash, reset token or invitation token appears in any answer or log line of the account flows', async () => {
    const admin = await buildUser({ role: 'admin' });
    const adminAgent = await signedInAgent(stack.app, admin);
    const answers: string[] = [];
    const keep = (r: request.Response) => (answers.push(JSON.stringify(r.body) + JSON.stringify(r.headers)), r);
    const email = uniqueEmail('secret');
    keep(await adminAgent.post('/api/invitations').send({ email, name: 'Sam Secret', role: 'scientist' }));
    const invitationToken = linkIn((await latestMailTo(email))!.textBody, '/accept-invitation').searchParams.get('token')!;
    keep(await request(stack.app).get(`/api/invitations/${invitationToken}`));
    keep(await request(stack.app).post('/api/invitations/accept').send({ token: invitationToken, password: 'sam-secret-password' }));
    keep(await request(stack.app).post('/api/session').send({ email, password: 'sam-secret-password' }));
    keep(await request(stack.app).post('/api/password-resets').send({ email }));
    const resetToken = linkIn((await mailArrivingFor(email, /^Reset/)).textBody, '/reset-password').searchParams.get('token')!;
    keep(await adminAgent.get('/api/users?pageSize=200'));
    keep(await adminAgent.get('/api/audit-events?pageSize=200'));
    const outbox = keep(await adminAgent.get(`/api/outbox?to=${encodeURIComponent(email)}`));
    for (const item of outbox.body.items) keep(await adminAgent.get(`/api/outbox/${item.id}`));
    keep(await request(stack.app).post('/api/password-resets/confirm').send({ token: resetToken, password: 'sam-new-password!' }));
    keep(await request(stack.app).get('/api/session'));
    const everything = [...answers, ...logged].join('\n');
    expect(everything).not.toMatch(BCRYPT);
    expect(everything).not.toContain(resetToken);
    // Invitation links are shown to the administrator who sent them, in the outbox, never logged.
    expect(logged.join('\n')).not.toContain(invitationToken);
    expect(logged.some((line) => line.includes('/api/invitations/(token)'))).toBe(true);
    // The stored message keeps the real link (it is what was sent); the answer hides it.
    const shown = answers.find((a) => a.includes('/reset-password?token=')) ?? '';
    expect(shown).toContain('/reset-password?token=(hidden)');
  });
});

describe('mass assignment changes nothing', () => {
  it('refuses role, status, approvedBy, createdBy and derived fields in every create body, writing nothing', async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme();
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const recipe = (await admin.post('/api/recipes').send(recipeInput(programme, lib))).body.recipe;
    const sneaky = { role: 'admin', status: 'approved', approvedBy: 1, createdBy: 1, derived: { predictedState: 'gel' }, predictedState: 'gel', observerId: 1, authorId: 1, reviewerId: 1 };
    const bodies: [string, Record<string, unknown>][] = [
      ['/api/programmes', { name: 'P', goalState: 'gel', attractionSource: 'depletion', codePrefix: 'ZQXJ' }],
      ['/api/materials/salts', { name: 'Salt', valence: 1 }],
      ['/api/recipes', recipeInput(programme, lib)],
      ['/api/observations', { recipeId: recipe.id, mixedAt: '2026-11-01', ageDays: 1, observedState: 'gel', method: 'visual' }],
      ['/api/shortlists', { programmeId: programme.id, title: 'S', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'r' }] }],
      ['/api/invitations', { email: uniqueEmail('mass'), name: 'Mass', role: 'viewer' }],
    ];
    const before = await tableCounts(stack.sequelize);
    for (const [path, body] of bodies) {
      for (const [field, value] of Object.entries(sneaky)) {
        // The role of an invitation is a real field (an administrator chooses it); not sent here.
        if (path === '/api/invitations' && field === 'role') continue;
        const response = await admin.post(path).send({ ...body, [field]: value });
        expect(response.status, `${path} with ${field}`).toBe(400);
      }
    }
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });

  it('a user cannot change their own role, and PATCH takes no password or e-mail', async () => {
    const viewer = await buildUser({ role: 'viewer' });
    const agent = await signedInAgent(stack.app, viewer);
    expect((await agent.patch(`/api/users/${viewer.user.id}`).send({ role: 'admin' })).status).toBe(403);
    const admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    for (const body of [{ passwordHash: 'x' }, { email: 'new@test.example' }, { password: 'new-password-123' }]) {
      expect((await admin.patch(`/api/users/${viewer.user.id}`).send(body)).status).toBe(400);
    }
    const after = await User.findByPk(viewer.user.id);
    expect(after?.role).toBe('viewer');
    expect(after?.email).toBe(viewer.email);
  });
});

describe("one user's records through another's ids", () => {
  it("a scientist cannot archive another scientist's attachment, nor a formulator another's shortlist", async () => {
    const lib = await buildLibrary();
    const programme = await buildProgramme();
    const formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    const recipe = (await formulator.post('/api/recipes').send(recipeInput(programme, lib))).body.recipe;
    const owner = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
    const observation = (await owner.post('/api/observations').send({ recipeId: recipe.id, mixedAt: '2026-11-01', ageDays: 1, observedState: 'gel', method: 'visual' })).body.observation;
    const attachment = (await owner.post(`/api/observations/${observation.id}/attachments`).attach('files', Buffer.from('a,b\n1,2\n'), 'trace.csv')).body.attachments[0];
    const other = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
    expect((await other.post(`/api/attachments/${attachment.id}/archive`)).status).toBe(403);
    expect((await other.post(`/api/observations/${observation.id}/attachments`).attach('files', Buffer.from('x,y\n'), 'x.csv')).status).toBe(403);
    const shortlist = (await formulator.post('/api/shortlists').send({ programmeId: programme.id, title: 'Mine', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'r' }] })).body.shortlist;
    const colleague = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    expect((await colleague.post(`/api/shortlists/${shortlist.id}/archive`)).status).toBe(403);
    expect((await Shortlist.findByPk(shortlist.id))?.archivedAt).toBeNull();
    expect(await Observation.count({ where: { id: observation.id, archivedAt: null } })).toBe(1);
    expect(await Recipe.count({ where: { id: recipe.id } })).toBe(1);
    expect(await Programme.count({ where: { id: programme.id } })).toBe(1);
  });
});
