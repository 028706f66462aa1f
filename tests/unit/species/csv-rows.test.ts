import { describe, expect, it } from 'vitest';
import { readHeader } from '@/lib/species/csv-columns';
import { MAX_IMPORT_ROWS, readSpeciesCsv } from '@/lib/species/csv-rows';

const HEADER = 'formula,phase,name,ΔfH° (kcal/mol),dfG (kJ/mol),S° [J mol-1 K-1],provenance,reference';

describe('species CSV rows', () => {
  it('reads headers with units in brackets, and refuses unknown columns and units', () => {
    const { columns, problems } = readHeader(HEADER.split(','));
    expect(problems).toEqual([]);
    expect(columns.find((c) => c.field === 'dfH')!.unit).toBe('kcal/mol');
    expect(columns.find((c) => c.field === 'S')!.unit).toBe('J/(mol K)');
    expect(readHeader(['formula', 'colour']).problems[0]).toMatch(/Column “colour” is not one we know/);
    expect(readHeader(['formula', 'phase', 'name', 'dfH (kJ/kg)', 'S', 'provenance', 'reference']).problems[0]).toMatch(/unit “kJ\/kg”/);
    expect(readHeader(['formula', 'name']).problems.at(-1)).toMatch(/Missing columns: phase, dfH, S, provenance, reference/);
  });

  it('converts units, checks each row and names the field of each problem', () => {
    // H2O(l), NBS 1982: ΔfH° −285.83 kJ/mol = −68.315 kcal/mol (thermochemical calorie), ΔfG° −237.129, S° 69.91.
    const text = [
      HEADER,
      'H2O,l,water (team),-68.315,-237.129,69.91,citation,NBS 1982',
      'C2H6O,g,test ether,abc,,266.4,estimated,Benson groups',
      'C3H8,g,test propane,-104.7,,-5,measured,Notebook KR-12',
      'C2H6O,g,test ether again,-184.1,,266.4,guessed,none',
      'H2O,l,water twice,-68.315,-237.129,69.91,citation,NBS 1982',
    ].join('\n');
    const r = readSpeciesCsv(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const [good, notNumber, negativeS, badProvenance, twice] = r.rows;
    expect(good!.errors).toEqual({});
    expect(good!.species!.dfH_kJ).toBeCloseTo(-285.83, 2);
    expect(good!.consistency!.status).toBe('consistent');
    expect(notNumber!.errors.dfH).toMatch(/“abc” is not a number/);
    expect(negativeS!.errors.S).toMatch(/above 0/);
    expect(badProvenance!.errors.provenance).toMatch(/citation, measured or estimated/);
    expect(twice!.errors.formula).toMatch(/already on row 1/);
  });

  it('takes a unit written in the cell over the header’s', () => {
    const r = readSpeciesCsv(`${HEADER}\nCO2,g,test carbon dioxide,-393.509 kJ/mol,-394.359,213.74,citation,NBS 1982\n`);
    expect(r.ok && r.rows[0]!.species!.dfH_kJ).toBe(-393.509);
  });

  it('refuses an empty file and one with too many rows, as file problems', () => {
    expect(readSpeciesCsv('')).toMatchObject({ ok: false });
    const many = [HEADER, ...Array.from({ length: MAX_IMPORT_ROWS + 1 }, (_, i) => `C${i + 1}H${2 * i + 4},g,n${i},-100,,300,estimated,x`)].join('\n');
    const r = readSpeciesCsv(many);
    expect(r).toEqual({ ok: false, problems: [expect.stringMatching(/5,001 rows; one import takes at most 5,000/)] });
  });

  it('names the data row of an unclosed quote, skipping blank lines, once, and says how rows are counted', () => {
    const r = readSpeciesCsv(`${HEADER}\nCO2,g,ok,-393.509,-394.359,213.74,citation,NBS 1982\n\n"CO,g,broken,-110.5,-137.2,197.7,citation,NBS 1982\n`);
    expect(r).toEqual({ ok: false, problems: ['Row 2: a quoted cell is not closed.', expect.stringMatching(/^Row 1 is the first data row under the header; the header and blank lines are not counted/)] });
  });
});
