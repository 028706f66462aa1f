import { fraction } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { formatEquation, parseEquation, reverseEquation, scaleEquation, type ParsedEquation } from '@/lib/thermo/equation';
import type { AliasResolver } from '@/lib/thermo/notation';
import { expectThermoError } from './expect-thermo-error';

const keys = (eq: ParsedEquation): [string[], string[]] => [
  eq.reactants.map((t) => t.species.key),
  eq.products.map((t) => t.species.key),
];
const coefficients = (eq: ParsedEquation): string[] =>
  [...eq.reactants, ...eq.products].map((t) => t.coefficient.toFraction());

describe('arrows', () => {
  it.each(['->', '→', '=', '<=>', '⇌'] as const)('reads the arrow %s', (arrow) => {
    const eq = parseEquation(`2 H2(g) + O2(g) ${arrow} 2 H2O(l)`);
    expect(eq.arrow).toBe(arrow);
    expect(keys(eq)).toEqual([['H2(g)', 'O2(g)'], ['H2O(l)']]);
  });

  it('needs an arrow and lists the accepted ones', () => {
    const text = '2 H2(g) + O2(g)';
    const err = expectThermoError(() => parseEquation(text), 'PARSE_ERROR', text.length);
    for (const arrow of ['->', '→', '=', '<=>', '⇌']) expect(err.hint).toContain(arrow);
  });

  it('rejects a second arrow at its position', () => {
    expectThermoError(() => parseEquation('A(g) -> B(g) => C(g)'), 'PARSE_ERROR', 13);
    expectThermoError(() => parseEquation('H2(g) -> H2(g) ⇌ H2(g)'), 'PARSE_ERROR', 15);
  });

  it('rejects an empty side', () => {
    expectThermoError(() => parseEquation(' -> H2(g)'), 'PARSE_ERROR', 1);
    expectThermoError(() => parseEquation('H2(g) ->  '), 'PARSE_ERROR', 10);
  });
});

describe('coefficients', () => {
  it('reads integers, fractions and decimals exactly', () => {
    const eq = parseEquation('H2(g) + 1/2 O2(g) -> H2O(l)');
    expect(eq.reactants[1]!.coefficient.equals(fraction(1, 2))).toBe(true);
    expect(eq.reactants[1]!.value).toBe(0.5);
    expect(eq.reactants[0]!.value).toBe(1);
    const dec = parseEquation('0.1 H2(g) + 0.05 O2(g) -> 0.1 H2O(l)');
    expect(dec.reactants[0]!.coefficient.n).toBe(1n);
    expect(dec.reactants[0]!.coefficient.d).toBe(10n);
    expect(dec.reactants[1]!.coefficient.d).toBe(20n);
    // 19 significant digits are more than a double holds, so any detour through a float shows here.
    const long = parseEquation('1.234567890123456789 H2(g) -> 1.234567890123456789 H2(g)').reactants[0]!.coefficient;
    expect(long.n).toBe(1234567890123456789n);
    expect(long.d).toBe(1000000000000000000n);
    expect(coefficients(parseEquation('.5 O2(g) -> O(g)'))).toEqual(['1/2', '1']);
  });

  it('reads coefficients glued to the species', () => {
    const eq = parseEquation('2H2(g)+1/2O2(g)->0.5O2(g)+2H2O(l)');
    expect(coefficients(eq)).toEqual(['2', '1/2', '1/2', '2']);
    expect(keys(eq)).toEqual([['H2(g)', 'O2(g)'], ['O2(g)', 'H2O(l)']]);
  });

  it('does not take a hydrate multiplier or a name locant for a coefficient', () => {
    const eq = parseEquation('2CuSO4.5H2O(s) -> 2 CuSO4(s) + 10 H2O(g)');
    expect(eq.reactants[0]).toMatchObject({ value: 2, species: { key: 'CuSO4·5H2O(s)' } });
    const resolveAlias: AliasResolver = (name) => (name === '1-butene' ? 'CH2CHCH2CH3(g)' : undefined);
    const named = parseEquation('1-butene(g) + 2 1-butene(g) -> C8H16(g) + CH2CHCH2CH3(g)', { resolveAlias });
    expect(coefficients(named)).toEqual(['1', '2', '1', '1']);
    expect(named.reactants[1]!.species.alias).toBe('1-butene');
  });

  it.each([
    ['0 H2(g) -> H2(g)', 0],
    ['H2(g) + 0.0 O2(g) -> H2O(l)', 8],
    ['-2 H2(g) -> H2(g)', 0],
    ['H2(g) -> \u22121 H2(g)', 9],
    ['1/0 H2(g) -> H2(g)', 0],
    ['H2(g) -> 2', 10],
  ])('rejects the coefficient in %j at position %i', (text, position) => {
    expectThermoError(() => parseEquation(text), 'PARSE_ERROR', position);
  });
});

describe('terms', () => {
  it('tells charge signs from "+" separators', () => {
    expect(keys(parseEquation('H+(aq)+OH-(aq)->H2O(l)'))).toEqual([['H+(aq)', 'OH-(aq)'], ['H2O(l)']]);
    expect(keys(parseEquation('NH4+(aq) + OH-(aq) = NH3(aq) + H2O(l)'))).toEqual([
      ['NH4+(aq)', 'OH-(aq)'],
      ['NH3(aq)', 'H2O(l)'],
    ]);
    expect(keys(parseEquation('Fe(OH)+2(aq)+H+(aq)->Fe3+(aq)+H2O(l)'))).toEqual([
      ['Fe(OH)+2(aq)', 'H+(aq)'],
      ['Fe+3(aq)', 'H2O(l)'],
    ]);
    expect(parseEquation('Cl-(aq)+Ag+(aq)->AgCl(s)').reactants.map((t) => t.species.charge)).toEqual([-1, 1]);
  });

  it('turns electrons away towards the electrons field', () => {
    const err = expectThermoError(() => parseEquation('Fe3+(aq) + e- -> Fe2+(aq)'), 'PARSE_ERROR', 11);
    expect(err.hint).toContain('electrons field');
  });

  it('allows a species on both sides', () => {
    const eq = parseEquation('H2O(l) + CO2(g) -> H2CO3(aq) + H2O(l)');
    expect(keys(eq)).toEqual([['H2O(l)', 'CO2(g)'], ['H2CO3(aq)', 'H2O(l)']]);
  });

  it('resolves species names inside equations', () => {
    const resolveAlias: AliasResolver = (name, phase) => (name === 'ethanol' && phase === 'l' ? 'C2H5OH(l)' : undefined);
    const eq = parseEquation('ethanol(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', { resolveAlias });
    expect(eq.reactants[0]!.species).toMatchObject({ key: 'C2H5OH(l)', alias: 'ethanol', raw: 'ethanol(l)' });
  });

  it.each([
    ['H2(g) O2(g) -> H2O(l)', 6],
    ['H2(g) + + O2(g) -> H2O(l)', 8],
    ['+ H2(g) -> H2(g)', 0],
    ['H2(g) + -> H2(g)', 8],
    ['H2(g) + Xx(g) -> H2O(l)', 8],
    ['H2(g) + O2 -> H2O(l)', 10],
    ['Ca(OH))2(s) -> CaO(s) + H2O(g)', 6],
  ])('rejects %j at position %i of the whole equation', (text, position) => {
    const err = expectThermoError(() => parseEquation(text), 'PARSE_ERROR', position);
    expect(err.message).toContain(`position ${position}`);
  });

  it('places an unknown name at its position in the equation', () => {
    expectThermoError(() => parseEquation('2 H2(g) + O2(g) -> 2 H2O(l) + ethanol(l)'), 'UNKNOWN_SPECIES', 30);
  });
});

describe('formatting and transforms', () => {
  it('formats with library keys, unit coefficients left out and ⇌', () => {
    expect(formatEquation(parseEquation('2H2(g)+O2(g)->2H2O(l)'))).toBe('2 H2(g) + O2(g) ⇌ 2 H2O(l)');
    expect(formatEquation(parseEquation('H2(g) + 0.5 O2(g) = H2O(l)'))).toBe('H2(g) + 1/2 O2(g) ⇌ H2O(l)');
    expect(formatEquation(parseEquation('Fe3+(aq) + 3 OH-(aq) → Fe(OH)3(s)'))).toBe('Fe+3(aq) + 3 OH-(aq) ⇌ Fe(OH)3(s)');
    expect(formatEquation(parseEquation('CuSO4*5H2O(cr) -> CuSO4(s) + 5 H2O(g)'))).toBe('CuSO4·5H2O(s) ⇌ CuSO4(s) + 5 H2O(g)');
  });

  it('keeps the raw text as written', () => {
    expect(parseEquation('  2H2(g)+O2(g)->2H2O(l) ').raw).toBe('2H2(g)+O2(g)->2H2O(l)');
  });

  it('reverses the sides', () => {
    const rev = reverseEquation(parseEquation('CaCO3(s) -> CaO(s) + CO2(g)'));
    expect(keys(rev)).toEqual([['CaO(s)', 'CO2(g)'], ['CaCO3(s)']]);
    expect(rev.raw).toBe('CaO(s) + CO2(g) ⇌ CaCO3(s)');
  });

  it('scales by fractions and numbers exactly', () => {
    const eq = parseEquation('2 H2(g) + O2(g) -> 2 H2O(l)');
    expect(formatEquation(scaleEquation(eq, fraction(1, 2)))).toBe('H2(g) + 1/2 O2(g) ⇌ H2O(l)');
    const tripled = scaleEquation(eq, 3);
    expect(coefficients(tripled)).toEqual(['6', '3', '6']);
    expect(tripled.reactants[0]!.value).toBe(6);
  });

  it.each([0, -1, Number.NaN, Number.POSITIVE_INFINITY])('refuses to scale by %d', (factor) => {
    const eq = parseEquation('H2(g) -> 2 H(g)');
    const err = expectThermoError(() => scaleEquation(eq, factor), 'INVALID_VALUE');
    expect(err.field).toBe('factor');
  });
});
