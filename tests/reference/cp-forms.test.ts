// Published Cp(T) forms of the organic library, evaluated by lib/thermo/cp-forms.ts, against the values the
// library's build evaluated from the same forms at 298.15 K (`Cp_298.15K_from_this_form` in
// lib/thermo/data/source/organics/heat-capacity.json; that build checked its evaluators against the `chemicals`
// package and Cantera), and NASA-7 integrals against the closed-form NASA-7 H and S (McBride, Gordon & Reno,
// NASA TM-4513, 1993).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { cpFromForm, formIncrements } from '@/lib/thermo/cp-forms';
import { R_GAS } from '@/lib/thermo/constants';
import type { CpForm, FormCp } from '@/lib/thermo/species-types';

interface Entry { form: string; name: string; 'Cp_298.15K_from_this_form': number | null; Tmin: number; Tmax: number; [k: string]: unknown }
const file = JSON.parse(readFileSync(path.resolve(__dirname, '../../lib/thermo/data/source/organics/heat-capacity.json'), 'utf8')) as { species: Record<string, Entry> };
const entries = Object.entries(file.species).filter(([, e]) => e['Cp_298.15K_from_this_form'] !== null);

describe('published Cp(T) forms at 298.15 K', () => {
  it('covers every form the library uses', () => {
    // No row uses the Poling form (the README lists it in the preference order only).
    expect(new Set(entries.map(([, e]) => e.form))).toEqual(new Set(['NASA7', 'Shomate', 'TRC', 'JANAF_table', 'Zabransky_spline', 'Zabransky_quasipolynomial', 'DIPPR100_Perry']));
    expect(entries.length).toBe(1286);
  });

  it.each(entries.map(([key, e]) => [`${e.name} (${key}, ${e.form})`, e] as const))('%s', (_label, e) => {
    // The file rounds to 0.001 J/(mol K).
    expect(Math.abs(cpFromForm(e as unknown as CpForm, 298.15) - e['Cp_298.15K_from_this_form']!)).toBeLessThan(0.002);
  });
});

function nasa7H(a: number[], T: number): number {
  return R_GAS * T * (a[0]! + (a[1]! * T) / 2 + (a[2]! * T * T) / 3 + (a[3]! * T ** 3) / 4 + (a[4]! * T ** 4) / 5 + a[5]! / T);
}
function nasa7S(a: number[], T: number): number {
  return R_GAS * (a[0]! * Math.log(T) + a[1]! * T + (a[2]! * T * T) / 2 + (a[3]! * T ** 3) / 3 + (a[4]! * T ** 4) / 4 + a[6]!);
}

describe('quadrature increments against the closed-form NASA-7 integrals', () => {
  const nasa = entries.filter(([, e]) => e.form === 'NASA7' && Array.isArray(e.high) && e.Tmax >= 1500).slice(0, 40);
  it.each(nasa.map(([key, e]) => [`${e.name} (${key})`, e] as const))('%s at 500, 1000 and 1500 K', (_label, e) => {
    const model = e as unknown as Extract<CpForm, { form: 'NASA7' }>;
    const cp: FormCp = { kind: 'form', source: 'NASA TM-4513', model };
    const coeffs = (T: number) => (T > model.Tmid! ? model.high! : model.low);
    for (const T of [500, 1000, 1500]) {
      // Across Tmid the closed form steps between the two ranges; NASA fits make them meet at Tmid.
      const dH = T > model.Tmid! ? nasa7H(model.high!, T) - nasa7H(model.high!, model.Tmid!) + nasa7H(model.low, model.Tmid!) - nasa7H(model.low, 298.15) : nasa7H(coeffs(T), T) - nasa7H(model.low, 298.15);
      const dS = T > model.Tmid! ? nasa7S(model.high!, T) - nasa7S(model.high!, model.Tmid!) + nasa7S(model.low, model.Tmid!) - nasa7S(model.low, 298.15) : nasa7S(coeffs(T), T) - nasa7S(model.low, 298.15);
      const inc = formIncrements(cp, T);
      expect(Math.abs(inc.dH_J - dH)).toBeLessThan(0.05);
      expect(Math.abs(inc.dS_J_per_K - dS)).toBeLessThan(1e-4);
    }
  });
});
