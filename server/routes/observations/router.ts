import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { observationInputSchema, observationListQuerySchema } from '../../../shared/schemas/observations';
import { badRequest } from '../../errors';
import { route } from '../../http/route';
import { presentAttachment, presentObservation } from '../../presenters/observation';
import { presentPage } from '../../presenters/page';
import { attachFiles, attachmentUpload, csvUpload } from '../../services/attachments';
import { importObservations } from '../../services/observation-import';
import { streamObservationCsv } from '../../services/observation-export';
import { withHeavyJobSlot } from '../../services/heavy-jobs';
import { archiveObservation, listObservations, loadObservation, recordObservationOnce, requireOwnObservation, updateObservation } from '../../services/observations';

export const observationRoutes = [
  route({
    method: 'get',
    path: '/api/observations',
    access: 'data.read',
    summary: 'The bench log, newest first, with filters',
    query: observationListQuerySchema,
    async handler({ query }) {
      const { rows, count } = await listObservations(query);
      return { body: presentPage(query, rows.map(presentObservation), count) };
    },
  }),
  route({
    method: 'get',
    path: '/api/observations/export',
    access: 'data.read',
    summary: 'The bench log as CSV (formula-looking cells escaped), streamed page by page',
    query: observationListQuerySchema.omit({ page: true, pageSize: true }),
    async handler({ query, res, user, deps }) {
      await withHeavyJobSlot(user!.id, deps.config.HEAVY_JOBS_PER_USER, () => streamObservationCsv({ ...query, page: 1, pageSize: 1 }, res));
    },
  }),
  route({
    method: 'post',
    path: '/api/observations/import',
    access: 'observations.write',
    summary: 'Import a CSV of observations: all rows or none; ?dryRun=true only checks',
    query: z.object({ dryRun: z.enum(['true', 'false']).default('false') }),
    upload: csvUpload,
    async handler(ctx) {
      const file = ctx.req.file;
      if (!file) throw badRequest('file: attach the CSV file under the field name "file"', 'file');
      const text = new TextDecoder('utf-8').decode(file.buffer);
      const key = ctx.req.get('Idempotency-Key') ?? null;
      const { status, report } = await importObservations(ctx, { text, fileName: file.originalname.slice(0, 255) || null, idempotencyKey: key, dryRun: ctx.query.dryRun === 'true' });
      return { status, body: { report } };
    },
  }),
  route({
    method: 'get',
    path: '/api/observations/:id',
    access: 'data.read',
    summary: 'One observation with its attachments',
    params: idParamSchema,
    async handler({ params }) {
      return { body: { observation: presentObservation(await loadObservation(params.id, null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/observations',
    access: 'observations.write',
    summary: 'Record a bench outcome (an Idempotency-Key makes a retry safe: same key, same answer)',
    body: observationInputSchema,
    async handler(ctx) {
      return recordObservationOnce(ctx, ctx.body, ctx.req.get('Idempotency-Key'), presentObservation);
    },
  }),
  route({
    method: 'put',
    path: '/api/observations/:id',
    access: 'observations.write',
    summary: 'Correct a bench outcome you recorded',
    params: idParamSchema,
    body: observationInputSchema,
    async handler(ctx) {
      return { body: { observation: presentObservation(await updateObservation(ctx, ctx.params.id, ctx.body)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/observations/:id/archive',
    access: 'observations.write',
    summary: 'Archive a bench outcome you recorded',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { observation: presentObservation(await archiveObservation(ctx, ctx.params.id)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/observations/:id/attachments',
    access: 'observations.write',
    summary: 'Attach micrographs (PNG, JPEG, TIFF) or instrument files (CSV, TXT)',
    params: idParamSchema,
    upload: attachmentUpload,
    beforeUpload: ({ user, params }) => requireOwnObservation(user, params.id),
    async handler(ctx) {
      const files = (ctx.req.files as Express.Multer.File[] | undefined) ?? [];
      if (files.length === 0) throw badRequest('files: attach at least one file under the field name "files"', 'files');
      return { status: 201, body: { attachments: (await attachFiles(ctx, ctx.params.id, files)).map(presentAttachment) } };
    },
  }),
];
