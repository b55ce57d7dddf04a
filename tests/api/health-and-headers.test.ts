import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { buildUser, signedInAgent } from '../support/builders';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
beforeAll(async () => {
  stack = await startTestStack();
});
afterAll(() => stack.close());

describe('GET /api/health', () => {
  it('reports the server and the database as up', async () => {
    const response = await request(stack.app).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ status: 'ok', server: 'up', database: 'up' });
  });
});

describe('security headers and cross-site writes', () => {
  it('sends a content security policy, nosniff and frame protection', async () => {
    const response = await request(stack.app).get('/api/health');
    expect(response.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(response.headers['content-security-policy']).toMatch(/frame-ancestors 'none'/);
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-frame-options']).toBe('DENY');
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('refuses a state-changing request from another site, with or without a session', async () => {
    const who = await buildUser({ role: 'admin' });
    const agent = await signedInAgent(stack.app, who);
    const foreign = await agent.post('/api/invitations').set('Origin', 'https://evil.example').send({ email: 'x@test.example', name: 'X', role: 'viewer' });
    expect(foreign.status).toBe(403);
    const fetchSite = await agent.post('/api/invitations').set('Sec-Fetch-Site', 'cross-site').send({ email: 'y@test.example', name: 'Y', role: 'viewer' });
    expect(fetchSite.status).toBe(403);
    const own = await agent.post('/api/invitations').set('Origin', stack.config.PUBLIC_URL).send({ email: `own-${who.user.id}@test.example`, name: 'Own', role: 'viewer' });
    expect(own.status).toBe(201);
  });

  it('refuses a write whose Origin names the request’s own Host but not PUBLIC_URL (a DNS-rebinding page)', async () => {
    const who = await buildUser({ role: 'admin' });
    const agent = await signedInAgent(stack.app, who);
    const rebound = await agent
      .post('/api/invitations')
      .set('Host', '127.0.0.1:31337')
      .set('Origin', 'http://127.0.0.1:31337')
      .send({ email: `rebound-${who.user.id}@test.example`, name: 'Rebound', role: 'viewer' });
    expect(rebound.status).toBe(403);
    expect(rebound.body.error.message).toMatch(/Cross-site/);
  });

  it('treats Sec-Fetch-Site: same-site as another site', async () => {
    const agent = await signedInAgent(stack.app, await buildUser({ role: 'admin' }));
    const sibling = await agent.post('/api/invitations').set('Sec-Fetch-Site', 'same-site').send({ email: 'sibling@test.example', name: 'Sibling', role: 'viewer' });
    expect(sibling.status).toBe(403);
    expect((await agent.post('/api/invitations').set('Sec-Fetch-Site', 'same-origin').send({ email: `same-${Date.now()}@test.example`, name: 'Same', role: 'viewer' })).status).toBe(201);
  });

  it('answers 421 to a Host header it does not serve, and serves loopback and PUBLIC_URL’s host', async () => {
    const foreign = await request(stack.app).get('/api/health').set('Host', 'rebind.attacker.example:4199');
    expect(foreign.status).toBe(421);
    expect(foreign.body.error.id).toBe('unknown_host');
    expect((await request(stack.app).get('/api/session').set('Host', 'evil.example')).status).toBe(421);
    for (const host of ['127.0.0.1:4199', 'localhost:5173', '[::1]:4180', new URL(stack.config.PUBLIC_URL).host]) {
      expect((await request(stack.app).get('/api/health').set('Host', host)).status, host).toBe(200);
    }
    const named = stack.appWith({ ALLOWED_HOSTS: 'gel.lab.example' });
    expect((await request(named).get('/api/health').set('Host', 'gel.lab.example')).status).toBe(200);
  });
});
