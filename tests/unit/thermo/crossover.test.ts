import { describe, expect, it } from 'vitest';
import { commonRange, findCrossover } from '@/lib/thermo/crossover';
import { reactionThermoAt } from '@/lib/thermo/reaction-thermo';
import { rx } from './reaction-test-species';

describe('crossover temperature', () => {
  it('finds the root of ΔG°(T) for calcite decomposition at 1 bar CO2 (common value about 1170 K, from memory)', () => {
    const calcite = rx({ 'CaCO3(s)': -1, 'CaO(s)': 1, 'CO2(g)': 1 });
    const T = findCrossover(calcite)!;
    expect(Math.abs(reactionThermoAt(calcite, T).deltaG0_kJ)).toBeLessThan(1e-6);
    expect(T).toBeGreaterThan(1100);
    expect(T).toBeLessThan(1200);
  });

  it('returns null when nothing reacts (every ν nets to zero)', () => {
    expect(findCrossover(rx({ 'H2(g)': 0 }))).toBeNull();
  });

  it('returns null when ΔG° keeps its sign over the common data range', () => {
    expect(findCrossover(rx({ 'H2(g)': -1, 'O2(g)': -0.5, 'H2O(l)': 1 }))).toBeNull();
  });

  it('searches only the intersection of the species data ranges', () => {
    // KOH(s) 100–679 K, Fe(OH)3(s) 298.15–1500 K, Al(OH)3(s) 100–500 K (NASA Glenn records)
    expect(commonRange(rx({ 'KOH(s)': -1, 'Fe(OH)3(s)': 1, 'Al(OH)3(s)': 1 }))).toEqual([298.15, 500]);
    // a constant-Cp aqueous ion limits the search to 273.15–373.15 K (our convention)
    expect(commonRange(rx({ 'Zn(s)': -1, 'Cu+2(aq)': -1, 'Zn+2(aq)': 1, 'Cu(s)': 1 }))).toEqual([273.15, 373.15]);
  });
});
