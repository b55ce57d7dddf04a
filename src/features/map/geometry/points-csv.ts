import { escapeCell } from '@shared/csv-cells';
import type { MapPoint } from './types';

/** One CSV cell: a text cell a spreadsheet would run made inert (escapeCell), quoted when needed. */
function cell(value: string | number | boolean | null): string {
  const text = escapeCell(value);
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The map's points as CSV, with the axis they were drawn on named in the header. */
export function pointsToCsv(points: MapPoint[], yLabel: string): string {
  const header = ['kind', 'id', 'code', 'name', 'phi', yLabel, 'state', 'predicted_state', 'agrees', 'age_days'];
  const lines = points.map((p) => [p.kind, p.id, p.code, p.name, p.x, p.y, p.state, p.predicted, p.agrees, p.ageDays].map(cell).join(','));
  return [header.map(cell).join(','), ...lines].join('\n') + '\n';
}
