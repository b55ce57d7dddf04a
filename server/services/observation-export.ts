import { once } from 'node:events';
import type { Response } from 'express';
import { stringify } from 'csv-stringify';
import { Op, type WhereOptions } from 'sequelize';
import { IMPORT_COLUMNS, type ObservationListQuery } from '../../shared/schemas/observations';
import { Observation, Recipe, User } from '../models';
import { presentObservation } from '../presenters/observation';
import { escapeCell } from './csv-cells';
import { observationWhere } from './observations';

/** Rows read per query: memory stays at one page however long the bench log is. */
export const EXPORT_PAGE_ROWS = 1000;

const HEADER = [...IMPORT_COLUMNS, 'predicted_state', 'agrees', 'observer', 'observation_id'];

/** After the last row of the previous page, in (mixed_at, id) order. */
const after = (last: Observation | null): WhereOptions =>
  last ? { [Op.or]: [{ mixedAt: { [Op.gt]: last.mixedAt } }, { mixedAt: last.mixedAt, id: { [Op.gt]: last.id } }] } : {};

/**
 * Streams the bench log as CSV: pages of EXPORT_PAGE_ROWS read by keyset (mixed_at, id) and
 * written through csv-stringify's stream, waiting whenever the client reads slower than the
 * database answers, so five exports of a large log hold five pages, not five logs.
 */
export async function streamObservationCsv(query: ObservationListQuery, res: Response) {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="gelwright-bench-log-${new Date().toISOString().slice(0, 10)}.csv"`);
  const csv = stringify();
  csv.pipe(res);
  const write = async (cells: unknown[]) => {
    if (!csv.write(cells)) await once(csv, 'drain');
  };
  const where = observationWhere(query);
  try {
    await write(HEADER);
    let last: Observation | null = null;
    for (;;) {
      // Plain rows, not model instances: building instances is most of a page's CPU.
      const rows = (await Observation.findAll({
        where: { [Op.and]: [where, after(last)] },
        include: [
          { model: Recipe, as: 'recipe', attributes: ['id', 'code', 'predictedState'] },
          { model: User, as: 'observer', attributes: ['id', 'name'] },
        ],
        order: [['mixedAt', 'ASC'], ['id', 'ASC']],
        limit: EXPORT_PAGE_ROWS,
        raw: true,
        nest: true,
      })) as unknown as (Observation & { recipe: Recipe | null; observer: User | null })[];
      for (const row of rows) {
        // A missing join comes back as an object of nulls.
        if (row.recipe?.id == null) row.recipe = null;
        if (row.observer?.id == null) row.observer = null;
      }
      for (const o of rows.map(presentObservation)) {
        await write([o.recipeCode ?? '', o.mixedAt.slice(0, 10), o.ageDays, o.observedState, o.method, o.storageModulusPa, o.yieldStressPa, o.settledHeightPct, o.notes ?? '', o.predictedState ?? '', o.agrees === null ? '' : o.agrees ? 'yes' : 'no', o.observer?.name ?? '', o.id].map(escapeCell));
      }
      if (rows.length < EXPORT_PAGE_ROWS || res.destroyed) break;
      last = rows[rows.length - 1];
    }
    csv.end();
    await once(res, 'finish');
  } catch (error) {
    // The header is out: a failure half-way can only cut the download short, never pass as whole.
    csv.destroy();
    res.destroy(error as Error);
  }
}
