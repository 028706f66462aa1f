// A CSV file or pasted table of K(T) → rows of text cells (T, value, optional σ), with messages for what cannot be read.
// Comma, semicolon or tab separated; a first row that is not numeric is taken as a header.
import Papa from 'papaparse';
import { dataRowAt, ROW_COUNTING, rowName } from '../csv/row-numbers';
import { MAX_DATA_POINTS, MAX_DATA_TEXT_BYTES, type DataRowInput } from '../schemas/fit-data';

export interface ParsedTable {
  rows: DataRowInput[];
  /** the header row, when the first row was one */
  header: string[] | null;
}

export class TableError extends Error {
  constructor(
    message: string,
    readonly field: string = 'text',
  ) {
    super(message);
    this.name = 'TableError';
  }
}

const NUMERIC = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function isNumericCell(cell: string): boolean {
  return NUMERIC.test(cell.trim());
}

/** UTF-8 byte length without Buffer, so the same check runs in the browser. */
export function utf8Bytes(text: string): number {
  return new TextEncoder().encode(text).length;
}

export function parseDataTable(text: string): ParsedTable {
  if (utf8Bytes(text) > MAX_DATA_TEXT_BYTES) throw new TableError('The table is over 256 KB; split it or trim unused columns.');
  // A replacement character or NUL means the file was not UTF-8 text (a spreadsheet, or another encoding).
  if (text.includes('\uFFFD') || text.includes('\u0000')) {
    throw new TableError('The file is not UTF-8 text. Save it from the spreadsheet as “CSV UTF-8” and upload that.');
  }
  const body = text.replace(/^\uFEFF/, '');
  if (body.trim() === '') throw new TableError('The table is empty.');
  const parsed = Papa.parse<string[]>(body.trim(), { skipEmptyLines: 'greedy', delimitersToGuess: [',', ';', '\t'] });
  const quoteError = parsed.errors.find((e) => e.type === 'Quotes');
  let data = parsed.data.map((r) => r.map((c) => c.trim()));
  // One cell per line means no separator was found: try runs of spaces, as copied from a text table.
  if (data.every((r) => r.length === 1)) data = data.map((r) => r[0]!.split(/\s+/));
  const hasHeader = data.length > 0 && !isNumericCell(data[0]![0] ?? '');
  if (quoteError) {
    const n = dataRowAt(body.trim(), quoteError.index ?? 0, { hasHeader, delimiter: parsed.meta.delimiter });
    throw new TableError(`${rowName(n)}: an opening quote is never closed. ${ROW_COUNTING}`);
  }
  let header: string[] | null = null;
  if (hasHeader) {
    header = data[0]!;
    data = data.slice(1);
  }
  const width = header?.length ?? Math.max(...data.map((r) => r.length));
  if (width < 2 || width > 3) {
    throw new TableError(`Give two or three columns: temperature, K (or ln K), and optionally σ. This table has ${width}.`);
  }
  if (data.length > MAX_DATA_POINTS) throw new TableError(`A data set has at most ${MAX_DATA_POINTS} points; this table has ${data.length}.`);
  const rows = data.map((r, i) => {
    if (r.length > width) throw new TableError(`${rowName(i + 1)} has ${r.length} cells; the table has ${width} columns. ${ROW_COUNTING}`);
    return { T: r[0] ?? '', value: r[1] ?? '', sigma: r[2] ?? '' };
  });
  return { rows, header };
}
