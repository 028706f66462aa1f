import { describe, expect, it, vi } from 'vitest';
import { parseSpecies, type AliasResolver } from '@/lib/thermo/notation';
import { expectThermoError } from './expect-thermo-error';

// A stand-in for the species library's name table.
const NAMES: Record<string, string> = {
  'ethanol|l': 'C2H5OH(l)',
  'acetone|l': 'CH3COCH3(l)',
  'dimethyl ether|g': 'CH3OCH3(g)',
  '1-butene|g': 'CH2CHCH2CH3(g)',
  '2,2-dimethylpropane|g': 'C(CH3)4(g)',
  'carbon|diamond': 'C(diamond)',
  'broken|s': 'Qq(s)',
};
const resolveAlias: AliasResolver = (name, phaseOrForm) => NAMES[`${name}|${phaseOrForm}`];

describe('phases', () => {
  it.each([
    ['H2(g)', 'g', 'H2(g)'],
    ['H2O(l)', 'l', 'H2O(l)'],
    ['NaCl(s)', 's', 'NaCl(s)'],
    ['NaCl(aq)', 'aq', 'NaCl(aq)'],
    ['NaCl(cr)', 's', 'NaCl(s)'],
    ['H2O (l)', 'l', 'H2O(l)'],
    ['  H2O(l)  ', 'l', 'H2O(l)'],
  ])('%j has phase %s and key %s', (text, phase, key) => {
    const s = parseSpecies(text);
    expect(s.phase).toBe(phase);
    expect(s.key).toBe(key);
    expect(s.form).toBeNull();
    expect(s.raw).toBe(text.trim());
  });

  it.each([
    ['C(diamond)', 'C(diamond)', 'diamond'],
    ['CaCO3(aragonite)', 'CaCO3(aragonite)', 'aragonite'],
    ['TiO2(anatase)', 'TiO2(anatase)', 'anatase'],
  ])('%s is a named solid form', (text, key, form) => {
    const s = parseSpecies(text);
    expect(s).toMatchObject({ key, form, phase: 's' });
  });

  it.each([
    ['C(graphite)', 'C(s)'],
    ['CaCO3(calcite)', 'CaCO3(s)'],
    ['TiO2(rutile)', 'TiO2(s)'],
    ['SiO2(quartz)', 'SiO2(s)'],
    ['S(rhombic)', 'S(s)'],
  ])('the reference form %s shares the plain key %s', (text, key) => {
    expect(parseSpecies(text)).toMatchObject({ key, form: null, phase: 's' });
  });

  it('asks for a phase when none is written', () => {
    const err = expectThermoError(() => parseSpecies('H2O'), 'PARSE_ERROR', 3);
    expect(err.hint).toContain('add a phase such as (g), (l), (s) or (aq)');
  });

  it('reads a final upper-case group as atoms, so the phase is still missing', () => {
    expectThermoError(() => parseSpecies('Ca(OH)2'), 'PARSE_ERROR', 7);
    expectThermoError(() => parseSpecies('Ca(OH)'), 'PARSE_ERROR', 6);
    expectThermoError(() => parseSpecies('H2O(G)'), 'PARSE_ERROR', 6);
  });

  it('rejects spelled-out phase words instead of taking them for a solid form', () => {
    const err = expectThermoError(() => parseSpecies('H2O(liquid)'), 'PARSE_ERROR', 4);
    expect(err.hint).toContain('(l)');
  });
});

describe('charges', () => {
  it.each([
    ['Fe+3(aq)', 'Fe+3(aq)', 3],
    ['Fe3+(aq)', 'Fe+3(aq)', 3],
    ['Ca2+(aq)', 'Ca+2(aq)', 2],
    ['Al3+(aq)', 'Al+3(aq)', 3],
    ['SO4-2(aq)', 'SO4-2(aq)', -2],
    ['SO4^2-(aq)', 'SO4-2(aq)', -2],
    ['SO4^-2(aq)', 'SO4-2(aq)', -2],
    ['SO4^2\u2212(aq)', 'SO4-2(aq)', -2],
    ['NH4+(aq)', 'NH4+(aq)', 1],
    ['Cl-(aq)', 'Cl-(aq)', -1],
    ['OH-(aq)', 'OH-(aq)', -1],
    ['H+(aq)', 'H+(aq)', 1],
    ['NO3-(aq)', 'NO3-(aq)', -1],
    ['Fe(OH)+2(aq)', 'Fe(OH)+2(aq)', 2],
    ['[Cu(NH3)4]+2(aq)', '[Cu(NH3)4]+2(aq)', 2],
    ['Fe3+ (aq)', 'Fe+3(aq)', 3],
  ])('%s has key %s and charge %i', (text, key, charge) => {
    const s = parseSpecies(text);
    expect(s.key).toBe(key);
    expect(s.charge).toBe(charge);
  });

  it('applies the ambiguity rule: trailing digits are a charge only after one element symbol', () => {
    expect(parseSpecies('Fe3+(aq)').elements).toEqual({ Fe: 1 });
    expect(parseSpecies('NH4+(aq)').elements).toEqual({ N: 1, H: 4 });
    // "SO42-" is SO42 with charge -1 by the rule; the sign-first form says what was meant.
    expect(parseSpecies('SO42-(aq)')).toMatchObject({ charge: -1, elements: { S: 1, O: 42 } });
    expect(parseSpecies('SO4-2(aq)')).toMatchObject({ charge: -2, elements: { S: 1, O: 4 } });
  });

  it('keeps a lone element with a count and charge 1 readable (I3- would read back as I with -3)', () => {
    const triiodide = parseSpecies('I3^-(aq)');
    expect(triiodide).toMatchObject({ key: 'I3-1(aq)', charge: -1, elements: { I: 3 } });
    expect(parseSpecies(triiodide.key)).toMatchObject({ key: 'I3-1(aq)', charge: -1, elements: { I: 3 } });
  });

  it.each([
    ['SO4^(aq)', 3],
    ['SO4^x-(aq)', 3],
    ['Fe+0(aq)', 3],
    ['Fe+100(aq)', 3],
    ['Fe++(aq)', 2],
    ['+(aq)', 0],
    ['H+O(aq)', 1],
  ])('rejects the charge in %s at position %i with the notation hint', (text, position) => {
    const err = expectThermoError(() => parseSpecies(text), 'PARSE_ERROR', position);
    expect(err.hint).toContain('sign-first');
  });
});

describe('formulas', () => {
  it.each([
    ['Ca(OH)2(s)', { Ca: 1, O: 2, H: 2 }],
    ['(NH4)2SO4(s)', { N: 2, H: 8, S: 1, O: 4 }],
    ['(CH3)3CH(g)', { C: 4, H: 10 }],
    ['(CH2)2O(g)', { C: 2, H: 4, O: 1 }],
    ['CO(NH2)2(s)', { C: 1, O: 1, N: 2, H: 4 }],
    ['C3H5(OH)3(l)', { C: 3, H: 8, O: 3 }],
  ])('%s keeps its groups in the key and counts atoms through them', (text, elements) => {
    const s = parseSpecies(text);
    expect(s.elements).toEqual(elements);
    expect(s.key).toBe(text);
    expect(s.formula).toBe(text.slice(0, text.lastIndexOf('(')));
  });

  it.each(['CuSO4·5H2O(s)', 'CuSO4*5H2O(s)', 'CuSO4.5H2O(s)'])('%s is copper sulfate pentahydrate', (text) => {
    expect(parseSpecies(text)).toMatchObject({
      key: 'CuSO4·5H2O(s)',
      formula: 'CuSO4·5H2O',
      elements: { Cu: 1, S: 1, O: 9, H: 10 },
    });
  });

  it('keeps the written structure, so isomers get different keys', () => {
    const ethanol = parseSpecies('C2H5OH(l)');
    const ether = parseSpecies('CH3OCH3(l)');
    expect(ethanol.key).toBe('C2H5OH(l)');
    expect(ether.key).toBe('CH3OCH3(l)');
    expect(ethanol.elements).toEqual(ether.elements);
  });

  it('names an unknown element symbol and where it is', () => {
    const err = expectThermoError(() => parseSpecies('Xx2(g)'), 'PARSE_ERROR', 0);
    expect(err.message).toContain('"Xx"');
    expectThermoError(() => parseSpecies('NaXx(s)'), 'PARSE_ERROR', 2);
  });

  it.each([
    ['Ca(OH))2(s)', 6, 'Unexpected ")" at position 6 in "Ca(OH))2(s)"'],
    ['Ca(OH2(s)', 2, 'Unclosed "("'],
    ['H2O(l', 3, 'Unclosed "("'],
    ['(s)', 0, 'Expected a formula'],
    ['H0(g)', 1, 'at least 1'],
    ['H2 O(g)', 2, 'Unexpected space'],
    ['2H2O(l)', 0, 'Unexpected "2"'],
    ['CuSO4·(s)', 6, 'Expected element symbols'],
    ['C()(s)', 2, 'Unexpected ")"'],
    ['H2O(l)(g)', 4, 'Unexpected "l"'],
    ['', 0, 'Expected a species'],
  ])('rejects %j at position %i', (text, position, message) => {
    const err = expectThermoError(() => parseSpecies(text), 'PARSE_ERROR', position);
    expect(err.message).toContain(message);
  });

  it('points at electrons and says where their number goes', () => {
    for (const text of ['e-', 'e', 'e^-', 'e-(aq)']) {
      const err = expectThermoError(() => parseSpecies(text), 'PARSE_ERROR', 0);
      expect(err.hint).toContain('electrons field');
    }
  });

  it('adds the offset and leading spaces to positions', () => {
    expectThermoError(() => parseSpecies('Xx(g)', { offset: 10 }), 'PARSE_ERROR', 10);
    expectThermoError(() => parseSpecies('  Xx(g)'), 'PARSE_ERROR', 2);
    expectThermoError(() => parseSpecies(' H2O', { offset: 5 }), 'PARSE_ERROR', 9);
  });
});

describe('species names', () => {
  it.each([
    ['ethanol(l)', 'ethanol', 'C2H5OH(l)'],
    ['acetone(l)', 'acetone', 'CH3COCH3(l)'],
    ['dimethyl ether(g)', 'dimethyl ether', 'CH3OCH3(g)'],
    ['dimethyl   ether(g)', 'dimethyl ether', 'CH3OCH3(g)'],
    ['1-butene(g)', '1-butene', 'CH2CHCH2CH3(g)'],
    ['2,2-dimethylpropane(g)', '2,2-dimethylpropane', 'C(CH3)4(g)'],
    ['carbon(diamond)', 'carbon', 'C(diamond)'],
  ])('%s resolves through the library to %s', (text, alias, key) => {
    const s = parseSpecies(text, { resolveAlias });
    expect(s).toMatchObject({ key, alias, raw: text });
  });

  it('passes the name and the phase or form to the resolver, with (cr) read as (s)', () => {
    const spy = vi.fn<AliasResolver>(() => 'NaCl(s)');
    parseSpecies('table salt(cr)', { resolveAlias: spy });
    parseSpecies('carbon(diamond)', { resolveAlias: spy });
    expect(spy.mock.calls).toEqual([
      ['table salt', 's'],
      ['carbon', 'diamond'],
    ]);
  });

  it('gives the counts of the resolved formula', () => {
    expect(parseSpecies('ethanol(l)', { resolveAlias }).elements).toEqual({ C: 2, H: 6, O: 1 });
  });

  it('reports an unknown name, with or without a resolver', () => {
    const err = expectThermoError(() => parseSpecies('ethanol(l)'), 'UNKNOWN_SPECIES', 0);
    expect(err.message).toBe('Unknown species name "ethanol(l)"');
    expectThermoError(() => parseSpecies('  unobtainium(s)', { resolveAlias }), 'UNKNOWN_SPECIES', 2);
    expectThermoError(() => parseSpecies('ethanol(g)', { resolveAlias }), 'UNKNOWN_SPECIES', 0);
  });

  it('rejects characters that no name uses', () => {
    expectThermoError(() => parseSpecies('eth@nol(l)', { resolveAlias }), 'PARSE_ERROR', 3);
  });

  it('reports a library key that does not parse', () => {
    const err = expectThermoError(() => parseSpecies('broken(s)', { resolveAlias }), 'PARSE_ERROR', 0);
    expect(err.message).toContain('Qq(s)');
  });
});
