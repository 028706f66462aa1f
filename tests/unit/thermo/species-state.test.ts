import { describe, expect, it } from 'vitest';
import { nasa9At } from '@/lib/thermo/nasa9';
import { builtinLookup } from '@/lib/thermo/species-library';
import { speciesRange, speciesStateAt } from '@/lib/thermo/species-state';
import type { Nasa9Cp } from '@/lib/thermo/species-types';

const get = (key: string) => {
  const r = builtinLookup.get(key);
  if (!r) throw new Error(key);
  return r;
};

describe('species H°(T), S°(T) anchored on the 298.15 K library row', () => {
  it('returns the tabulated values exactly at 298.15 K, even where NASA and NBS differ (NO(g): +1.02 kJ/mol)', () => {
    const no = get('NO(g)');
    const st = speciesStateAt(no, 298.15);
    expect(st.H_kJ).toBe(no.dfH_kJ);
    expect(st.S_J_per_K).toBe(no.S_J_per_K);
  });

  it('adds the polynomial increment H(T) − H(298.15) on top of the library value', () => {
    const no = get('NO(g)');
    const cp = no.cp as Nasa9Cp;
    const inc = (nasa9At(cp, 1000).H_J - nasa9At(cp, 298.15).H_J) / 1000;
    expect(speciesStateAt(no, 1000).H_kJ).toBeCloseTo(no.dfH_kJ + inc, 10);
  });

  it('integrates a constant Cp exactly: ΔH = Cp ΔT, ΔS = Cp ln(T2/T1)', () => {
    const zno = get('ZnO(s)');
    expect(zno.cp?.kind).toBe('constant');
    const cp = zno.Cp_J_per_K!;
    const st = speciesStateAt(zno, 398.15);
    expect(st.H_kJ).toBeCloseTo(zno.dfH_kJ + (cp * 100) / 1000, 12);
    expect(st.S_J_per_K).toBeCloseTo(zno.S_J_per_K + cp * Math.log(398.15 / 298.15), 12);
    expect(st.basis).toBe('constant');
  });

  it('keeps H° and S° fixed when heat capacity is off or missing', () => {
    const co2aq = get('CO2(aq)');
    expect(co2aq.cp).toBeNull();
    expect(speciesStateAt(co2aq, 350).H_kJ).toBe(co2aq.dfH_kJ);
    expect(speciesStateAt(get('CH4(g)'), 900, false).S_J_per_K).toBe(get('CH4(g)').S_J_per_K);
  });

  it('reports data ranges: polynomial span, or our convention for constant/absent Cp', () => {
    expect(speciesRange(get('Fe(s)'))).toEqual([200, 1809]);
    expect(speciesRange(get('Na+(aq)'))).toEqual([273.15, 373.15]);
    expect(speciesRange(get('ZnO(s)'))).toEqual([198.15, 398.15]);
    expect(speciesStateAt(get('H2O(l)'), 650).inRange).toBe(false);
  });

  it('obeys dH/dT = Cp numerically for a polynomial species (CO2(g) at 700 K)', () => {
    const co2 = get('CO2(g)');
    const h = 1e-3;
    const dHdT = ((speciesStateAt(co2, 700 + h).H_kJ - speciesStateAt(co2, 700 - h).H_kJ) * 1000) / (2 * h);
    expect(dHdT).toBeCloseTo(nasa9At(co2.cp as Nasa9Cp, 700).Cp_J_per_K, 3);
  });
});
