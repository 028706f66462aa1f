// Formula injection in CSV exports: cells that a spreadsheet would read as a formula start with an apostrophe
// (the usual neutralisation, common practice; OWASP "CSV Injection" names = + - @ tab and carriage return).
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { buildComparison } from '@/lib/compare/build-comparison';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import { metricsCsv } from '@/components/compare/metrics-csv';
import { neutraliseCell, writeCsv } from '@/lib/csv/write-csv';
import { CARBON_BURN, CALCINATION, forComparison, oneStep } from '../compare/compare-fixtures';

const readBack = (csv: string) => Papa.parse<string[]>(csv, { delimiter: ',' }).data;

describe('writeCsv', () => {
  it.each([
    ['=HYPERLINK("http://evil.example","x")'],
    ['+1+1'],
    ['-2+3'],
    ['@SUM(A1)'],
    ['\t=1'],
    ['\r=1'],
    ['=cmd|\' /C calc\'!A0\nsecond line'],
    ['\n=1+1'],
    ['  =1+1'],
  ])('neutralises %j by its first character', (text) => {
    const [[cell]] = readBack(writeCsv([[text]])) as [[string]];
    expect(cell.startsWith("'")).toBe(true);
    expect(cell.slice(1)).toBe(text);
  });

  it('leaves ordinary text and numbers as they are', () => {
    expect(neutraliseCell('Route A')).toBe('Route A');
    expect(neutraliseCell('ΔG° −12.4 kJ')).toBe('ΔG° −12.4 kJ');
    expect(neutraliseCell(-12.4)).toBe(-12.4);
    expect(readBack(writeCsv([['a', -3.5, null]]))).toEqual([['a', '-3.5', '']]);
  });
});

describe('the compare CSV', () => {
  it('neutralises a route name with a line break and a leading =', () => {
    const evil = forComparison(oneStep('CO2(g)', CARBON_BURN), { name: '=HYPERLINK("http://evil.example")\nPlan B' });
    const plain = forComparison(oneStep('CaO(s)', CALCINATION), { name: 'Plan A' });
    const csv = metricsCsv(buildComparison([evil, plain], {}, nbsLookup), { energyUnit: 'kJ', temperatureUnit: 'K', pressureUnit: 'bar' } as never, new Set(METRIC_ROWS.map((r) => r.key)));
    const cells = readBack(csv).flat();
    expect(cells).toContain(`'=HYPERLINK("http://evil.example")\nPlan B`);
    expect(cells.filter((c) => /^[\s]*[=+\-@]/.test(c) && Number.isNaN(Number(c)))).toEqual([]);
  });
});
