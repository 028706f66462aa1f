import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { dataRowAt } from '@/lib/csv/row-numbers';

// Where Papa reports an unclosed quote, in our counting (row 1 = first data row, blank lines skipped).
const rowOfQuoteError = (text: string, hasHeader = true) => {
  const error = Papa.parse<string[]>(text, { skipEmptyLines: 'greedy' }).errors.find((e) => e.type === 'Quotes')!;
  return dataRowAt(text, error.index!, { hasHeader });
};

describe('dataRowAt', () => {
  it('counts data rows under the header', () => {
    expect(rowOfQuoteError('a,b\nx,y\n1,"2\n3,4\n')).toBe(2);
    expect(rowOfQuoteError('a,b\nx,"y\n')).toBe(1);
  });

  it('does not count blank lines, which Papa’s own row number does', () => {
    const text = 'a,b\n\n\nx,y\n"1,2\n';
    expect(Papa.parse(text, { skipEmptyLines: 'greedy' }).errors[0]!.row).toBe(4);
    expect(rowOfQuoteError(text)).toBe(2);
  });

  it('counts the first line as row 1 when there is no header', () => {
    expect(rowOfQuoteError('300,1.5\n400,"2\n', false)).toBe(2);
  });
});
