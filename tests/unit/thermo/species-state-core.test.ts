// The allocation-free cores used in hot loops must match the public functions bit for bit.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nasa9At, nasa9HSInto } from '@/lib/thermo/nasa9';
import { nbsSpecies } from '@/lib/thermo/species-library';
import { speciesHSInto, speciesRange, speciesStateAt } from '@/lib/thermo/species-state';
import { T_REF } from '@/lib/thermo/constants';
import type { Nasa9Cp, SpeciesRecord } from '@/lib/thermo/species-types';

// The NBS/NASA records: NASA-9 polynomials and constant Cp (the published forms are checked in cp-forms.test.ts).
const records = nbsSpecies();
const withPolynomial = records.filter((r) => r.cp?.kind === 'nasa9');

describe('allocation-free thermo cores', () => {
  it('nasa9HSInto gives nasa9At\'s H and S, inside and outside the records', () => {
    fc.assert(
      fc.property(fc.constantFrom(...withPolynomial), fc.double({ min: 10, max: 50000, noNaN: true }), (r, T) => {
        const cp = r.cp as Nasa9Cp;
        const out = { H_J: 0, S_J_per_K: 0 };
        nasa9HSInto(cp, T, Math.log(T), out);
        const p = nasa9At(cp, T);
        expect(Object.is(out.H_J, p.H_J)).toBe(true);
        expect(Object.is(out.S_J_per_K, p.S_J_per_K)).toBe(true);
      }),
      { numRuns: 3000 },
    );
  });

  // The formulas as first written, from nasa9At and the 298.15 K anchor, as the reference.
  function reference(r: SpeciesRecord, T: number, heatCapacity: boolean): [number, number] {
    const cp = r.cp;
    if (!heatCapacity || T === T_REF || cp === null) return [r.dfH_kJ, r.S_J_per_K];
    if (cp.kind === 'constant') return [r.dfH_kJ + (cp.value * (T - T_REF)) / 1000, r.S_J_per_K + cp.value * Math.log(T / T_REF)];
    if (cp.kind !== 'nasa9') throw new Error(`${r.key}: the NBS/NASA library has NASA-9 or constant Cp only`);
    const p = nasa9At(cp, T);
    const a = nasa9At(cp, T_REF);
    return [r.dfH_kJ + (p.H_J - a.H_J) / 1000, r.S_J_per_K + (p.S_J_per_K - a.S_J_per_K)];
  }

  it('speciesHSInto and speciesStateAt give the reference H and S for every species', () => {
    for (const r of records) {
      const [lo, hi] = speciesRange(r);
      for (const T of [lo, hi, 298.15, 500, 1234.5, 0.5 * (lo + hi), 20, 6000]) {
        for (const heatCapacity of [true, false]) {
          const [H, S] = reference(r, T, heatCapacity);
          const out = { H_kJ: 0, S_J_per_K: 0 };
          speciesHSInto(r, T, heatCapacity, out);
          const st = speciesStateAt(r, T, heatCapacity);
          expect(Object.is(out.H_kJ, H) && Object.is(st.H_kJ, H), `${r.key} H at ${T} K`).toBe(true);
          expect(Object.is(out.S_J_per_K, S) && Object.is(st.S_J_per_K, S), `${r.key} S at ${T} K`).toBe(true);
        }
      }
    }
  });

  it('hands out a fresh range array each time', () => {
    const r = records[0]!;
    const a = speciesRange(r);
    a[0] = -1;
    expect(speciesRange(r)[0]).not.toBe(-1);
  });
});
