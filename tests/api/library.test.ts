import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, ParticleSystem } from '../../server/models';
import { buildUser, signedInAgent } from '../support/builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let formulator: Awaited<ReturnType<typeof signedInAgent>>;
beforeAll(async () => {
  stack = await startTestStack();
  formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
});
afterAll(() => stack.close());

const particle = {
  name: 'Latex 250 nm (test)',
  coreMaterial: 'polystyrene',
  radiusNm: 250,
  polydispersityPct: 4,
  densityGcm3: 1.05,
  stabilisation: 'steric',
  pricePerKg: 300,
};

describe('/api/materials/:kind', () => {
  it('adds a particle system, lists it, reads it, and audits the creation', async () => {
    const created = await formulator.post('/api/materials/particles').send(particle);
    expect(created.status).toBe(201);
    expect(created.body.item).toMatchObject({ ...particle, surfacePotentialMv: null, hamakerZj: null, archived: false });
    const id = created.body.item.id;
    const list = await formulator.get('/api/materials/particles?q=Latex 250');
    expect(list.body.items.map((i: { id: number }) => i.id)).toContain(id);
    expect((await formulator.get(`/api/materials/particles/${id}`)).body.item.name).toBe(particle.name);
    expect(await AuditEvent.count({ where: { action: 'particle_system.created', entityId: String(id) } })).toBe(1);
  });

  it('replaces an entry with PUT: fields left out are cleared', async () => {
    const created = await formulator.post('/api/materials/particles').send({ ...particle, name: 'With potential', surfacePotentialMv: -35 });
    const id = created.body.item.id;
    const replaced = await formulator.put(`/api/materials/particles/${id}`).send({ ...particle, name: 'Without potential' });
    expect(replaced.status).toBe(200);
    expect(replaced.body.item).toMatchObject({ name: 'Without potential', surfacePotentialMv: null });
  });

  it('archives and restores; archived entries leave the default list', async () => {
    const id = (await formulator.post('/api/materials/salts').send({ name: 'CaCl2 (test)', valence: 2, molarMassGMol: 110.98 })).body.item.id;
    expect((await formulator.post(`/api/materials/salts/${id}/archive`)).body.item.archived).toBe(true);
    const live = await formulator.get('/api/materials/salts');
    expect(live.body.items.map((i: { id: number }) => i.id)).not.toContain(id);
    const archived = await formulator.get('/api/materials/salts?archived=true');
    expect(archived.body.items.map((i: { id: number }) => i.id)).toContain(id);
    expect((await formulator.post(`/api/materials/salts/${id}/restore`)).body.item.archived).toBe(false);
  });

  it('needs the radius of gyration or both parts of its scaling law for a depletant', async () => {
    const bad = await formulator.post('/api/materials/depletants').send({ name: 'PEG ?', molarMassKgMol: 20, rgPrefactorNm: 0.0215 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('rgNm');
    const good = await formulator.post('/api/materials/depletants').send({ name: 'PEG 35k (test)', molarMassKgMol: 35, rgPrefactorNm: 0.0215, rgExponent: 0.583 });
    expect(good.status).toBe(201);
  });

  it.each([
    ['a negative radius', { ...particle, radiusNm: -5 }, 'radiusNm'],
    ['a radius as text', { ...particle, radiusNm: '250' }, 'radiusNm'],
    ['an unknown stabilisation', { ...particle, stabilisation: 'magic' }, 'stabilisation'],
    ['an extra field', { ...particle, createdBy: 1 }, undefined],
    ['no name', { ...particle, name: '' }, 'name'],
  ])('refuses %s with 400 and writes nothing', async (_label, body, field) => {
    const before = await tableCounts(stack.sequelize);
    const response = await formulator.post('/api/materials/particles').send(body);
    expect(response.status).toBe(400);
    if (field) expect(response.body.error.field).toBe(field);
    expect(await tableCounts(stack.sequelize)).toEqual(before);
  });

  it('lets a viewer read the library but not change it', async () => {
    const viewer = await signedInAgent(stack.app, await buildUser({ role: 'viewer' }));
    expect((await viewer.get('/api/materials/solvents')).status).toBe(200);
    const count = await ParticleSystem.count();
    expect((await viewer.post('/api/materials/particles').send(particle)).status).toBe(403);
    expect(await ParticleSystem.count()).toBe(count);
  });
});

describe('/api/programmes', () => {
  it('a manager starts a programme; a taken code prefix is 409; a formulator may not', async () => {
    const manager = await signedInAgent(stack.app, await buildUser({ role: 'manager' }));
    const prefix = `Q${Math.random().toString(36).slice(2, 5).replace(/[^a-z]/g, 'x').toUpperCase()}`;
    const created = await manager.post('/api/programmes').send({ name: 'Shelf-stable dressing base', goalState: 'gel', attractionSource: 'depletion', codePrefix: prefix });
    expect(created.status).toBe(201);
    expect(created.body.programme).toMatchObject({ codePrefix: prefix, recipeCount: 0, archived: false });
    const twin = await manager.post('/api/programmes').send({ name: 'Twin', goalState: 'fluid', attractionSource: 'salt', codePrefix: prefix });
    expect(twin.status).toBe(409);
    expect(twin.body.error.field).toBe('codePrefix');
    expect((await formulator.post('/api/programmes').send({ name: 'Nope', goalState: 'gel', attractionSource: 'depletion', codePrefix: 'NOPE' })).status).toBe(403);
    const renamed = await manager.patch(`/api/programmes/${created.body.programme.id}`).send({ notes: 'Target: holds 2 % w/w cocoa particles for 12 months.' });
    expect(renamed.body.programme.notes).toContain('12 months');
    const archived = await manager.post(`/api/programmes/${created.body.programme.id}/archive`);
    expect(archived.body.programme.archived).toBe(true);
  });
});
