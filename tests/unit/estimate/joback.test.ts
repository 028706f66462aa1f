// Joback & Reid (1987): fragmentation, the published equations, and boiling points against tabulated
// values. Group values are read from the committed table (lib/thermo/data/source/estimation/joback).
import { beforeAll, describe, expect, it } from 'vitest';
import { loadChem, type Chem } from '@/lib/thermo/structure/chem';
import { estimateJoback, jobackCp, watsonDvapH } from '@/lib/thermo/estimate/joback';
import { expectThermoError } from '../thermo/expect-thermo-error';

let chem: Chem;
beforeAll(async () => {
  chem = await loadChem();
});

const counts = (smiles: string): Record<string, number> => Object.fromEntries(estimateJoback(chem, smiles).groups.map((g) => [g.label, g.count]));

describe('Joback fragmentation (exclusive cover of heavy atoms)', () => {
  it('splits textbook molecules into the groups of Joback & Reid 1987', () => {
    expect(counts('CCO')).toEqual({ '-CH3': 1, '-CH2-': 1, '-OH (alcohol)': 1 });
    expect(counts('CC(C)=O')).toEqual({ '-CH3': 2, '>C=O (non-ring)': 1 });
    expect(counts('Oc1ccccc1')).toEqual({ 'ring=CH-': 5, 'ring=C<': 1, '-OH (phenol)': 1 });
    expect(counts('CCOC(C)=O')).toEqual({ '-CH3': 2, '-CH2-': 1, '-COO- (ester)': 1 });
    expect(counts('CC(=O)O')).toEqual({ '-CH3': 1, '-COOH (acid)': 1 });
    expect(counts('O=C1CCCCC1')).toEqual({ 'ring-CH2-': 5, '>C=O (ring)': 1 });
    expect(counts('O=[N+]([O-])c1ccccc1')).toEqual({ 'ring=CH-': 5, 'ring=C<': 1, '-NO2': 1 });
  });

  it('every group carries its source and the atoms it covers', () => {
    const j = estimateJoback(chem, 'CCO');
    expect(j.groups.every((g) => g.source.includes('Joback & Reid'))).toBe(true);
    expect(j.groups.flatMap((g) => g.atoms!.flat()).sort()).toEqual([0, 1, 2]);
  });

  it('refuses what no group covers and names the atoms', () => {
    // Joback has no group for CH4 or for a sulfoxide S=O.
    expect(expectThermoError(() => estimateJoback(chem, 'C'), 'UNSUPPORTED_STRUCTURE').message).toContain('C1');
    expect(expectThermoError(() => estimateJoback(chem, 'CS(C)=O'), 'UNSUPPORTED_STRUCTURE').message).toContain('S2');
  });
});

describe('Joback equations (Joback & Reid 1987, Tb = 198.2 + Σ, ΔHvap(Tb) = 15.30 + Σ)', () => {
  it('ethanol: the sums of the published contributions', () => {
    const j = estimateJoback(chem, 'CCO');
    // Tb contributions CH3 23.58, CH2 22.88, OH(alcohol) 92.88 (Joback & Reid 1987 table).
    expect(j.Tb_K).toBeCloseTo(198.2 + 23.58 + 22.88 + 92.88, 6);
    // ΔHvap contributions 2.373, 2.226, 16.826 kJ/mol.
    expect(j.dvapH_Tb_kJ).toBeCloseTo(15.3 + 2.373 + 2.226 + 16.826, 6);
    // Tc contributions 0.0141, 0.0189, 0.0741: Tc = Tb/(0.584 + 0.965Σ − Σ²).
    const s = 0.0141 + 0.0189 + 0.0741;
    expect(j.Tc_K!).toBeCloseTo(j.Tb_K / (0.584 + 0.965 * s - s * s), 6);
  });

  it('Watson moves ΔHvap(Tb) to 298.15 K with n = 0.38 (common practice)', () => {
    const j = estimateJoback(chem, 'c1ccccc1');
    expect(j.dvapH298_kJ!).toBeCloseTo(j.dvapH_Tb_kJ * ((1 - 298.15 / j.Tc_K!) / (1 - j.Tb_K / j.Tc_K!)) ** 0.38, 9);
    expect(watsonDvapH(30, 350, 550, 350)).toBeCloseTo(30, 12);
    expect(watsonDvapH(30, 350, 550, 600)).toBe(0);
  });
});

describe('Joback boiling points against tabulated normal boiling points', () => {
  // CRC Handbook of Chemistry and Physics normal boiling points, K (from memory).
  const TB: [string, string, number][] = [
    ['ethanol', 'CCO', 351.4],
    ['benzene', 'c1ccccc1', 353.2],
    ['acetone', 'CC(C)=O', 329.2],
    ['n-hexane', 'CCCCCC', 341.9],
    ['acetic acid', 'CC(=O)O', 391.1],
    ['ethyl acetate', 'CCOC(C)=O', 350.2],
    ['phenol', 'Oc1ccccc1', 455.0],
    ['acetonitrile', 'CC#N', 354.8],
    ['cyclohexanone', 'O=C1CCCCC1', 428.8],
    ['toluene', 'Cc1ccccc1', 383.8],
    ['diethyl ether', 'CCOCC', 307.6],
    ['1-butanol', 'CCCCO', 390.9],
    ['pyridine', 'c1ccncc1', 388.4],
    ['chlorobenzene', 'Clc1ccccc1', 404.9],
  ];

  it('each within 40 K, mean absolute error under 20 K (Joback & Reid report 12.9 K over 438 compounds)', () => {
    const errors = TB.map(([name, smiles, tb]) => {
      const e = estimateJoback(chem, smiles).Tb_K - tb;
      expect(Math.abs(e), name).toBeLessThan(40);
      return Math.abs(e);
    });
    expect(errors.reduce((a, b) => a + b, 0) / errors.length).toBeLessThan(20);
  });

  it('warns when the estimated Tb is below 298.15 K (a liquid there is hypothetical)', () => {
    const j = estimateJoback(chem, 'CCC');
    expect(j.Tb_K).toBeLessThan(298.15);
    expect(j.warnings.join(' ')).toMatch(/hypothetical/);
  });
});

describe('Joback ideal-gas Cp polynomial', () => {
  it('benzene Cp(298.15 K) near the tabulated 82.4 J/(mol K) (JANAF/TRC, from memory), refused outside its range', () => {
    const cp = jobackCp(estimateJoback(chem, 'c1ccccc1').counts)!;
    expect(Math.abs(cp.cp(298.15) - 82.4)).toBeLessThan(5);
    expectThermoError(() => cp.cp(200), 'OUT_OF_RANGE');
  });
});
