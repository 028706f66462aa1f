// One way to count rows in every upload message (species CSV, fit data tables, team files): row 1 is the first data
// row, under the header; the header and blank lines are not counted. Messages and the pages beside them say so.
import Papa from 'papaparse';

export const ROW_COUNTING = 'Row 1 is the first data row under the header; the header and blank lines are not counted.';

/** "Row 3": the third data row. */
export const rowName = (n: number): string => `Row ${n}`;

/**
 * The data row holding character `offset` of `text`, counted as above. Papa's own error row counts blank lines,
 * so the text up to the offset is parsed again with the same options; a sentinel makes the row at the offset exist.
 */
export function dataRowAt(text: string, offset: number, { hasHeader, delimiter }: { hasHeader: boolean; delimiter?: string }): number {
  const before = Papa.parse<string[]>(`${text.slice(0, Math.max(0, offset))}x`, { skipEmptyLines: 'greedy', delimiter });
  return Math.max(1, before.data.length - (hasHeader ? 1 : 0));
}
