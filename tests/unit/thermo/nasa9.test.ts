// NASA-9 evaluation against the NASA Glenn file's own numbers (McBride, Zehe & Gordon 2002),
// as recorded in lib/thermo/data/source/thermo/nasa9-coefficients.json (`at_298_15_K`).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { nasa9At } from '@/lib/thermo/nasa9';
import { builtinLookup } from '@/lib/thermo/species-library';
import type { Nasa9Cp } from '@/lib/thermo/species-types';

interface SharedEntry {
  key: string;
  at_298_15_K: { H298_from_polynomial_J_per_mol: number; S298_from_polynomial_J_per_mol_K: number; Cp298_from_polynomial_J_per_mol_K: number };
}
const shared = JSON.parse(
  readFileSync(path.resolve(__dirname, '../../../lib/thermo/data/source/thermo/nasa9-coefficients.json'), 'utf8'),
) as { species: SharedEntry[] };

const cpOf = (key: string): Nasa9Cp => {
  const cp = builtinLookup.get(key)?.cp;
  if (cp?.kind !== 'nasa9') throw new Error(`${key} has no polynomial`);
  return cp;
};

describe('NASA-9 polynomials at 298.15 K reproduce the values evaluated from thermo.inp', () => {
  it.each(shared.species.map((s) => [s.key, s.at_298_15_K] as const))('%s', (key, at) => {
    const p = nasa9At(cpOf(key), 298.15);
    expect(p.inRange).toBe(true);
    expect(Math.abs(p.H_J - at.H298_from_polynomial_J_per_mol)).toBeLessThan(0.01);
    expect(Math.abs(p.S_J_per_K - at.S298_from_polynomial_J_per_mol_K)).toBeLessThan(0.001);
    expect(Math.abs(p.Cp_J_per_K - at.Cp298_from_polynomial_J_per_mol_K)).toBeLessThan(0.001);
  });
});

describe('record chaining', () => {
  it('picks the record that covers T, the higher one at a shared boundary (KOH(b) at 298.15 K)', () => {
    expect(nasa9At(cpOf('KOH(s)'), 298.15).record).toBe('KOH(b)');
    expect(nasa9At(cpOf('Fe(s)'), 1000).record).toBe('Fe(a)');
    expect(nasa9At(cpOf('Fe(s)'), 1300).record).toBe('Fe(c)');
    expect(nasa9At(cpOf('Fe(s)'), 1700).record).toBe('Fe(d)');
  });

  it('keeps G = H − TS continuous across the Fe α/γ transition at 1184 K while H jumps', () => {
    const below = nasa9At(cpOf('Fe(s)'), 1184 - 1e-6);
    const above = nasa9At(cpOf('Fe(s)'), 1184);
    const g = (p: typeof below, T: number): number => p.H_J - T * p.S_J_per_K;
    expect(above.record).toBe('Fe(c)');
    expect(Math.abs(g(above, 1184) - g(below, 1184 - 1e-6))).toBeLessThan(5);
    // the α→γ enthalpy of transition is positive and of order 1 kJ/mol
    expect(above.H_J - below.H_J).toBeGreaterThan(500);
    expect(above.H_J - below.H_J).toBeLessThan(2000);
  });

  it('flags temperatures outside every record and extrapolates the nearest interval', () => {
    const p = nasa9At(cpOf('H2O(l)'), 700);
    expect(p.inRange).toBe(false);
    expect(p.record).toBe('H2O(L)');
    expect(Number.isFinite(p.H_J)).toBe(true);
  });

  it('is continuous in H inside a record across an interval boundary (H2 at 1000 K)', () => {
    const cp = cpOf('H2(g)');
    expect(Math.abs(nasa9At(cp, 1000 - 1e-9).H_J - nasa9At(cp, 1000).H_J)).toBeLessThan(0.01);
  });
});
