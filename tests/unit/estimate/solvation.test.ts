// Abraham solute descriptors by group additivity (Chung et al., J. Chem. Inf. Model. 62 (2022) 433;
// group values from the committed RMG-database solvation groups) and the neutral-solute guard.
import { beforeAll, describe, expect, it } from 'vitest';
import { loadChem, type Chem } from '@/lib/thermo/structure/chem';
import { assertNeutralClosedShell, estimateSoluteDescriptors, gasStandardStateShift, mcgowanVolume } from '@/lib/thermo/estimate/solvation';
import { expectThermoError } from '../thermo/expect-thermo-error';

let chem: Chem;
beforeAll(async () => {
  chem = await loadChem();
});

describe('solute descriptors', () => {
  it('benzene by groups: 6 × Cb-H + the Benzene ring term, as published', () => {
    const d = estimateSoluteDescriptors(chem, 'c1ccccc1', { library: 'none' });
    // Cb-H: S 0.10974, B 0.01468, E 0.11814, L 0.53417; ring Benzene: S −0.08211, B 0.03455, E −0.09106, L −0.06839
    expect(d.descriptors.L).toBeCloseTo(6 * 0.53417 - 0.06839, 9);
    expect(d.descriptors.S).toBeCloseTo(6 * 0.10974 - 0.08211, 9);
    expect(d.descriptors.E).toBeCloseTo(6 * 0.11814 - 0.09106, 9);
    expect(d.descriptors.B).toBeCloseTo(6 * 0.01468 + 0.03455, 9);
    expect(d.groups.map((g) => `${g.label} ×${g.count}`).sort()).toEqual(['group: Cb-H ×6', 'ring: Benzene ×1']);
  });

  it('uses the experimental library first (methanol: Abraham et al. 1994 descriptors in solutes.json)', () => {
    const d = estimateSoluteDescriptors(chem, 'CO');
    expect(d.basis).toBe('library');
    expect(d.descriptors).toMatchObject({ E: 0.278, S: 0.44, A: 0.43, B: 0.47, L: 0.97 });
  });

  it('a halogenated molecule is its H-replaced parent plus one halogen term per halogen', () => {
    const d = estimateSoluteDescriptors(chem, 'Clc1ccc(Cl)cc1', { library: 'parents only' });
    expect(d.basis).toBe('library parent + halogen groups');
    expect(d.groups.filter((g) => g.label.startsWith('halogen:')).reduce((s, g) => s + g.count, 0)).toBe(2);
  });

  it('McGowan volume (Abraham & McGowan 1987; benzene 0.7164, from memory)', () => {
    expect(mcgowanVolume({ C: 6, H: 6 }, 1)).toBeCloseTo(0.7164, 4);
    expect(estimateSoluteDescriptors(chem, 'CCO').descriptors.V).toBeCloseTo(0.4491, 4);
  });

  it('refuses carbon-free molecules outside the library rather than guessing from groups', () => {
    expectThermoError(() => estimateSoluteDescriptors(chem, '[SiH3][SiH3]'), 'UNSUPPORTED_STRUCTURE');
  });
});

describe('neutral closed-shell solutes only', () => {
  it('refuses ions and zwitterions, naming pKa and the biochemical standard state', () => {
    const err = expectThermoError(() => assertNeutralClosedShell(chem, 'CC(=O)[O-]'), 'UNSUPPORTED_STRUCTURE');
    expect(err.message).toMatch(/pKa/);
    expect(err.message).toMatch(/biochemical standard state/);
    expectThermoError(() => assertNeutralClosedShell(chem, '[NH3+]CC(=O)[O-]'), 'UNSUPPORTED_STRUCTURE');
    expectThermoError(() => assertNeutralClosedShell(chem, 'C[NH3+]'), 'UNSUPPORTED_STRUCTURE');
    expectThermoError(() => assertNeutralClosedShell(chem, '[CH3]'), 'UNSUPPORTED_STRUCTURE');
  });

  it('accepts neutral molecules drawn with separated charges on bonded atoms (nitro)', () => {
    expect(() => assertNeutralClosedShell(chem, 'O=[N+]([O-])c1ccccc1')).not.toThrow();
  });
});

describe('standard-state shift', () => {
  it('RT ln(c°RT/p°) = RT ln 24.79 = +7.959 kJ/mol at 298.15 K (1 bar gas → 1 mol/L)', () => {
    expect(gasStandardStateShift()).toBeCloseTo(7.959, 3);
    expect(gasStandardStateShift()).toBeCloseTo((8.314462618 * 298.15 * Math.log(24.79)) / 1000, 3);
  });
});
