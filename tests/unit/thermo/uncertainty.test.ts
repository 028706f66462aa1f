import { describe, expect, it } from 'vitest';
import { builtinLookup } from '@/lib/thermo/species-library';
import { reactionUncertainty, speciesSigma } from '@/lib/thermo/uncertainty';
import { rx } from './reaction-test-species';

const get = (key: string) => builtinLookup.get(key)!;

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

describe('σ(ΔrG°)', () => {
  it('adds ν·σ in quadrature: 2 NO2 ⇌ N2O4 → sqrt((2·1.01)² + 1.95²)', () => {
    const r = reactionUncertainty(rx({ 'NO2(g)': -2, 'N2O4(g)': 1 }), -4.73);
    const sNO2 = get('NO2(g)').compilationDifference!.dfH_kJ;
    const sN2O4 = get('N2O4(g)').compilationDifference!.dfH_kJ;
    expect(r.deltaG0_kJ).toBeCloseTo(Math.hypot(2 * sNO2, sN2O4), 12);
    expect(r.signUncertain).toBe(false);
    expect(r.sources.map((s) => s.species)).toEqual(['NO2(g)', 'N2O4(g)']);
  });

  it('flags an uncertain sign when |ΔG| ≤ σ', () => {
    expect(reactionUncertainty(rx({ 'NO2(g)': -2, 'N2O4(g)': 1 }), 1.0).signUncertain).toBe(true);
  });

  it('is null when no species has a σ', () => {
    const r = reactionUncertainty(rx({ 'Ag+(aq)': -1, 'Cl-(aq)': -1, 'AgCl(s)': 1 }), -55);
    expect(r.deltaG0_kJ).toBeNull();
    expect(r.signUncertain).toBe(false);
  });
});
