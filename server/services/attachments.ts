import { createHash, randomUUID } from 'node:crypto';
import { mkdir, unlink, writeFile } from 'node:fs/promises';
import { extname, join, resolve } from 'node:path';
import { fileTypeFromBuffer } from 'file-type';
import multer from 'multer';
import type { RequestHandler } from 'express';
import { badRequest, notFound } from '../errors';
import type { AppDeps, HandlerContext } from '../http/route';
import { Attachment } from '../models';
import { lockOwnObservation } from './observations';

/** What may be attached: micrographs by their bytes, instrument exports as clean text. */
const IMAGE_TYPES: Record<string, string> = { 'image/png': 'png', 'image/jpeg': 'jpg', 'image/tiff': 'tif' };
const TEXT_EXTENSIONS: Record<string, string> = { '.csv': 'text/csv', '.txt': 'text/plain' };

/**
 * multer in memory with size and count limits: an oversized or surplus file aborts the
 * upload while it streams, before anything reaches the disk or the database.
 */
export function attachmentUpload(deps: AppDeps): RequestHandler {
  return multer({
    storage: multer.memoryStorage(),
    // File names without a charset are taken as UTF-8 (what browsers send), not Latin-1.
    defParamCharset: 'utf8',
    limits: { fileSize: deps.config.UPLOAD_MAX_BYTES, files: deps.config.UPLOAD_MAX_FILES, fields: 10, fieldSize: 10_000, parts: deps.config.UPLOAD_MAX_FILES + 10 },
  }).array('files', deps.config.UPLOAD_MAX_FILES);
}

/** A CSV upload: one file under the field name "file". */
export function csvUpload(deps: AppDeps): RequestHandler {
  return multer({ storage: multer.memoryStorage(), defParamCharset: 'utf8', limits: { fileSize: deps.config.UPLOAD_MAX_BYTES, files: 1, fields: 10, parts: 12 } }).single('file');
}

/** True for bytes that decode as UTF-8 text without NUL or other control bytes (tab, CR, LF allowed). */
function isCleanText(buffer: Buffer): boolean {
  if (buffer.includes(0)) return false;
  const text = new TextDecoder('utf-8', { fatal: false }).decode(buffer);
  if (text.includes('\uFFFD')) return false;
  return !/[\u0001-\u0008\u000B\u000C\u000E-\u001F\u007F]/.test(text);
}

export interface SniffedFile {
  originalName: string;
  mimeType: string;
  extension: string;
  buffer: Buffer;
  sha256: string;
}

/** Decides a file's type from its bytes; the name only has to agree for text files. */
export async function sniff(file: Express.Multer.File, index: number): Promise<SniffedFile> {
  const field = `files.${index}`;
  const originalName = safeOriginalName(file.originalname);
  if (file.size === 0) throw badRequest(`${field}: ${originalName} is empty`, field);
  const detected = await fileTypeFromBuffer(file.buffer);
  let mimeType: string;
  let extension: string;
  if (detected && IMAGE_TYPES[detected.mime]) {
    mimeType = detected.mime;
    extension = IMAGE_TYPES[detected.mime];
  } else if (!detected && TEXT_EXTENSIONS[extname(originalName).toLowerCase()] && isCleanText(file.buffer)) {
    mimeType = TEXT_EXTENSIONS[extname(originalName).toLowerCase()];
    extension = extname(originalName).toLowerCase().slice(1);
  } else {
    const what = detected ? `its content is ${detected.mime}` : 'its content is not a PNG, JPEG or TIFF image, nor clean CSV or TXT text';
    throw badRequest(`${field}: ${originalName} was refused: ${what}. Attach micrographs (PNG, JPEG, TIFF) or instrument files (CSV, TXT).`, field);
  }
  return { originalName, mimeType, extension, buffer: file.buffer, sha256: createHash('sha256').update(file.buffer).digest('hex') };
}

/** The name as the uploader gave it, for display only: no path, no control characters. */
export function safeOriginalName(name: string): string {
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  const cleaned = base.replace(/[\u0000-\u001F\u007F"<>|:*?]/g, '_').trim().slice(0, 200);
  return cleaned === '' || cleaned === '.' || cleaned === '..' ? 'file' : cleaned;
}

export function attachmentsDir(deps: AppDeps) {
  return resolve(deps.config.DATA_DIR, 'attachments');
}

/** Writes the bytes under a name the server made up; returns it and a remover for rollback. */
export async function storeBytes(deps: AppDeps, file: SniffedFile) {
  const storedName = `${randomUUID()}.${file.extension}`;
  const dir = join(attachmentsDir(deps), storedName.slice(0, 2));
  await mkdir(dir, { recursive: true });
  const path = join(dir, storedName);
  await writeFile(path, file.buffer, { flag: 'wx' });
  return { storedName, remove: () => unlink(path).catch(() => {}) };
}

export function storedPath(deps: AppDeps, storedName: string) {
  if (!/^[0-9a-f-]{36}\.[a-z]{3,4}$/.test(storedName)) throw new Error('bad stored name');
  return join(attachmentsDir(deps), storedName.slice(0, 2), storedName);
}

/** A live attachment, or a 404 (also for an archived one). */
export async function loadLiveAttachment(id: number) {
  const attachment = await Attachment.findByPk(id);
  if (!attachment || attachment.archivedAt) throw notFound('Attachment');
  return attachment;
}

/** Archives an attachment of an observation the user may change (its observer or an administrator). */
export async function archiveAttachment(ctx: HandlerContext<unknown, unknown, unknown>, id: number) {
  const attachment = await Attachment.findByPk(id, { transaction: ctx.transaction, lock: ctx.transaction?.LOCK.UPDATE });
  if (!attachment) throw notFound('Attachment');
  await lockOwnObservation(ctx, attachment.observationId);
  if (!attachment.archivedAt) {
    attachment.archivedAt = new Date();
    await attachment.save({ transaction: ctx.transaction });
    await ctx.audit({ action: 'attachment.archived', entityType: 'attachment', entityId: attachment.id });
  }
  return attachment;
}

/**
 * Attaches uploaded files to an observation the user may change. Every file is checked before
 * any is written: one bad file refuses the whole upload; files written before a failure are removed.
 */
export async function attachFiles(ctx: HandlerContext<unknown, unknown, unknown>, observationId: number, files: Express.Multer.File[]) {
  const observation = await lockOwnObservation(ctx, observationId);
  const sniffed = await Promise.all(files.map((f, i) => sniff(f, i)));
  const written: { remove: () => Promise<void> }[] = [];
  try {
    const created: Attachment[] = [];
    for (const file of sniffed) {
      const stored = await storeBytes(ctx.deps, file);
      written.push(stored);
      const row = await Attachment.create(
        { observationId: observation.id, originalName: file.originalName, storedName: stored.storedName, mimeType: file.mimeType, sizeBytes: file.buffer.length, sha256: file.sha256, uploaderId: ctx.user!.id },
        { transaction: ctx.transaction },
      );
      await ctx.audit({ action: 'attachment.uploaded', entityType: 'attachment', entityId: row.id, details: { observationId: observation.id, type: file.mimeType, bytes: file.buffer.length } });
      created.push(row);
    }
    return created;
  } catch (error) {
    await Promise.all(written.map((w) => w.remove()));
    throw error;
  }
}
