// Property tests of the engine over fuzzed reactions, temperatures and conditions.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import {
  builtinSpecies,
  evaluateStep,
  formatEquation,
  isThermoError,
  parseEquation,
  reverseEquation,
  scaleEquation,
  type EvaluateResponse,
} from '@/lib/thermo';
import type { EvaluateRequest } from '@/lib/schemas/evaluate';

const GAS_REACTIONS = [
  'CO(g) + H2O(g) <=> CO2(g) + H2(g)',
  'N2(g) + 3 H2(g) <=> 2 NH3(g)',
  'N2O4(g) <=> 2 NO2(g)',
  'CO(g) + 3 H2(g) <=> CH4(g) + H2O(g)',
  '2 SO2(g) + O2(g) <=> 2 SO3(g)',
  'C2H4(g) + H2(g) <=> C2H6(g)',
  'C4H10(g) <=> (CH3)3CH(g)',
  'H2(g) + I2(g) <=> 2 HI(g)',
  'CO(g) + 2 H2(g) <=> CH3OH(g)',
  'CH4(g) + H2O(g) <=> CO(g) + 3 H2(g)',
];
const OTHER_REACTIONS = [
  'CaCO3(s) <=> CaO(s) + CO2(g)',
  'CH3COOH(aq) <=> CH3COO-(aq) + H+(aq)',
  'Zn(s) + Cu+2(aq) <=> Zn+2(aq) + Cu(s)',
  'C(s) + O2(g) <=> CO2(g)',
  'Fe2O3(s) + 3 CO(g) <=> 2 Fe(s) + 3 CO2(g)',
  'CH4(g) + 2 O2(g) <=> CO2(g) + 2 H2O(l)',
];
const ALL = [...GAS_REACTIONS, ...OTHER_REACTIONS];

const temperature = fc.double({ min: 300, max: 1500, noNaN: true });
const eqOf = (text: string) => parseEquation(text);

describe('engine properties', () => {
  it('reversing an equation negates ΔG° and ln K', () => {
    fc.assert(
      fc.property(fc.constantFrom(...ALL), temperature, (text, T) => {
        const fwd = evaluateStep({ equation: text, temperature: `${T} K` }, { lookup: nbsLookup });
        const rev = evaluateStep({ equation: formatEquation(reverseEquation(eqOf(text))), temperature: `${T} K` }, { lookup: nbsLookup });
        expect(rev.deltaG0_kJ).toBeCloseTo(-fwd.deltaG0_kJ, 9);
        expect(rev.lnK).toBeCloseTo(-fwd.lnK, 9);
        if (fwd.K !== null && rev.K !== null) expect(fwd.K * rev.K).toBeCloseTo(1, 9);
      }),
      { numRuns: 60 },
    );
  });

  it('doubling the coefficients doubles ΔG° and ln K (K squares)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...ALL), temperature, fc.boolean(), (text, T, heatCapacity) => {
        const one = evaluateStep({ equation: text, temperature: `${T} K`, heatCapacity }, { lookup: nbsLookup });
        const two = evaluateStep({ equation: formatEquation(scaleEquation(eqOf(text), 2)), temperature: `${T} K`, heatCapacity }, { lookup: nbsLookup });
        expect(two.deltaG0_kJ).toBeCloseTo(2 * one.deltaG0_kJ, 8);
        expect(two.lnK).toBeCloseTo(2 * one.lnK, 8);
        expect(two.deltaH0_kJ).toBeCloseTo(2 * one.deltaH0_kJ, 8);
      }),
      { numRuns: 60 },
    );
  });

  it('ΔG° is continuous in T: a 1 mK step moves it by at most |ΔS°|·dT plus rounding', () => {
    fc.assert(
      fc.property(fc.constantFrom(...ALL), temperature, (text, T) => {
        const a = evaluateStep({ equation: text, temperature: `${T} K` }, { lookup: nbsLookup });
        const b = evaluateStep({ equation: text, temperature: `${T + 1e-3} K` }, { lookup: nbsLookup });
        const bound = ((Math.abs(a.deltaS0_J_per_K) + 10) * 1e-3) / 1000 + 1e-9;
        expect(Math.abs(b.deltaG0_kJ - a.deltaG0_kJ)).toBeLessThanOrEqual(bound);
      }),
      { numRuns: 80 },
    );
  });

  it('ΔG = 0 at the computed equilibrium composition (gas phase)', () => {
    const amount = fc.double({ min: 0.01, max: 10, noNaN: true });
    fc.assert(
      fc.property(
        fc.constantFrom(...GAS_REACTIONS),
        fc.double({ min: 400, max: 1200, noNaN: true }),
        fc.double({ min: 0.1, max: 300, noNaN: true }),
        fc.array(amount, { minLength: 4, maxLength: 4 }),
        fc.constantFrom<'1 bar' | '1 atm'>('1 bar', '1 atm'),
        (text, T, P, amounts, standardPressure) => {
          const species = [...new Set(text.replace(/<=>/, '+').split('+').map((s) => s.trim().replace(/^\d+\s+/, '')))];
          const initial = Object.fromEntries(species.map((s, i) => [s, `${i % 2 === 0 ? amounts[i % 4] : 0} mol`]));
          const base = { equation: text, temperature: `${T} K`, standardPressure, totalPressure: `${P} bar` };
          const r = evaluateStep({ ...base, initial }, { lookup: nbsLookup });
          const n = r.equilibrium!.amounts_mol;
          const total = Object.values(n).reduce((x, y) => x + y, 0);
          fc.pre(Object.values(n).every((v) => v > 1e-200));
          const pressures = Object.fromEntries(Object.entries(n).map(([k, v]) => [k, `${(v / total) * P} bar`]));
          const again = evaluateStep({ ...base, pressures }, { lookup: nbsLookup });
          expect(Math.abs(again.deltaG_kJ!)).toBeLessThan(1e-6);
          expect(again.direction).toBe('at equilibrium');
        },
      ),
      { numRuns: 80 },
    );
  });

  it('ΔG = 0 at the computed equilibrium composition (solution)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1, noNaN: true }), fc.double({ min: 0, max: 0.1, noNaN: true }), (c0, a0) => {
        const equation = 'CH3COOH(aq) <=> CH3COO-(aq) + H+(aq)';
        const r = evaluateStep({ equation, initial: { 'CH3COOH(aq)': `${c0} mol/L`, 'CH3COO-(aq)': `${a0} mol/L` } }, { lookup: nbsLookup });
        const n = r.equilibrium!.amounts_mol;
        const concentrations = Object.fromEntries(Object.entries(n).map(([k, v]) => [k, `${v} mol/L`]));
        expect(Math.abs(evaluateStep({ equation, concentrations }, { lookup: nbsLookup }).deltaG_kJ!)).toBeLessThan(1e-6);
      }),
      { numRuns: 60 },
    );
  });
});

// Every number in a response must be a plain finite JSON number.
function assertAllFinite(value: unknown, path = '$'): void {
  if (typeof value === 'number') {
    expect(Number.isFinite(value), `${path} = ${value}`).toBe(true);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => assertAllFinite(v, `${path}[${i}]`));
  } else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) assertAllFinite(v, `${path}.${k}`);
  }
}

describe('no NaN or Infinity in any response over fuzzed requests', () => {
  const keys = builtinSpecies().map((r) => r.key);
  const T = fc.oneof(
    fc.double({ min: 10, max: 50000, noNaN: true }).map((t) => `${t} K`),
    fc.double({ min: -263, max: 3000, noNaN: true }).map((t) => `${t} degC`),
  );
  const pressure = fc.double({ min: 1e-30, max: 1e4, noNaN: true }).map((p) => `${p} bar`);

  it('holds for library reactions with random conditions, equilibria and flags', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ALL),
        T,
        fc.boolean(),
        fc.constantFrom<'1 bar' | '1 atm'>('1 bar', '1 atm'),
        fc.option(fc.tuple(pressure, pressure), { nil: undefined }),
        fc.option(fc.double({ min: 1e-6, max: 1e4, noNaN: true }), { nil: undefined }),
        (equation, temperature, heatCapacity, standardPressure, ps, amount) => {
          const gases = [...equation.matchAll(/([A-Za-z0-9()]+\(g\))/g)].map((m) => m[1]!);
          const req: EvaluateRequest = { equation, temperature, heatCapacity, standardPressure, electrons: 2 };
          if (ps && gases.length > 0) req.pressures = { [gases[0]!]: ps[0], [gases[gases.length - 1]!]: ps[1] };
          const firstSpecies = /[A-Z(][^\s+]*\([a-z]+\)/.exec(equation)![0];
          if (amount !== undefined) req.initial = { [firstSpecies]: `${amount} mol` };
          let r: EvaluateResponse | undefined;
          try {
            r = evaluateStep(req, { lookup: nbsLookup });
          } catch (err) {
            if (!isThermoError(err)) throw err;
          }
          if (r) assertAllFinite(r);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('holds for random species combinations (most fail to balance; none may crash)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom(...keys), { minLength: 1, maxLength: 2 }),
        fc.array(fc.constantFrom(...keys), { minLength: 1, maxLength: 2 }),
        fc.array(fc.integer({ min: 1, max: 6 }), { minLength: 4, maxLength: 4 }),
        T,
        (left, right, coeffs, temperature) => {
          const side = (ks: string[], off: number) => ks.map((k, i) => `${coeffs[off + i]} ${k}`).join(' + ');
          try {
            assertAllFinite(evaluateStep({ equation: `${side(left, 0)} -> ${side(right, 2)}`, temperature }, { lookup: nbsLookup }));
          } catch (err) {
            if (!isThermoError(err)) throw err;
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});
