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
});
