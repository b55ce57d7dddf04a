import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, OutboxMessage, ShortlistEvent, User } from '../../server/models';
import { Op } from 'sequelize';
import { buildUser, latestMailTo, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';
import { startTestStack, type TestStack } from '../support/test-stack';
import type { Programme } from '../../server/models';

let stack: TestStack;
let lib: Library;
let programme: Programme;
let author: TestUser;
let authorAgent: Awaited<ReturnType<typeof signedInAgent>>;
let manager: TestUser;
let managerAgent: Awaited<ReturnType<typeof signedInAgent>>;
const recipeIds: number[] = [];

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  programme = await buildProgramme();
  author = await buildUser({ role: 'formulator', name: 'Fenna Formulator' });
  authorAgent = await signedInAgent(stack.app, author);
  manager = await buildUser({ role: 'manager', name: 'Marek Manager' });
  managerAgent = await signedInAgent(stack.app, manager);
  for (const concentrationGL of [4, 8]) {
    const created = await authorAgent.post('/api/recipes').send(recipeInput(programme, lib, { attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL } }));
    expect(created.status).toBe(201);
    recipeIds.push(created.body.recipe.id);
  }
});
afterAll(() => stack.close());

async function draft(agent = authorAgent) {
  const response = await agent.post('/api/shortlists').send({
    programmeId: programme.id,
    title: `Gel candidates ${Math.random().toString(36).slice(2, 7)}`,
    purpose: 'Pick two for the 30-day shelf test',
    targetState: 'gel',
    items: recipeIds.map((recipeId, i) => ({ recipeId, reason: `candidate ${i + 1}: widest margin` })),
  });
  expect(response.status).toBe(201);
  return response.body.shortlist as { id: number; status: string };
}

describe('shortlist workflow', () => {
  it('draft → submitted e-mails every active manager; approved e-mails the author; history records each step', async () => {
    const s = await draft();
    const submitted = await authorAgent.post(`/api/shortlists/${s.id}/submit`);
    expect(submitted.status).toBe(200);
    expect(submitted.body.shortlist.status).toBe('submitted');
    const managers = await User.findAll({ where: { role: 'manager', active: true } });
    for (const m of managers) expect((await latestMailTo(m.email))?.subject).toMatch(/^Shortlist waiting for review/);

    const approved = await managerAgent.post(`/api/shortlists/${s.id}/approve`).send({ comment: 'Go ahead with both.' });
    expect(approved.status).toBe(200);
    expect(approved.body.shortlist).toMatchObject({ status: 'approved', reviewer: { id: manager.user.id }, decisionComment: 'Go ahead with both.' });
    const mail = await latestMailTo(author.email);
    expect(mail?.subject).toMatch(/^Shortlist approved/);
    expect(mail?.textBody).toContain('Go ahead with both.');
    expect(approved.body.shortlist.history.map((h: { to: string }) => h.to)).toEqual(['draft', 'submitted', 'approved']);
  });

  it('a manager may not approve a shortlist they wrote', async () => {
    const writingManager = await buildUser({ role: 'admin' });
    const agent = await signedInAgent(stack.app, writingManager);
    const s = await draft(agent);
    await agent.post(`/api/shortlists/${s.id}/submit`);
    const self = await agent.post(`/api/shortlists/${s.id}/approve`).send({});
    expect(self.status).toBe(403);
    expect(self.body.error.message).toMatch(/you wrote/);
    const other = await managerAgent.post(`/api/shortlists/${s.id}/approve`).send({});
    expect(other.status).toBe(200);
  });

  it('return needs a comment, reaches the author, and reopening takes it back to draft', async () => {
    const s = await draft();
    await authorAgent.post(`/api/shortlists/${s.id}/submit`);
    const noComment = await managerAgent.post(`/api/shortlists/${s.id}/return`).send({});
    expect(noComment.status).toBe(400);
    expect(noComment.body.error.field).toBe('comment');
    const returned = await managerAgent.post(`/api/shortlists/${s.id}/return`).send({ comment: 'Add a lower-polymer control.' });
    expect(returned.body.shortlist.status).toBe('returned');
    expect((await latestMailTo(author.email))?.subject).toMatch(/^Shortlist returned/);
    const reopened = await authorAgent.post(`/api/shortlists/${s.id}/reopen`);
    expect(reopened.body.shortlist.status).toBe('draft');
    expect(reopened.body.shortlist.history.map((h: { to: string }) => h.to)).toEqual(['draft', 'submitted', 'returned', 'draft']);
  });

  it('answers every illegal transition with 409 and changes nothing', async () => {
    const s = await draft();
    const illegal: [string, string, object?][] = [
      ['draft', 'approve', {}],
      ['draft', 'return', { comment: 'x' }],
      ['draft', 'reopen'],
    ];
    for (const [from, action, body] of illegal) {
      const response = await (body ? managerAgent.post(`/api/shortlists/${s.id}/${action}`).send(body) : authorAgent.post(`/api/shortlists/${s.id}/${action}`));
      expect(response.status, `${from} → ${action}`).toBe(409);
    }
    await authorAgent.post(`/api/shortlists/${s.id}/submit`);
    expect((await authorAgent.post(`/api/shortlists/${s.id}/submit`)).status, 'submitted → submit').toBe(409);
    expect((await authorAgent.post(`/api/shortlists/${s.id}/reopen`)).status, 'submitted → reopen').toBe(409);
    await managerAgent.post(`/api/shortlists/${s.id}/return`).send({ comment: 'again' });
    expect((await authorAgent.post(`/api/shortlists/${s.id}/submit`)).status, 'returned → submit').toBe(409);
    expect((await managerAgent.post(`/api/shortlists/${s.id}/approve`).send({})).status, 'returned → approve').toBe(409);
    expect((await managerAgent.post(`/api/shortlists/${s.id}/return`).send({ comment: 'x' })).status, 'returned → return').toBe(409);
    const events = await ShortlistEvent.count({ where: { shortlistId: s.id } });
    expect(events).toBe(3); // draft, submitted, returned: no refused move left a trace
  });

  it('freezes an approved shortlist: no edit, no archive, no further move', async () => {
    const s = await draft();
    await authorAgent.post(`/api/shortlists/${s.id}/submit`);
    await managerAgent.post(`/api/shortlists/${s.id}/approve`).send({});
    const edit = await authorAgent.put(`/api/shortlists/${s.id}`).send({ programmeId: programme.id, title: 'Changed', targetState: 'gel', items: [] });
    expect(edit.status).toBe(409);
    expect((await authorAgent.post(`/api/shortlists/${s.id}/archive`)).status).toBe(409);
    for (const action of ['submit', 'reopen']) expect((await authorAgent.post(`/api/shortlists/${s.id}/${action}`)).status).toBe(409);
    expect((await managerAgent.post(`/api/shortlists/${s.id}/return`).send({ comment: 'too late' })).status).toBe(409);
  });

  it('only the author or an administrator edits or submits a draft', async () => {
    const s = await draft();
    const colleague = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    expect((await colleague.post(`/api/shortlists/${s.id}/submit`)).status).toBe(403);
    const edit = await colleague.put(`/api/shortlists/${s.id}`).send({ programmeId: programme.id, title: 'Hijack', targetState: 'gel', items: [] });
    expect(edit.status).toBe(403);
  });

  it('refuses a recipe of another programme, and takes no status or author from the body', async () => {
    const other = await buildProgramme();
    const foreign = await authorAgent.post('/api/recipes').send(recipeInput(other, lib));
    const mixed = await authorAgent.post('/api/shortlists').send({ programmeId: programme.id, title: 'Mixed', targetState: 'gel', items: [{ recipeId: foreign.body.recipe.id, reason: 'x' }] });
    expect(mixed.status).toBe(400);
    expect(mixed.body.error.field).toBe('items.0.recipeId');
    const sneaky = await authorAgent.post('/api/shortlists').send({ programmeId: programme.id, title: 'Sneaky', targetState: 'gel', items: [], status: 'approved', authorId: manager.user.id });
    expect(sneaky.status).toBe(400);
  });

  it('audits every transition with its actor', async () => {
    const s = await draft();
    await authorAgent.post(`/api/shortlists/${s.id}/submit`);
    await managerAgent.post(`/api/shortlists/${s.id}/return`).send({ comment: 'more data' });
    const actions = (await AuditEvent.findAll({ where: { entityType: 'shortlist', entityId: String(s.id) }, order: [['id', 'ASC']] })).map((e) => [e.action, e.actorId]);
    expect(actions).toEqual([
      ['shortlist.created', author.user.id],
      ['shortlist.submitted', author.user.id],
      ['shortlist.returned', manager.user.id],
    ]);
    const mails = await OutboxMessage.count({ where: { subject: { [Op.like]: '%more data%' } } });
    expect(mails).toBe(0); // the comment is in the body, not the subject
  });
});

describe('a submitted or approved shortlist keeps the recipe versions it was given', () => {
  async function ownRecipe(concentrationGL: number) {
    const created = await authorAgent.post('/api/recipes').send(recipeInput(programme, lib, { attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL } }));
    expect(created.status).toBe(201);
    return created.body.recipe as { id: number; code: string; derived: { reducedB2: number; predictedState: string } };
  }
  async function approvedWith(recipeId: number) {
    const created = await authorAgent.post('/api/shortlists').send({ programmeId: programme.id, title: `Frozen ${Math.random().toString(36).slice(2, 7)}`, targetState: 'gel', items: [{ recipeId, reason: 'the one' }] });
    await authorAgent.post(`/api/shortlists/${created.body.shortlist.id}/submit`);
    const approved = await managerAgent.post(`/api/shortlists/${created.body.shortlist.id}/approve`).send({});
    expect(approved.status).toBe(200);
    return approved.body.shortlist as { id: number };
  }

  it('PUT /api/recipes/:id on an approved recipe makes version 2; the shortlist still shows version 1 and says what changed since approval', async () => {
    const recipe = await ownRecipe(4);
    const s = await approvedWith(recipe.id);
    const colleague = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    const edited = await colleague.put(`/api/recipes/${recipe.id}`).send(recipeInput(programme, lib, { name: 'Reworked', attraction: { source: 'depletion', depletantId: lib.depletant.id, concentrationGL: 12 } }));
    expect(edited.status).toBe(200);
    expect(edited.body.recipe.derived.reducedB2).not.toBe(recipe.derived.reducedB2);

    const detail = await managerAgent.get(`/api/shortlists/${s.id}`);
    const item = detail.body.shortlist.items[0];
    expect(item.frozen).toBe(true);
    expect(item.recipe).toMatchObject({ id: recipe.id, version: 1, derived: { reducedB2: recipe.derived.reducedB2, predictedState: recipe.derived.predictedState } });
    expect(item.recipe.name).not.toBe('Reworked');
    expect(item.changed.currentVersion).toBe(2);
    const fields = item.changed.differences.map((d: { field: string }) => d.field);
    expect(fields).toEqual(expect.arrayContaining(['name', 'attraction.concentrationGL', 'derived.reducedB2']));
    expect(item.changed.differences.find((d: { field: string }) => d.field === 'attraction.concentrationGL')).toMatchObject({ before: 4, after: 12 });
  });

  it('a draft shows the live recipe with nothing marked as changed, and submitting snapshots model and calibration', async () => {
    const recipe = await ownRecipe(5);
    const created = await authorAgent.post('/api/shortlists').send({ programmeId: programme.id, title: 'Live draft', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'x' }] });
    expect(created.body.shortlist.items[0]).toMatchObject({ frozen: false, changed: null });
    const submitted = await authorAgent.post(`/api/shortlists/${created.body.shortlist.id}/submit`);
    expect(submitted.body.shortlist.items[0]).toMatchObject({ frozen: true, changed: null, recipe: { version: 1 } });
    expect(submitted.body.shortlist.items[0].recipe.derived).toHaveProperty('modelVersion');
    expect(submitted.body.shortlist.items[0].recipe.derived).toHaveProperty('calibration');
  });

  it('POST /api/recipes/:id/archive is refused with 409 naming the shortlist while a submitted or approved one holds it', async () => {
    const recipe = await ownRecipe(6);
    const s = await approvedWith(recipe.id);
    const title = (await managerAgent.get(`/api/shortlists/${s.id}`)).body.shortlist.title;
    const colleague = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
    const archive = await colleague.post(`/api/recipes/${recipe.id}/archive`);
    expect(archive.status).toBe(409);
    expect(archive.body.error.message).toContain(title);
    expect(archive.body.error.message).toMatch(/stays on record/);
    expect((await managerAgent.get(`/api/recipes/${recipe.id}`)).body.recipe.archived).toBe(false);
  });
});
