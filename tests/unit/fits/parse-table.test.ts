// Reading K(T) tables: CSV, semicolons, tabs, spaces, headers, and the messages for what cannot be read.
import { describe, expect, it } from 'vitest';
import { parseDataTable, TableError } from '@/lib/fits/parse-table';
import { readRows } from '@/lib/fits/read-rows';

describe('parseDataTable', () => {
  it('reads a CSV with a header, a BOM and a σ column', () => {
    const t = parseDataTable('\uFEFFT (K),K,sigma\n300,1.5,0.1\n400,3.25,0.2\n');
    expect(t.header).toEqual(['T (K)', 'K', 'sigma']);
    expect(t.rows).toEqual([{ T: '300', value: '1.5', sigma: '0.1' }, { T: '400', value: '3.25', sigma: '0.2' }]);
  });

  it('reads semicolons, tabs and pasted columns separated by spaces, without a header', () => {
    expect(parseDataTable('300;1.5\n400;2').rows[1]).toEqual({ T: '400', value: '2', sigma: '' });
    expect(parseDataTable('300\t1.5\n400\t2').rows[0]).toEqual({ T: '300', value: '1.5', sigma: '' });
    expect(parseDataTable('300   1.5e-3\n400  2.0e-3').rows[0]).toEqual({ T: '300', value: '1.5e-3', sigma: '' });
  });

  it('refuses text that is not UTF-8, an empty table and the wrong number of columns', () => {
    expect(() => parseDataTable('300,1\uFFFD5')).toThrow(/not UTF-8/);
    expect(() => parseDataTable('PK\u0003\u0004\u0000\u0000')).toThrow(TableError);
    expect(() => parseDataTable('  \n ')).toThrow(/empty/);
    expect(() => parseDataTable('a,b,c,d\n1,2,3,4')).toThrow(/two or three columns/);
    expect(() => parseDataTable('x'.repeat(300 * 1024))).toThrow(/256 KB/);
  });

  it('numbers rows as the species import does: row 1 is the first data row, the header and blank lines not counted', () => {
    expect(() => parseDataTable('T,K\n300,1.5\n\n400,2,0.1,9\n')).toThrow(/^Row 2 has 4 cells.*Row 1 is the first data row under the header/);
    expect(() => parseDataTable('300,1.5\n\n400,"2\n')).toThrow(/^Row 2: an opening quote/);
    expect(() => parseDataTable('T,K\n300,1.5\n\n400,"2\n500,3\n')).toThrow(/^Row 2: an opening quote is never closed/);
  });
});

describe('readRows', () => {
  it('converts °C and names each bad cell by row and column', () => {
    const { points, errors } = readRows(
      [
        { T: '25', value: '2', sigma: '' },
        { T: 'warm', value: '2', sigma: '' },
        { T: '-300', value: '2', sigma: '' },
        { T: '30', value: '0', sigma: '' },
        { T: '35', value: '1', sigma: '-1' },
      ],
      'degC',
      'K',
    );
    expect(errors).toEqual({
      'rows.1.T': 'Row 2: the temperature “warm” is not a number.',
      'rows.2.T': 'Row 3: -300 °C is at or below 0 K.',
      'rows.3.value': 'Row 4: K must be above 0 (got 0); for a logarithm choose ln K.',
      'rows.4.sigma': 'Row 5: σ must be above 0.',
    });
    expect(points[0]).toEqual({ T: 25, value: 2, sigma: null, excluded: false, reason: null });
  });

  it('asks for three points, two temperatures, and σ on all or none', () => {
    const row = (T: string, value = '1', sigma = '') => ({ T, value, sigma });
    expect(readRows([row('300'), row('400')], 'K', 'K').errors.rows).toMatch(/at least 3 points/);
    expect(readRows([row('300'), row('300'), row('300')], 'K', 'K').errors.rows).toMatch(/one temperature/);
    expect(readRows([row('300', '1', '0.1'), row('400'), row('500')], 'K', 'K').errors.rows).toMatch(/every point or on none/);
    expect(readRows([row('300', '-2'), row('400', '-1'), row('500', '0')], 'K', 'lnK').errors).toEqual({});
  });
});
