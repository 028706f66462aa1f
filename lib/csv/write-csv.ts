// Every CSV the app writes goes through here, so no cell can run as a spreadsheet formula.
import Papa from 'papaparse';

export type CsvCell = string | number | null;

// Spreadsheets start a formula at =, +, - or @, and some skip leading spaces, tabs and line breaks first,
// so a cell is judged by its first non-blank character as well as its first character.
const FORMULA_START = /^[\s]*[=+\-@]|^[\t\r\n]/;

/** A text cell that would start a formula gets a leading apostrophe; numbers stay numbers. */
export function neutraliseCell(cell: CsvCell): CsvCell {
  if (typeof cell !== 'string') return cell;
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

export function writeCsv(rows: readonly (readonly CsvCell[])[]): string {
  return Papa.unparse(rows.map((row) => row.map(neutraliseCell)), { escapeFormulae: false });
}
