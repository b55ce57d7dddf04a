import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import nodemailer from 'nodemailer';
import { OutboxMessage } from '../../server/models';
import { catcherCredentials } from '../../server/mail/catcher-credentials';
import { cachedMapPoints } from '../../server/services/map-points';
import type { Programme } from '../../server/models';
import { buildUser, latestMailTo, signedInAgent, uniqueEmail } from '../support/builders';
import { buildLibrary, buildProgramme, recipeInput, type Library } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let lib: Library;
let formulator: Awaited<ReturnType<typeof signedInAgent>>;
let scientist: Awaited<ReturnType<typeof signedInAgent>>;
let admin: Awaited<ReturnType<typeof signedInAgent>>;

beforeAll(async () => {
  stack = await startTestStack();
  lib = await buildLibrary();
  formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
  scientist = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
  admin = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
});
afterAll(() => stack.close());

async function recipeIn(programme: Programme) {
  const created = await formulator.post('/api/recipes').send(recipeInput(programme, lib));
  expect(created.status).toBe(201);
  return created.body.recipe as { id: number; code: string };
}

describe('lone UTF-16 surrogates', () => {
  it('POST /api/recipes with a lone surrogate in notes answers 400 naming the field and writes nothing', async () => {
    const programme = await buildProgramme();
    const body = JSON.stringify({ ...recipeInput(programme, lib), notes: 'half a pair: \uD83D' }).replace('\\ud83d', '\\uD83D');
    const before = await tableCounts(stack.sequelize);
    const response = await formulator.post('/api/recipes').set('Content-Type', 'application/json').send(body);
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('notes');
    expect(response.body.error.message).toMatch(/^notes: .*surrogate/);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });

  it('accepts a whole surrogate pair (an emoji) in the same field', async () => {
    const programme = await buildProgramme();
    const response = await formulator.post('/api/recipes').send({ ...recipeInput(programme, lib), notes: 'tested 🧪' });
    expect(response.status).toBe(201);
    expect(response.body.recipe.notes).toBe('tested 🧪');
  });

  it('names a nested field: POST /api/shortlists with a lone low surrogate in items.0.reason', async () => {
    const programme = await buildProgramme();
    const recipe = await recipeIn(programme);
    const body = `{"programmeId":${programme.id},"title":"Pairs","targetState":"gel","items":[{"recipeId":${recipe.id},"reason":"x \\udc00"}]}`;
    const response = await formulator.post('/api/shortlists').set('Content-Type', 'application/json').send(body);
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('items.0.reason');
  });
});

describe('map overlay cache per programme', () => {
  it('a write to one programme keeps another programme’s cached overlay', async () => {
    const quiet = await buildProgramme();
    const busy = await buildProgramme();
    await recipeIn(quiet);
    const first = await cachedMapPoints(stack.sequelize, quiet.id);
    await recipeIn(busy);
    await scientist.post('/api/observations').send({ adhoc: { programmeId: busy.id, phi: 0.2, reducedB2: -6 }, mixedAt: '2026-11-01', ageDays: 1, observedState: 'gel', method: 'visual' });
    expect(await cachedMapPoints(stack.sequelize, quiet.id)).toBe(first);
  });

  it('a write to the programme itself drops its overlay at once', async () => {
    const programme = await buildProgramme();
    await recipeIn(programme);
    const first = await cachedMapPoints(stack.sequelize, programme.id);
    const added = await recipeIn(programme);
    const next = await cachedMapPoints(stack.sequelize, programme.id);
    expect(next).not.toBe(first);
    expect(JSON.parse(next!.json.toString()).recipes.rows.map((r: unknown[]) => r[0])).toContain(added.id);
  });
});

describe('archived programmes take nothing new', () => {
  async function archivedWithRecipe() {
    const programme = await buildProgramme();
    const recipe = await recipeIn(programme);
    expect((await admin.post(`/api/programmes/${programme.id}/archive`)).status).toBe(200);
    return { programme, recipe };
  }

  it('POST /api/observations of a recipe or ad hoc in an archived programme is 400 and writes nothing', async () => {
    const { programme, recipe } = await archivedWithRecipe();
    const before = await tableCounts(stack.sequelize);
    const ofRecipe = await scientist.post('/api/observations').send({ recipeId: recipe.id, mixedAt: '2026-11-01', ageDays: 1, observedState: 'gel', method: 'visual' });
    expect(ofRecipe.status).toBe(400);
    expect(ofRecipe.body.error).toMatchObject({ field: 'recipeId' });
    expect(ofRecipe.body.error.message).toMatch(/archived/);
    const adhoc = await scientist.post('/api/observations').send({ adhoc: { programmeId: programme.id, phi: 0.2, reducedB2: -6 }, mixedAt: '2026-11-01', ageDays: 1, observedState: 'gel', method: 'visual' });
    expect(adhoc.status).toBe(400);
    expect(adhoc.body.error.field).toBe('adhoc.programmeId');
    const csv = `recipe_code,mixed_on,age_days,observed_state,method\n${recipe.code},2026-11-01,3,gel,visual\n`;
    const imported = await scientist.post('/api/observations/import').attach('file', Buffer.from(csv), 'bench.csv');
    expect(imported.status).toBe(422);
    expect(imported.body.report.problems[0].message).toMatch(/archived/);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });

  it('POST /api/shortlists into an archived programme is 400 and writes nothing', async () => {
    const { programme, recipe } = await archivedWithRecipe();
    const before = await tableCounts(stack.sequelize);
    const response = await formulator.post('/api/shortlists').send({ programmeId: programme.id, title: 'Late', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'x' }] });
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('programmeId');
    expect(response.body.error.message).toMatch(/archived/);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });
});

describe('Cache-Control on API answers', () => {
  it('GET /api/recipes, /api/users and an error answer carry Cache-Control: no-store', async () => {
    expect((await formulator.get('/api/recipes')).headers['cache-control']).toBe('no-store');
    expect((await admin.get('/api/users')).headers['cache-control']).toBe('no-store');
    expect((await formulator.get('/api/recipes/999999999')).headers['cache-control']).toBe('no-store');
  });
});

describe('no self-review', () => {
  it('POST /api/shortlists/:id/return by its own author (an administrator) is 403; another manager may', async () => {
    const programme = await buildProgramme();
    const recipe = await recipeIn(programme);
    const created = await admin.post('/api/shortlists').send({ programmeId: programme.id, title: 'Mine', targetState: 'gel', items: [{ recipeId: recipe.id, reason: 'x' }] });
    await admin.post(`/api/shortlists/${created.body.shortlist.id}/submit`);
    const self = await admin.post(`/api/shortlists/${created.body.shortlist.id}/return`).send({ comment: 'back to me' });
    expect(self.status).toBe(403);
    expect(self.body.error.message).toMatch(/cannot return a shortlist you wrote/);
    const manager = await signedInAgent(stack.app, await buildUser({ role: 'manager' }));
    expect((await manager.post(`/api/shortlists/${created.body.shortlist.id}/return`).send({ comment: 'needs a control' })).status).toBe(200);
  });
});

describe('ids are decimal', () => {
  it.each(['0x10', '1e1', '+5', ' 7', '010', '1.0'])('GET /api/recipes/%s is 400 naming id', async (id) => {
    const response = await formulator.get(`/api/recipes/${encodeURIComponent(id)}`);
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('id');
  });

  it('a query id such as programme=0x10 is 400 naming programme; a decimal one works', async () => {
    const hex = await formulator.get('/api/recipes?programme=0x10');
    expect(hex.status).toBe(400);
    expect(hex.body.error.field).toBe('programme');
    const programme = await buildProgramme();
    await recipeIn(programme);
    const decimal = await formulator.get(`/api/recipes?programme=${programme.id}`);
    expect(decimal.status).toBe(200);
    expect(decimal.body.total).toBe(1);
  });
});

describe('the local mail catcher', () => {
  const send = (auth?: { user: string; pass: string }) =>
    nodemailer
      .createTransport({ host: '127.0.0.1', port: stack.config.SMTP_PORT, secure: false, ignoreTLS: true, auth })
      .sendMail({ from: 'someone@localhost', to: uniqueEmail('target'), subject: `planted ${Math.random()}`, text: 'x' });

  it('refuses mail from a client without the app’s credentials, or with wrong ones, and files nothing', async () => {
    const before = await OutboxMessage.count();
    await expect(send()).rejects.toThrow();
    await expect(send({ user: 'gelwright', pass: 'a-guess' })).rejects.toThrow();
    expect(await OutboxMessage.count()).toBe(before);
  });

  it('accepts the app’s own mail (the mailer signs in with the installation’s credentials)', async () => {
    const email = uniqueEmail('delivered');
    await stack.mailer.send({ to: [email], subject: 'Catcher check', text: 'hello' });
    expect((await latestMailTo(email))?.subject).toBe('Catcher check');
    await expect(send(catcherCredentials(stack.config))).resolves.toBeTruthy();
  });
});
