/**
 * Spreadsheet formula injection: a cell that starts with = + - @ (or a tab or carriage
 * return) is run as a formula by common spreadsheet programs. Gelwright stores such cells
 * as plain text and, on export, prefixes them with an apostrophe so they open as text.
 * (OWASP, "CSV Injection"; common practice.) Shared by the server's import and export and the
 * map's CSV download.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

export function looksLikeFormula(cell: string): boolean {
  return FORMULA_START.test(cell);
}

/** For export: neutralise a text cell that a spreadsheet would run. */
export function escapeCell(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value !== 'string') return String(value);
  return looksLikeFormula(value) ? `'${value}` : value;
}

/** For import: undo our own export escape, so a round trip does not add apostrophes. */
export function unescapeCell(cell: string): string {
  return cell.startsWith("'") && looksLikeFormula(cell.slice(1)) ? cell.slice(1) : cell;
}
