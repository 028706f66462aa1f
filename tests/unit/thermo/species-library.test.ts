import { describe, expect, it } from 'vitest';
import { lookupParseOptions } from '@/lib/thermo/lookup-parse-options';
import { parseSpecies } from '@/lib/thermo/notation';
import { builtinLookup, builtinSpecies, layeredLookup, libraryMeta } from '@/lib/thermo/species-library';
import type { SpeciesRecord } from '@/lib/thermo/species-types';

describe('built-in species library', () => {
  it('is at 298.15 K and 1 bar and cites its sources in full', () => {
    expect(libraryMeta.referenceTemperature_K).toBe(298.15);
    expect(libraryMeta.standardPressure_bar).toBe(1);
    expect(libraryMeta.sources.some((s) => /Wagman/.test(s) && /Suppl\. 2/.test(s))).toBe(true);
    expect(libraryMeta.sources.some((s) => /NASA\/TP-2002-211556/.test(s))).toBe(true);
  });

  it('uses keys the equation notation reads back to themselves, with the same elements and charge', () => {
    // Structure keys ({InChIKey}(phase)) are read through the lookup's records.
    const options = lookupParseOptions(builtinLookup);
    for (const r of builtinSpecies()) {
      const ref = parseSpecies(r.key, options);
      expect(ref.key, r.key).toBe(r.key);
      expect(ref.elements).toEqual(r.elements);
      expect(ref.charge).toBe(r.charge);
    }
  });

  it('finds a record by key', () => {
    const water = builtinLookup.get('H2O(l)');
    expect(water?.dfG_kJ).toBe(-237.129);
    expect(water?.cp?.kind).toBe('nasa9');
    expect(builtinLookup.get('H2O(x)')).toBeUndefined();
  });

  it('gives every species without a polynomial a constant Cp or none, never both', () => {
    for (const r of builtinSpecies()) {
      if (r.cp?.kind === 'constant') expect(r.cp.value).toBe(r.Cp_J_per_K);
      if (r.cp === null) expect(r.Cp_J_per_K).toBeNull();
    }
  });

  it.each([
    ['ethanol', 'l', 'C2H5OH(l)'],
    ['Ethanol', 'g', 'C2H5OH(g)'],
    ['water', 'l', 'H2O(l)'],
    ['water', 'g', 'H2O(g)'],
    ['acetic acid', 'aq', 'CH3COOH(aq)'],
    ['dimethyl ether', 'g', 'CH3OCH3(g)'],
    ['ethylene  oxide', 'g', '(CH2)2O(g)'],
    ['isobutane', 'g', '(CH3)3CH(g)'],
    ['n-butane', 'g', 'C4H10(g)'],
    ['glucose', 's', 'C6H12O6(s)'],
    ['glycerol', 'l', 'C3H5(OH)3(l)'],
    ['ethylene glycol', 'l', 'HOCH2CH2OH(l)'],
    ['glycine', 's', 'NH2CH2COOH(s)'],
    ['sucrose', 's', 'C12H22O11(s)'],
    ['urea', 's', 'CO(NH2)2(s)'],
    ['styrene', 'g', 'C6H5CHCH2(g)'],
    ['cyclohexane', 'l', 'C6H12(l)'],
    ['aragonite', 'aragonite', 'CaCO3(aragonite)'],
  ])('resolves the name %s (%s) to %s', (name, phase, key) => {
    expect(builtinLookup.resolveAlias(name, phase)).toBe(key);
  });

  it('does not resolve a name in a phase the library lacks', () => {
    expect(builtinLookup.resolveAlias('ethanol', 's')).toBeUndefined();
  });

  it('suggests the closest keys, with same-composition keys first', () => {
    expect(builtinLookup.suggest('C2H5OH(s)', 3)).toEqual(expect.arrayContaining(['C2H5OH(l)', 'C2H5OH(g)']));
    const isomers = builtinLookup.suggest('CH3CH2OH(l)', 5, { C: 2, H: 6, O: 1 });
    expect(isomers).toContain('C2H5OH(l)');
    expect(isomers).toContain('CH3OCH3(g)');
    expect(builtinLookup.suggest('H2O(s)', 2)).toContain('H2O(l)');
  });
});

describe('layered lookup (team species over built-ins)', () => {
  const base = builtinLookup.get('CH4(g)')!;
  const teamMethane: SpeciesRecord = { ...base, dfG_kJ: -50.5, source: 'team measurement', aliases: ['methane'] };
  const teamNew: SpeciesRecord = { ...base, key: 'C5H12(g)', name: 'n-pentane', aliases: ['n-pentane'], source: 'team' };
  const lookup = layeredLookup([teamMethane, teamNew]);

  it('lets a team species shadow the built-in and says which one it shadowed', () => {
    expect(lookup.get('CH4(g)')?.dfG_kJ).toBe(-50.5);
    expect(lookup.shadowed?.('CH4(g)')?.dfG_kJ).toBe(-50.72);
  });

  it('adds new team species without marking them as overrides', () => {
    expect(lookup.get('C5H12(g)')?.name).toBe('n-pentane');
    expect(lookup.shadowed?.('C5H12(g)')).toBeUndefined();
    expect(lookup.resolveAlias('n-pentane', 'g')).toBe('C5H12(g)');
  });

  it('falls back to the built-ins for everything else', () => {
    expect(lookup.get('H2O(l)')?.dfG_kJ).toBe(-237.129);
    expect(lookup.shadowed?.('H2O(l)')).toBeUndefined();
    expect(lookup.suggest('C5H12(l)', 3)).toContain('C5H12(g)');
  });
});
