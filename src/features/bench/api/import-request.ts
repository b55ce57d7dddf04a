import type { ImportReport } from '@shared/views/observation';
import { ApiError } from '@/lib/api-client';

export interface ImportAnswer {
  status: number;
  report: ImportReport;
}

/**
 * POST /api/observations/import with the CSV under the field `file`.
 * Plain fetch rather than the shared client, for two reasons: a refused file is a 422 whose
 * body is the per-row report the screen must show, and the commit carries an Idempotency-Key header.
 */
export async function postImport(file: File, options: { dryRun: boolean; idempotencyKey?: string }): Promise<ImportAnswer> {
  const form = new FormData();
  form.append('file', file, file.name);
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.idempotencyKey) headers['Idempotency-Key'] = options.idempotencyKey;
  let response: Response;
  try {
    response = await fetch(`/api/observations/import${options.dryRun ? '?dryRun=true' : ''}`, { method: 'POST', credentials: 'same-origin', headers, body: form });
  } catch {
    throw new ApiError(0, 'network', 'Gelwright could not reach the server. Check your connection and try again.');
  }
  const payload = (response.headers.get('content-type') ?? '').includes('application/json') ? await response.json().catch(() => null) : null;
  if ((response.ok || response.status === 422) && payload?.report) return { status: response.status, report: payload.report as ImportReport };
  const error = payload?.error;
  throw new ApiError(response.status, error?.id ?? `http_${response.status}`, error?.message ?? `The server answered ${response.status}`, error?.field, error?.issues);
}
