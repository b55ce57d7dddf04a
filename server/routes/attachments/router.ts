import { createReadStream } from 'node:fs';
import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { route } from '../../http/route';
import { presentAttachment } from '../../presenters/observation';
import { archiveAttachment, loadLiveAttachment, storedPath } from '../../services/attachments';

const INLINE = new Set(['image/png', 'image/jpeg']);

export const attachmentRoutes = [
  route({
    method: 'get',
    path: '/api/attachments/:id',
    access: 'data.read',
    summary: 'Download an attachment (?inline=true shows a PNG or JPEG in the page)',
    params: idParamSchema,
    query: z.object({ inline: z.enum(['true', 'false']).default('false') }),
    async handler({ params, query, res, deps }) {
      const attachment = await loadLiveAttachment(params.id);
      const inline = query.inline === 'true' && INLINE.has(attachment.mimeType);
      const asciiName = attachment.originalName.replace(/[^\x20-\x7E]/g, '_').replace(/"/g, "'");
      res.setHeader('Content-Type', attachment.mimeType);
      res.setHeader('Content-Length', String(attachment.sizeBytes));
      res.setHeader('Content-Disposition', `${inline ? 'inline' : 'attachment'}; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(attachment.originalName)}`);
      res.setHeader('Cache-Control', 'private, max-age=3600');
      res.setHeader('X-Content-Type-Options', 'nosniff');
      await new Promise<void>((resolve, reject) => {
        const stream = createReadStream(storedPath(deps, attachment.storedName));
        stream.on('error', reject);
        stream.on('end', () => resolve());
        stream.pipe(res);
      });
    },
  }),
  route({
    method: 'post',
    path: '/api/attachments/:id/archive',
    access: 'observations.write',
    summary: 'Archive an attachment of an observation you recorded',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { attachment: presentAttachment(await archiveAttachment(ctx, ctx.params.id)) } };
    },
  }),
];
