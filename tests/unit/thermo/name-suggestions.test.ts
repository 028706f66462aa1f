// An unknown species name is answered with the closest library names, same phase first.
import { describe, expect, it } from 'vitest';
import { evaluateStep } from '@/lib/thermo/evaluate';
import { parseSpecies } from '@/lib/thermo/notation';
import { builtinLookup, layeredLookup } from '@/lib/thermo/species-library';
import { thermoErrorOf } from './thermo-error-of';

const unknownName = (equation: string, lookup = builtinLookup) => {
  const err = thermoErrorOf(() => evaluateStep({ equation }, { lookup }));
  expect(err.code).toBe('UNKNOWN_SPECIES');
  expect(err.field).toBe('equation');
  return err;
};

describe('suggestions for unknown species names', () => {
  it('suggests ethanol(l) for ethanoll(l), as text that resolves', () => {
    const err = unknownName('ethanoll(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)');
    expect(err.message).toMatch(/^Unknown species name "ethanoll\(l\)" \(closest: ethanol\(l\), /);
    expect(err.hint).toBe('did you mean ethanol(l)?');
    const suggestions = err.details!.suggestions as string[];
    expect(suggestions[0]).toBe('ethanol(l)');
    expect(suggestions.length).toBeLessThanOrEqual(5);
    const back = parseSpecies(suggestions[0]!, { resolveAlias: (n, p) => builtinLookup.resolveAlias(n, p) });
    expect(back.key).toBe('C2H5OH(l)');
  });

  it('suggests acetone for acetne(l), the same phase first', () => {
    const err = unknownName('acetne(l) + 4 O2(g) -> 3 CO2(g) + 3 H2O(l)');
    const suggestions = err.details!.suggestions as string[];
    expect(suggestions[0]).toBe('acetone(l)');
    expect(suggestions).toContain('acetone(g)');
    expect(suggestions.indexOf('acetone(g)')).toBeGreaterThan(suggestions.indexOf('acetone(l)'));
    expect(err.position).toBe(0);
  });

  it('prefers the phase as written when two spellings are equally close', () => {
    const gas = unknownName('ethanoll(g) -> C2H5OH(l)').details!.suggestions as string[];
    expect(gas[0]).toBe('ethanol(g)');
    expect(gas.indexOf('ethanol(g)')).toBeLessThan(gas.indexOf('ethanol(l)'));
  });

  it('offers library keys too, and one spelling per species', () => {
    const s = unknownName('h2o(l) -> H2O(g)').details!.suggestions as string[];
    expect(s[0]).toBe('H2O(l)');
    const typo = unknownName('ethyl alcohl(l) -> C2H5OH(g)').details!.suggestions as string[];
    expect(typo[0]).toBe('ethyl alcohol(l)');
    expect(typo).not.toContain('ethanol(l)'); // same species, already offered by its closer name
  });

  it('keeps the plain message and hint when nothing is close', () => {
    const err = unknownName('unobtainium(s) -> H2(g)');
    expect(err.message).toBe('Unknown species name "unobtainium(s)"');
    expect(err.hint).toMatch(/write the formula instead/);
    expect(err.details!.suggestions).toEqual([]);
  });

  it('includes a team lookup\'s own names', () => {
    const base = builtinLookup.get('C2H5OH(l)')!;
    const team = layeredLookup([{ ...base, key: 'C2H6O(l)', formula: 'C2H6O', aliases: ['grain spirit'] }]);
    const err = unknownName('grain spirt(l) -> H2(g)', team);
    expect(err.details!.suggestions as string[]).toContain('grain spirit(l)');
  });
});
