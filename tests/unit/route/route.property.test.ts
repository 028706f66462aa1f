// Random chains of library reactions, each step consuming something the previous one makes.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep } from '@/lib/thermo';
import { evaluateRoute, routeNetEquation, type RouteEvaluateRequest } from '@/lib/thermo/route';

interface PoolReaction {
  equation: string;
  consumes: string[];
  makes: string[];
}

const POOL: PoolReaction[] = [
  { equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', consumes: ['CH4(g)', 'H2O(g)'], makes: ['CO(g)', 'H2(g)'] },
  { equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)', consumes: ['CO(g)', 'H2O(g)'], makes: ['CO2(g)', 'H2(g)'] },
  { equation: 'CO2(g) + 3 H2(g) -> CH3OH(g) + H2O(g)', consumes: ['CO2(g)', 'H2(g)'], makes: ['CH3OH(g)', 'H2O(g)'] },
  { equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', consumes: ['CO(g)', 'H2(g)'], makes: ['CH3OH(g)'] },
  { equation: 'CH3OH(g) -> HCHO(g) + H2(g)', consumes: ['CH3OH(g)'], makes: ['HCHO(g)', 'H2(g)'] },
  { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', consumes: ['N2(g)', 'H2(g)'], makes: ['NH3(g)'] },
  { equation: 'NH3(g) + HCl(g) -> NH4Cl(s)', consumes: ['NH3(g)', 'HCl(g)'], makes: ['NH4Cl(s)'] },
  { equation: 'NH4Cl(s) -> NH3(g) + HCl(g)', consumes: ['NH4Cl(s)'], makes: ['NH3(g)', 'HCl(g)'] },
  { equation: 'H2(g) + Cl2(g) -> 2 HCl(g)', consumes: ['H2(g)', 'Cl2(g)'], makes: ['HCl(g)'] },
  { equation: '4 NH3(g) + 5 O2(g) -> 4 NO(g) + 6 H2O(g)', consumes: ['NH3(g)', 'O2(g)'], makes: ['NO(g)', 'H2O(g)'] },
  { equation: '2 NO(g) + O2(g) -> 2 NO2(g)', consumes: ['NO(g)', 'O2(g)'], makes: ['NO2(g)'] },
  { equation: '2 NO2(g) -> N2O4(g)', consumes: ['NO2(g)'], makes: ['N2O4(g)'] },
  { equation: 'N2O4(g) -> 2 NO2(g)', consumes: ['N2O4(g)'], makes: ['NO2(g)'] },
  { equation: '2 SO2(g) + O2(g) -> 2 SO3(g)', consumes: ['SO2(g)', 'O2(g)'], makes: ['SO3(g)'] },
  { equation: 'CaCO3(s) -> CaO(s) + CO2(g)', consumes: ['CaCO3(s)'], makes: ['CaO(s)', 'CO2(g)'] },
  { equation: 'C(s) + CO2(g) -> 2 CO(g)', consumes: ['C(s)', 'CO2(g)'], makes: ['CO(g)'] },
  { equation: '2 H2O(g) -> 2 H2(g) + O2(g)', consumes: ['H2O(g)'], makes: ['H2(g)', 'O2(g)'] },
];

const TEMPERATURES = ['298.15 K', '500 K', '800 K'];

const chainArb = fc.record({
  picks: fc.array(fc.nat(), { minLength: 1, maxLength: 6 }),
  yields: fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: 6, maxLength: 6 }),
  temperature: fc.constantFrom(...TEMPERATURES),
  targetPick: fc.nat(),
});

interface Chain {
  picks: number[];
  yields: number[];
  temperature: string;
  targetPick: number;
}

function buildChain(c: Chain, withYields: boolean): RouteEvaluateRequest {
  const chosen: PoolReaction[] = [POOL[c.picks[0]! % POOL.length]!];
  const carried: string[] = [];
  for (const pick of c.picks.slice(1)) {
    const prev = chosen[chosen.length - 1]!;
    const next = POOL.filter((r) => r.consumes.some((s) => prev.makes.includes(s)));
    if (next.length === 0) break; // nothing in the pool uses what the last step makes
    const r = next[pick % next.length]!;
    const shared = r.consumes.filter((s) => prev.makes.includes(s));
    carried.push(shared[pick % shared.length]!);
    chosen.push(r);
  }
  const last = chosen[chosen.length - 1]!;
  return {
    target: last.makes[c.targetPick % last.makes.length]!,
    steps: chosen.map((r, i) => ({ id: `s${i + 1}`, equation: r.equation, temperature: c.temperature, ...(withYields ? { yield: c.yields[i]! } : {}) })),
    links: carried.map((species, i) => ({ from: `s${i + 1}`, to: `s${i + 2}`, species })),
  };
}

function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

describe('random chains of library reactions', () => {
  it('cumulative series are running sums, overall = last cumulative, JSON clean', () => {
    fc.assert(
      fc.property(chainArb, (c) => {
        const r = evaluateRoute(buildChain(c, true), { lookup: nbsLookup });
        let sum = 0;
        let sum0 = 0;
        for (const s of r.steps) {
          expect(s.extent_mol).not.toBeNull();
          expect(s.extent_mol!).toBeGreaterThan(0);
          sum += s.deltaG_kJ ?? 0;
          sum0 += s.deltaG0_kJ ?? 0;
          expect(s.cumulative_kJ).toBeCloseTo(sum, 9);
          expect(s.cumulative0_kJ).toBeCloseTo(sum0, 9);
        }
        const last = r.steps[r.steps.length - 1]!;
        expect(r.overall.deltaG_kJ).toBe(last.cumulative_kJ);
        expect(r.overall.deltaG0_kJ).toBe(last.cumulative0_kJ);
        expect(allFinite(r)).toBe(true);
        expect(JSON.parse(JSON.stringify(r))).toEqual(r);
      }),
      { numRuns: 40, seed: 20240611 },
    );
  });

  it("obeys Hess's law with yields 1: last cumulative ΔG° = ΔrG° of the net reaction", () => {
    fc.assert(
      fc.property(chainArb, (c) => {
        const req = buildChain(c, false);
        const r = evaluateRoute(req, { lookup: nbsLookup });
        const net = routeNetEquation(req, r, nbsLookup);
        // A chain can cancel to nothing (e.g. N2O4 split then dimerised back); then ΔG° is 0.
        const direct = net === null ? 0 : evaluateStep({ equation: net, temperature: c.temperature }, { lookup: nbsLookup }).deltaG0_kJ;
        expect(r.overall.deltaG0_kJ).toBeCloseTo(direct, 6);
      }),
      { numRuns: 40, seed: 20240612 },
    );
  });
});
