import { describe, expect, it } from 'vitest';
import { builtinLookup, nbsLookup } from '@/lib/thermo/species-library';
import type { SpeciesRecord } from '@/lib/thermo/species-types';
import { reactionUncertainty, speciesSigma } from '@/lib/thermo/uncertainty';
import { rx } from './reaction-test-species';

const rxNbs = (nus: Record<string, number>) => rx(nus, nbsLookup);

// The NBS 1982 / NASA records as tabulated; the organic library's rows come from builtinLookup below.
const get = (key: string) => nbsLookup.get(key)!;
const merged = (key: string) => builtinLookup.get(key)!;
const byName = (name: string, phase: string): SpeciesRecord => builtinLookup.get(builtinLookup.resolveAlias(name, phase)!)!;

describe('per-species σ', () => {
  it('uses the |NASA − NBS| ΔfH° difference as a stand-in (data README table: NO(g) +1.02, N2O4(g) +1.95)', () => {
    expect(speciesSigma(get('NO(g)')).from).toBe('compilation difference');
    expect(speciesSigma(get('NO(g)')).sigma_kJ).toBeCloseTo(1.02, 2);
    expect(speciesSigma(get('N2O4(g)')).sigma_kJ).toBeCloseTo(1.95, 2);
  });

  it('uses a published uncertainty where the row has one (glucose: ±1.2 kJ/mol, Kabo et al. 2013)', () => {
    expect(speciesSigma(get('C6H12O6(s)'))).toMatchObject({ sigma_kJ: 1.2, from: 'published' });
  });

  it('has none for species only one compilation has, or where both agree to the digit', () => {
    expect(speciesSigma(get('Na+(aq)'))).toMatchObject({ sigma_kJ: null, from: 'none' });
    expect(get('H2O(l)').compilationDifference?.dfH_kJ).toBe(0);
    expect(speciesSigma(get('H2O(l)')).from).toBe('none');
  });

  it('gives reference states σ = 0 by definition', () => {
    expect(speciesSigma(get('O2(g)')).sigma_kJ).toBe(0);
  });
});

describe('per-species σ with the organic library merged in', () => {
  it('keeps the NBS 1982 − ATcT difference as σ where the newer value replaced NBS (NO(g): ATcT 1.112 91.089 vs NBS 90.25)', () => {
    const no = speciesSigma(merged('NO(g)'));
    expect(no.from).toBe('compilation difference');
    expect(no.sigma_kJ).toBeCloseTo(91.089 - 90.25, 3);
  });

  it('takes the spread of the sources the organic library compares, for ΔfH° and S° (ethyl acetate(l): WebBook −480.148, CRC −479.300; S° 259.4 vs 257.7)', () => {
    const s = speciesSigma(byName('ethyl acetate', 'l'));
    expect(s.from).toBe('source spread');
    expect(s.sigma_kJ).toBeCloseTo(Math.hypot(0.848, (298.15 * 1.7) / 1000), 3);
  });

  it('shows a disputed row’s whole disagreement (1,4-dioxane(l): S° WebBook 196.6 vs CRC 270.2 J/(mol K))', () => {
    const r = byName('1,4-dioxane', 'l');
    expect(r.flags).toContain('sourcesDisagree');
    expect(speciesSigma(r).sigma_kJ).toBeGreaterThan((298.15 * 73.6) / 1000 - 0.01);
  });

  it('marks σ of a reaction with estimated species on both sides as an upper bound', () => {
    const estimated = (key: string, nu: number) => ({
      key, asWritten: key, nu,
      record: { ...merged('C2H5OH(g)'), key, estimate: { method: 'group additivity', groups: [], confidence: 'normal' as const, notes: [] }, uncertainty: { dfH_kJ: 4, dfG_kJ: 5, S_J_per_K: 4 } },
    });
    const r = reactionUncertainty([estimated('a', -1), estimated('b', 1)], -20);
    expect(r.deltaG0_kJ).toBeCloseTo(Math.hypot(5, 5), 9);
    expect(r.sources.every((x) => x.from === 'estimate')).toBe(true);
    expect(r.upperBound).toBe(true);
    expect(reactionUncertainty([estimated('a', -1)], -20).upperBound).toBeUndefined();
  });
});

describe('σ(ΔrG°)', () => {
  it('adds ν·σ in quadrature: 2 NO2 ⇌ N2O4 → sqrt((2·1.01)² + 1.95²)', () => {
    const r = reactionUncertainty(rxNbs({ 'NO2(g)': -2, 'N2O4(g)': 1 }), -4.73);
    const sNO2 = get('NO2(g)').compilationDifference!.dfH_kJ;
    const sN2O4 = get('N2O4(g)').compilationDifference!.dfH_kJ;
    expect(r.deltaG0_kJ).toBeCloseTo(Math.hypot(2 * sNO2, sN2O4), 12);
    expect(r.signUncertain).toBe(false);
    expect(r.sources.map((s) => s.species)).toEqual(['NO2(g)', 'N2O4(g)']);
  });

  it('flags an uncertain sign when |ΔG| ≤ σ', () => {
    expect(reactionUncertainty(rxNbs({ 'NO2(g)': -2, 'N2O4(g)': 1 }), 1.0).signUncertain).toBe(true);
  });

  it('is null when no species has a σ', () => {
    const r = reactionUncertainty(rx({ 'Ag+(aq)': -1, 'Cl-(aq)': -1, 'AgCl(s)': 1 }), -55);
    expect(r.deltaG0_kJ).toBeNull();
    expect(r.signUncertain).toBe(false);
  });
});
