// Memoised resolutions: same results as uncached ones, never shared across lookups, bounded.
import fc from 'fast-check';
import { beforeEach, describe, expect, it } from 'vitest';
import { checkBalance, isBalanced } from '@/lib/thermo/balance';
import { BoundedMemo } from '@/lib/thermo/bounded-memo';
import { findCrossover, memoCrossover } from '@/lib/thermo/crossover';
import { parseEquation } from '@/lib/thermo/equation';
import { evaluateStep } from '@/lib/thermo/evaluate';
import { clearReactionMemo, resolveReaction } from '@/lib/thermo/resolve-reaction';
import { builtinLookup, builtinSpecies, layeredLookup, nbsLookup } from '@/lib/thermo/species-library';
import type { EvaluateRequest } from '@/lib/schemas/evaluate';

const REQUESTS: EvaluateRequest[] = [
  { equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)' },
  { equation: 'CO(g) + H2O(g) <=> CO2(g) + H2(g)', temperature: '800 K', pressures: { 'CO(g)': '2 bar', 'H2O(g)': '3 bar' } },
  { equation: 'N2(g) + 3 H2(g) <=> 2 NH3(g)', temperature: '700 K', initial: { 'N2(g)': '1 mol', 'H2(g)': '3 mol' }, totalPressure: '200 bar' },
  { equation: 'CH3COOH(aq) <=> CH3COO-(aq) + H+(aq)', concentrations: { 'CH3COOH(aq)': '0.1 mol/L' } },
  { equation: 'ethanol(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', temperature: '350 K', standardPressure: '1 atm' },
  { equation: 'CaCO3(s) <=> CaO(s) + CO2(g)', temperature: '1100 K', heatCapacity: false },
  { equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', electrons: 2 },
];

const fresh = (req: EvaluateRequest, lookup = builtinLookup): string => {
  clearReactionMemo();
  return JSON.stringify(evaluateStep(req, { lookup }));
};

describe('reaction memo', () => {
  beforeEach(() => clearReactionMemo());

  it('gives results identical to uncached evaluation, on the first call and on memo hits', () => {
    for (const req of REQUESTS) {
      const uncached = fresh(req);
      for (let i = 0; i < 3; i++) expect(JSON.stringify(evaluateStep(req, { lookup: builtinLookup }))).toBe(uncached);
    }
  });

  it('serves the same frozen resolution to repeat calls with the same lookup', () => {
    const a = resolveReaction('N2(g) + 3 H2(g) <=> 2 NH3(g)', builtinLookup);
    expect(resolveReaction('N2(g) + 3 H2(g) <=> 2 NH3(g)', builtinLookup)).toBe(a);
    expect(Object.isFrozen(a.species)).toBe(true);
    expect(a.species.every((s) => Object.isFrozen(s))).toBe(true);
    expect(resolveReaction('N2(g) + 3 H2(g) <=> 2 NH3(g)', layeredLookup([]))).not.toBe(a);
  });

  it('never serves a cached built-in species to a team lookup that shadows it', () => {
    const builtinCO2 = builtinLookup.get('CO2(g)')!;
    const teamCO2 = { ...builtinCO2, dfG_kJ: -390, source: 'team calorimetry' };
    const team = layeredLookup([teamCO2]);
    const req = { equation: 'C(s) + O2(g) -> CO2(g)' };
    const before = evaluateStep(req, { lookup: nbsLookup });
    const shadowed = evaluateStep(req, { lookup: team });
    const after = evaluateStep(req, { lookup: nbsLookup });
    expect(shadowed.deltaG0_kJ).toBe(-390);
    expect(shadowed.species.find((s) => s.key === 'CO2(g)')).toMatchObject({ source: 'team calorimetry', override: true });
    expect(shadowed.warnings.map((w) => w.code)).toContain('OVERRIDE');
    expect(before.deltaG0_kJ).toBe(builtinCO2.dfG_kJ);
    expect(after).toEqual(before);
    expect(JSON.stringify(shadowed)).toBe(fresh(req, team));
  });

  it('resolves names through each lookup, even for the same text', () => {
    const ethanol = builtinSpecies().find((r) => r.key === 'C2H5OH(l)')!;
    const team = layeredLookup([{ ...ethanol, key: 'C2H6O(l)', formula: 'C2H6O', aliases: ['ethanol'], dfG_kJ: -170, source: 'team' }]);
    const text = 'ethanol(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)';
    expect(resolveReaction(text, builtinLookup).species[0]!.key).toBe('C2H5OH(l)');
    expect(resolveReaction(text, team).species[0]!.key).toBe('C2H6O(l)');
    expect(resolveReaction(text, builtinLookup).species[0]!.key).toBe('C2H5OH(l)');
  });

  it('does not remember failures: an unknown species is reported every time', () => {
    const text = 'C2H5OH(s) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)';
    for (let i = 0; i < 2; i++) expect(() => resolveReaction(text, builtinLookup)).toThrow(/Not in the species library/);
  });

  it('remembers the crossover only for frozen species arrays, with the same value', () => {
    const { species } = resolveReaction('CaCO3(s) <=> CaO(s) + CO2(g)', builtinLookup);
    const opts = { heatCapacity: true, standardPressure_bar: 1 };
    expect(memoCrossover(species, opts)).toBe(findCrossover(species, opts));
    expect(memoCrossover(species, opts)).toBe(findCrossover(species, opts));
    const loose = [...species];
    expect(memoCrossover(loose, { heatCapacity: false, standardPressure_bar: 1.01325 })).toBe(
      findCrossover(loose, { heatCapacity: false, standardPressure_bar: 1.01325 }),
    );
  });
});

describe('bounded memo', () => {
  it('evicts the oldest entry at capacity and keeps the rest', () => {
    const memo = new BoundedMemo<string, number>(3);
    for (const [i, k] of ['a', 'b', 'c', 'd'].entries()) memo.set(k, i);
    expect(memo.size).toBe(3);
    expect(memo.get('a')).toBeUndefined();
    expect([memo.get('b'), memo.get('c'), memo.get('d')]).toEqual([1, 2, 3]);
    memo.set('b', 10); // an update is not an insertion: nothing evicted
    expect(memo.size).toBe(3);
    expect(memo.get('b')).toBe(10);
  });

  it('never grows past its capacity', () => {
    const memo = new BoundedMemo<number, number>(1000);
    for (let i = 0; i < 5000; i++) memo.set(i, i);
    expect(memo.size).toBe(1000);
    expect(memo.get(4999)).toBe(4999);
    expect(memo.get(4000)).toBe(4000);
    expect(memo.get(3999)).toBeUndefined();
  });
});

describe('cheap balance check', () => {
  const SPECIES = ['H2(g)', 'O2(g)', 'H2O(l)', 'CH4(g)', 'CO2(g)', 'H+(aq)', 'OH-(aq)', 'Fe+3(aq)', 'SO4-2(aq)'];
  const coefficient = fc.oneof(
    fc.integer({ min: 1, max: 12 }).map(String),
    fc.tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 1, max: 4 })).map(([n, d]) => `${n}/${d}`),
    fc.constantFrom('0.5', '1.5', '2.25'),
  );
  const side = fc.array(fc.tuple(coefficient, fc.constantFrom(...SPECIES)), { minLength: 1, maxLength: 3 });
  const write = (terms: [string, string][]): string => terms.map(([c, s]) => `${c} ${s}`).join(' + ');

  it('agrees with the exact rational check on any equation', () => {
    fc.assert(
      fc.property(side, side, (left, right) => {
        const eq = parseEquation(`${write(left)} -> ${write(right)}`);
        expect(isBalanced(eq)).toBe(checkBalance(eq).isBalanced);
      }),
      { numRuns: 500 },
    );
    for (const text of ['2 H2(g) + O2(g) -> 2 H2O(l)', 'H2(g) + O2(g) -> H2O(l)', 'H2O(l) -> H+(aq) + OH-(aq)', '90071992547409931 H2(g) -> 90071992547409931 H2(g)']) {
      const eq = parseEquation(text);
      expect(isBalanced(eq), text).toBe(checkBalance(eq).isBalanced);
    }
  });
});
