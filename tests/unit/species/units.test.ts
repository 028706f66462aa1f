import { describe, expect, it } from 'vitest';
import { readEnergyUnit, readEntropyUnit, toJPerMolK, toKJPerMol } from '@/lib/species/units';

describe('species units', () => {
  it('uses the thermochemical calorie, 4.184 J exactly (the definition the NBS tables use)', () => {
    expect(toKJPerMol(1, 'kcal/mol')).toBe(4.184);
    expect(toKJPerMol(-68.315, 'kcal/mol')).toBeCloseTo(-285.83, 2); // H2O(l) ΔfH° in kcal/mol, from memory; −285.83 kJ/mol is NBS 1982
    expect(toKJPerMol(-285830, 'J/mol')).toBeCloseTo(-285.83, 10);
    expect(toJPerMolK(16.71, 'cal/(mol K)')).toBeCloseTo(69.915, 3); // S°(H2O, l) 16.71 cal/(mol K), from memory
    expect(toJPerMolK(0.06991, 'kJ/(mol K)')).toBeCloseTo(69.91, 10);
  });

  it('reads the ways spreadsheets write units', () => {
    for (const t of ['kJ/mol', 'kJ mol-1', 'kJ·mol−1', 'KJ/MOL']) expect(readEnergyUnit(t)).toBe('kJ/mol');
    expect(readEnergyUnit('kcal mol-1')).toBe('kcal/mol');
    for (const t of ['J/(mol K)', 'J/(mol·K)', 'J mol-1 K-1', 'J K-1 mol-1', 'J/mol/K']) expect(readEntropyUnit(t)).toBe('J/(mol K)');
    expect(readEntropyUnit('cal/(mol K)')).toBe('cal/(mol K)');
    expect(readEnergyUnit('kJ/kg')).toBeUndefined();
    expect(readEntropyUnit('J/K')).toBeUndefined();
  });
});
