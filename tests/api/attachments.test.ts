import { createHash } from 'node:crypto';
import { createServer, request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { existsSync, readdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Attachment, type Programme } from '../../server/models';
import { buildUser, signedInAgent, type TestUser } from '../support/builders';
import { buildLibrary, buildProgramme, elfBytes, pngBytes, recipeInput } from '../support/team-builders';
import { tableCounts } from '../support/table-counts';
import { startTestStack, type TestStack } from '../support/test-stack';

let stack: TestStack;
let programme: Programme;
let scientist: Awaited<ReturnType<typeof signedInAgent>>;
let observationId: number;

/** Every file under the attachments folder, to prove a refused upload wrote nothing. */
function storedFiles(): string[] {
  const root = resolve(stack.config.DATA_DIR, 'attachments');
  if (!existsSync(root)) return [];
  return readdirSync(root).flatMap((dir) => readdirSync(join(root, dir)).map((f) => `${dir}/${f}`));
}

beforeAll(async () => {
  stack = await startTestStack();
  const lib = await buildLibrary();
  programme = await buildProgramme();
  const formulator = await signedInAgent(stack.app, await buildUser({ role: 'formulator' }));
  const recipe = (await formulator.post('/api/recipes').send(recipeInput(programme, lib))).body.recipe;
  scientist = await signedInAgent(stack.app, await buildUser({ role: 'scientist' }));
  observationId = (await scientist.post('/api/observations').send({ recipeId: recipe.id, mixedAt: '2026-11-20', ageDays: 1, observedState: 'gel', method: 'microscopy' })).body.observation.id;
});
afterAll(() => stack.close());

describe('POST /api/observations/:id/attachments', () => {
  it('stores a micrograph and an instrument file with sniffed types and SHA-256, and gives the bytes back', async () => {
    const png = pngBytes(16, 12);
    const trace = Buffer.from('strain_pct,storage_modulus_pa\n0.1,35.2\n0.2,35.0\n');
    const response = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', png, 'confocal day 1.png').attach('files', trace, 'sweep.csv');
    expect(response.status).toBe(201);
    const [image, text] = response.body.attachments;
    expect(image).toMatchObject({ originalName: 'confocal day 1.png', mimeType: 'image/png', sizeBytes: png.length, sha256: createHash('sha256').update(png).digest('hex'), isImage: true });
    expect(text).toMatchObject({ mimeType: 'text/csv', isImage: false });
    const download = await scientist.get(`/api/attachments/${image.id}`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(download.headers['content-disposition']).toMatch(/^attachment; filename="confocal day 1.png"/);
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(download.body as Buffer, png)).toBe(0);
    const row = await Attachment.findByPk(image.id);
    expect(row?.storedName).toMatch(/^[0-9a-f-]{36}\.png$/);
  });

  it('refuses an oversized file before anything is stored', async () => {
    const before = { files: storedFiles(), rows: await tableCounts(stack.sequelize) };
    const big = Buffer.concat([pngBytes(4, 4), Buffer.alloc(stack.config.UPLOAD_MAX_BYTES + 1)]);
    const response = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', big, 'huge.png');
    expect(response.status).toBe(413);
    expect(storedFiles()).toEqual(before.files);
    expect(await tableCounts(stack.sequelize)).toEqual(before.rows);
  });

  it.each([
    ['an executable renamed .png', elfBytes(), 'photo.png'],
    ['a shell script renamed .png', Buffer.from('#!/bin/sh\nrm -rf /\n'), 'micrograph.png'],
    ['an HTML page renamed .csv', Buffer.from('<html><script>alert(1)</script></html>\u0000'), 'data.csv'],
    ['a PDF', Buffer.from('%PDF-1.7\n%\u00e2\u00e3\n1 0 obj\n'), 'report.pdf'],
  ])('refuses %s by its content and stores nothing', async (_label, bytes, name) => {
    const before = { files: storedFiles(), rows: await tableCounts(stack.sequelize) };
    const response = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', bytes, name);
    expect(response.status).toBe(400);
    expect(response.body.error.message).toMatch(/refused/);
    expect(storedFiles()).toEqual(before.files);
    expect(await tableCounts(stack.sequelize)).toEqual(before.rows);
  });

  it('refuses the whole upload when one of several files is bad', async () => {
    const before = storedFiles();
    const response = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', pngBytes(), 'ok.png').attach('files', elfBytes(), 'bad.png');
    expect(response.status).toBe(400);
    expect(response.body.error.field).toBe('files.1');
    expect(storedFiles()).toEqual(before);
  });

  it('keeps path-traversal names away from the file system', async () => {
    const response = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', pngBytes(), '../../../../etc/cron.d/evil.png');
    expect(response.status).toBe(201);
    const [attachment] = response.body.attachments;
    expect(attachment.originalName).toBe('evil.png');
    const row = await Attachment.findByPk(attachment.id);
    expect(row?.storedName).not.toContain('..');
    expect(existsSync('/etc/cron.d/evil.png')).toBe(false);
  });

  it('refuses more files than the count limit', async () => {
    let request = scientist.post(`/api/observations/${observationId}/attachments`);
    for (let i = 0; i <= stack.config.UPLOAD_MAX_FILES; i++) request = request.attach('files', pngBytes(), `f${i}.png`);
    const response = await request;
    expect(response.status).toBe(400);
    expect(response.body.error.message).toMatch(/Too many files/);
  });

  it('shows PNG and JPEG inline on request, never TIFF or text', async () => {
    const upload = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', pngBytes(), 'thumb.png').attach('files', Buffer.from('a,b\n1,2\n'), 'x.csv');
    const [png, text] = upload.body.attachments;
    expect((await scientist.get(`/api/attachments/${png.id}?inline=true`)).headers['content-disposition']).toMatch(/^inline/);
    expect((await scientist.get(`/api/attachments/${text.id}?inline=true`)).headers['content-disposition']).toMatch(/^attachment/);
  });
});

/** The session cookie of a fresh sign-in, for requests made without supertest. */
async function sessionCookieOf(who: TestUser) {
  const response = await request(stack.app).post('/api/session').send({ email: who.email, password: who.password });
  return String(response.headers['set-cookie']).split(';')[0];
}

/**
 * Sends the headers of a multipart upload declaring `declaredBytes` and only the first 64 KB of
 * it, then waits for an answer: a server that buffers the body first never answers.
 */
async function statusBeforeBodyIsSent(path: string, cookie: string, declaredBytes: number): Promise<number | 'no answer'> {
  const server = createServer(stack.app);
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', () => done()));
  const { port } = server.address() as AddressInfo;
  try {
    return await new Promise((resolveStatus) => {
      const timer = setTimeout(() => {
        req.destroy();
        resolveStatus('no answer');
      }, 3000);
      const req = httpRequest({ host: '127.0.0.1', port, path, method: 'POST', headers: { Cookie: cookie, 'Content-Type': 'multipart/form-data; boundary=XyZ', 'Content-Length': String(declaredBytes) } }, (res) => {
        clearTimeout(timer);
        res.resume();
        resolveStatus(res.statusCode ?? 0);
      });
      req.on('error', () => {});
      req.write(Buffer.concat([Buffer.from('--XyZ\r\nContent-Disposition: form-data; name="files"; filename="big.png"\r\nContent-Type: image/png\r\n\r\n'), Buffer.alloc(64 * 1024)]));
    });
  } finally {
    server.closeAllConnections();
    await new Promise<void>((done) => server.close(() => done()));
  }
}

describe('uploads are checked before they are read', () => {
  it('POST /api/observations/:id/attachments by someone else is refused with 403 before the body arrives', async () => {
    const stranger = await buildUser({ role: 'scientist' });
    const status = await statusBeforeBodyIsSent(`/api/observations/${observationId}/attachments`, await sessionCookieOf(stranger), 20 * 1024 * 1024);
    expect(status).toBe(403);
  });

  it('a declared length over the request cap is refused with 413 before the body arrives', async () => {
    const owner = await buildUser({ role: 'admin' });
    const status = await statusBeforeBodyIsSent(`/api/observations/${observationId}/attachments`, await sessionCookieOf(owner), stack.config.UPLOAD_MAX_REQUEST_BYTES + 1);
    expect(status).toBe(413);
  });

  it('files each within the per-file limit but over the request cap together are refused with 413 and store nothing', async () => {
    const capped = stack.appWith({ UPLOAD_MAX_BYTES: '100000', UPLOAD_MAX_REQUEST_BYTES: '150000' });
    const agent = request.agent(capped);
    const owner = await buildUser({ role: 'admin' });
    await agent.post('/api/session').send({ email: owner.email, password: owner.password });
    const before = { files: storedFiles(), rows: await tableCounts(stack.sequelize) };
    const part = () => Buffer.concat([pngBytes(4, 4), Buffer.alloc(90_000)]);
    const response = await agent.post(`/api/observations/${observationId}/attachments`).attach('files', part(), 'a.png').attach('files', part(), 'b.png').attach('files', part(), 'c.png');
    expect(response.status).toBe(413);
    expect(response.body.error.message).toMatch(/larger than/);
    expect(storedFiles()).toEqual(before.files);
    expect(await tableCounts(stack.sequelize)).toEqual(before.rows);
  });

  it('keeps a non-ASCII file name as written (UTF-8), not as Latin-1 mojibake', async () => {
    const response = await scientist.post(`/api/observations/${observationId}/attachments`).attach('files', pngBytes(), 'gélose à 2 % – jour 3.png');
    expect(response.status).toBe(201);
    expect(response.body.attachments[0].originalName).toBe('gélose à 2 % – jour 3.png');
  });
});
