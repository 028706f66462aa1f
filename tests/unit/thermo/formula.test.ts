import { describe, expect, it } from 'vitest';
import { ELEMENT_SYMBOLS, countFormula, isElementSymbol } from '@/lib/thermo/formula';
import { expectThermoError } from './expect-thermo-error';

describe('element symbols', () => {
  it('knows the 118 named elements from H to Og', () => {
    // Source: IUPAC Periodic Table of the Elements, 118 elements through Og (from memory).
    expect(ELEMENT_SYMBOLS.size).toBe(118);
    for (const s of ['H', 'He', 'C', 'Fe', 'Hg', 'U', 'Nh', 'Mc', 'Ts', 'Og']) expect(isElementSymbol(s)).toBe(true);
  });

  it('rejects symbols that are not elements', () => {
    for (const s of ['Xx', 'D', 'J', 'Q', 'Uue', 'h', 'CO']) expect(isElementSymbol(s)).toBe(false);
  });
});

describe('countFormula', () => {
  const cases: [string, Record<string, number>][] = [
    ['H2O', { H: 2, O: 1 }],
    ['Ca(OH)2', { Ca: 1, O: 2, H: 2 }],
    ['(NH4)2SO4', { N: 2, H: 8, S: 1, O: 4 }],
    ['(CH3)3CH', { C: 4, H: 10 }],
    ['(CH2)2O', { C: 2, H: 4, O: 1 }],
    ['CO(NH2)2', { C: 1, O: 1, N: 2, H: 4 }],
    ['C3H5(OH)3', { C: 3, H: 8, O: 3 }],
    ['[Cu(NH3)4]', { Cu: 1, N: 4, H: 12 }],
    ['Ca3(PO4)2', { Ca: 3, P: 2, O: 8 }],
    ['CuSO4·5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['Na2CO3·10H2O', { Na: 2, C: 1, O: 13, H: 20 }],
    ['CaCl2·2H2O', { Ca: 1, Cl: 2, H: 4, O: 2 }],
  ];
  it.each(cases)('counts the atoms in %s', (formula, expected) => {
    expect(countFormula(formula).elements).toEqual(expected);
  });

  it('normalises every hydrate separator to "·" and drops spaces around it', () => {
    for (const f of ['CuSO4*5H2O', 'CuSO4.5H2O', 'CuSO4 · 5H2O', 'CuSO4•5H2O']) {
      expect(countFormula(f).canonical).toBe('CuSO4·5H2O');
    }
  });

  it('keeps the written structure in the canonical text', () => {
    expect(countFormula('CH3CH2OH').canonical).toBe('CH3CH2OH');
    expect(countFormula('CH3CH2OH').elements).toEqual(countFormula('C2H6O').elements);
  });

  it('reports positions relative to the outer text', () => {
    expectThermoError(() => countFormula('HXx', 10, 'whatever'), 'PARSE_ERROR', 11);
  });

  it.each([
    ['', 0],
    ['H0', 1],
    ['H02', 1],
    ['C()', 2],
    ['Ca(OH', 2],
    ['Ca(OH]2', 5],
    ['CuSO4·', 6],
    ['H2 O', 2],
    ['2H2O', 0],
    ['H2O%', 3],
    ['H99999999999', 1],
    ['((H10000)10000)10000', 14],
  ])('rejects %j at position %i', (formula, position) => {
    expectThermoError(() => countFormula(formula), 'PARSE_ERROR', position);
  });
});
