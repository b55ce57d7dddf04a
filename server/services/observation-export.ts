import { finished } from 'node:stream/promises';
import type { Response } from 'express';
import { stringify } from 'csv-stringify/sync';
import pLimit from 'p-limit';
import { Op, type WhereOptions } from 'sequelize';
import { IMPORT_COLUMNS, type ObservationListQuery } from '../../shared/schemas/observations';
import { observationAgrees, type ObservedState, type PredictedState } from '../../shared/states';
import { Observation, Recipe, User } from '../models';
import { escapeCell } from '../../shared/csv-cells';
import { observationWhere } from './observations';

/**
 * Rows read per query: memory stays at one page however long the bench log is, and each page is
 * a few milliseconds of request-thread work, so other requests get their turn between pages.
 */
export const EXPORT_PAGE_ROWS = 500;

/**
 * Full exports streaming at once across all users; later ones wait their turn (the response has
 * not started, so the client just waits). An export is bound by CPU (the database's and the
 * request thread's), so running them one after another delivers as many per minute as running
 * them side by side, while everyone else's requests stay quick: measured with five clients
 * exporting a 60,000-row log during a fit, /api/health p99 was about 40 ms with one at a time and
 * 50–85 ms with two (npm run bench, 2 cores).
 */
export const EXPORTS_AT_ONCE = 1;
const exportSlots = pLimit(EXPORTS_AT_ONCE);

/** Runs `work` when one of the EXPORTS_AT_ONCE slots is free. */
export function withExportSlot<T>(work: () => Promise<T>): Promise<T> {
  return exportSlots(work);
}

/** Exports streaming now, and exports waiting for a slot. */
export function exportQueue() {
  return { running: exportSlots.activeCount, waiting: exportSlots.pendingCount };
}

const HEADER = [...IMPORT_COLUMNS, 'predicted_state', 'agrees', 'observer', 'observation_id'];

/** One exported row as the database returns it: plain columns, joined ones by their dotted names. */
interface ExportRow {
  id: number;
  mixedAt: Date;
  ageDays: number;
  observedState: ObservedState;
  method: string;
  storageModulusPa: number | null;
  yieldStressPa: number | null;
  settledHeightPct: number | null;
  sampleHeightMm: number | null;
  notes: string | null;
  adhocPredictedState: PredictedState | null;
  'recipe.code': string | null;
  'recipe.predictedState': PredictedState | null;
  'observer.name': string | null;
}

/** After the last row of the previous page, in (mixed_at, id) order. */
const after = (last: ExportRow | null): WhereOptions =>
  last ? { [Op.or]: [{ mixedAt: { [Op.gt]: last.mixedAt } }, { mixedAt: last.mixedAt, id: { [Op.gt]: last.id } }] } : {};

/** A row's CSV cells, in HEADER order (the same columns and rules as the bench log's view). */
function cellsOf(row: ExportRow): string[] {
  // The prediction compared with: the recipe's current one, or the ad-hoc one (as presentObservation).
  const predicted = row['recipe.code'] !== null ? row['recipe.predictedState'] : row.adhocPredictedState;
  const agrees = observationAgrees(row.observedState, predicted);
  return [
    row['recipe.code'] ?? '', row.mixedAt.toISOString().slice(0, 10), row.ageDays, row.observedState, row.method,
    row.storageModulusPa, row.yieldStressPa, row.settledHeightPct, row.sampleHeightMm, row.notes ?? '', predicted ?? '',
    agrees === null ? '' : agrees ? 'yes' : 'no', row['observer.name'] ?? '', row.id,
  ].map(escapeCell);
}

/**
 * Streams the bench log as CSV: pages of EXPORT_PAGE_ROWS read by keyset (mixed_at, id) and
 * written a page at a time with csv-stringify, waiting whenever the client reads slower than the
 * database answers, so five exports of a large log hold five pages, not five logs. At most
 * EXPORTS_AT_ONCE stream at a time across all users.
 */
export async function streamObservationCsv(query: ObservationListQuery, res: Response) {
  await withExportSlot(async () => {
    if (res.destroyed) return; // the client left while waiting for a slot
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="gelwright-bench-log-${new Date().toISOString().slice(0, 10)}.csv"`);
    // Wait for the client to read, or to leave: a slot must never be held by a gone client.
    const drainedOrClosed = () =>
      new Promise<void>((resolve) => {
        const done = () => {
          res.off('drain', done);
          res.off('close', done);
          resolve();
        };
        res.on('drain', done);
        res.on('close', done);
      });
    // One write per page (csv-stringify's synchronous form on the page's rows): one socket write
    // and one back-pressure check per 500 rows, not per row.
    const write = async (rows: unknown[][]) => {
      if (!res.write(stringify(rows))) await drainedOrClosed();
    };
    const where = observationWhere(query);
    try {
      await write([HEADER]);
      let last: ExportRow | null = null;
      while (!res.destroyed) {
        // Plain rows with only the columns written, not model instances: building instances (or
        // nesting the joined columns) is most of a page's CPU on the request thread.
        const rows = (await Observation.findAll({
          where: { [Op.and]: [where, after(last)] },
          attributes: ['id', 'mixedAt', 'ageDays', 'observedState', 'method', 'storageModulusPa', 'yieldStressPa', 'settledHeightPct', 'sampleHeightMm', 'notes', 'adhocPredictedState'],
          include: [
            { model: Recipe, as: 'recipe', attributes: ['code', 'predictedState'] },
            { model: User, as: 'observer', attributes: ['name'] },
          ],
          order: [['mixedAt', 'ASC'], ['id', 'ASC']],
          limit: EXPORT_PAGE_ROWS,
          raw: true,
        })) as unknown as ExportRow[];
        if (rows.length > 0) await write(rows.map(cellsOf));
        if (rows.length < EXPORT_PAGE_ROWS) break;
        last = rows[rows.length - 1];
      }
      res.end();
      await finished(res);
    } catch (error) {
      // The header is out: a failure half-way can only cut the download short, never pass as whole.
      res.destroy(error as Error);
    }
  });
}
