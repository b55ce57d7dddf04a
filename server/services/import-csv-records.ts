import { parse } from 'csv-parse/sync';
import { IMPORT_MAX_ROWS } from '../../shared/schemas/observations';
import type { ImportRowProblem } from '../../shared/views/observation';
import { unescapeCell } from '../../shared/csv-cells';

/**
 * A CSV read into records keyed by its (lower-cased) header, or the one problem that stops it.
 * `recordCount` counts every row; `records` keeps at most IMPORT_MAX_ROWS + 1 of them (a longer
 * file is refused anyway, and carrying its rows back from the worker would cost the request thread).
 */
export type ImportCsv = { header: string[]; recordCount: number; records: Record<string, string>[] } | ImportRowProblem;

/**
 * Reads the CSV text into records keyed by header; a malformed file is one problem on row 1 (or
 * the line csv-parse stopped at). Pure: it runs in a heavy-job worker thread.
 */
export function readImportCsv(text: string): ImportCsv {
  try {
    const rows = parse(text, { bom: true, skip_empty_lines: true, relax_column_count: false, trim: true }) as string[][];
    if (rows.length === 0) return { row: 1, column: '', message: 'The file is empty' };
    const header = rows[0].map((h) => h.trim().toLowerCase());
    const records = rows.slice(1, IMPORT_MAX_ROWS + 2).map((cells) => Object.fromEntries(header.map((h, i) => [h, unescapeCell(cells[i] ?? '')])));
    return { header, recordCount: rows.length - 1, records };
  } catch (error) {
    const e = error as { lines?: number; message?: string };
    return { row: e.lines ?? 1, column: '', message: `The file is not valid CSV: ${(e.message ?? '').replace(/^.*?: /, '').slice(0, 160)}` };
  }
}
