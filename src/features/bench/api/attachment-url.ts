import type { AttachmentView } from '@shared/views/observation';

/** Where a browser fetches an attachment: inline for PNG and JPEG thumbnails, a download otherwise. */
export const attachmentUrl = (attachment: Pick<AttachmentView, 'id'>, inline = false) => `/api/attachments/${attachment.id}${inline ? '?inline=true' : ''}`;

/** The server shows only these two types inline; anything else is sent as a download. */
export const showsInline = (attachment: Pick<AttachmentView, 'mimeType'>) => attachment.mimeType === 'image/png' || attachment.mimeType === 'image/jpeg';
