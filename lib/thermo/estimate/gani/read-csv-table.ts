// Reads one of the committed group tables (CSV with a header row) from lib/thermo/data at first use.
import Papa from 'papaparse';
import { readDataText } from '../../data/data-files';

export function readCsvTable(relative: string): Record<string, string>[] {
  const parsed = Papa.parse<Record<string, string>>(readDataText(relative), { header: true, skipEmptyLines: true });
  if (parsed.errors.length > 0) {
    const first = parsed.errors[0]!;
    throw new Error(`${relative}: row ${first.row ?? '?'}: ${first.message}`);
  }
  return parsed.data;
}

/** A numeric cell; empty means "no value" (null), anything else unreadable is a data error. */
export function numberCell(row: Record<string, string>, column: string, file: string): number | null {
  const text = (row[column] ?? '').trim();
  if (text === '') return null;
  const x = Number(text);
  if (!Number.isFinite(x)) throw new Error(`${file}: column ${column} holds "${text}", not a number`);
  return x;
}
