// Hess's law: with all yields 1 the last cumulative ΔG° equals ΔrG° of the route's net reaction.
// Net equations are worked by hand here; the published check uses NBS Tables 1982 (Wagman et al.,
// J. Phys. Chem. Ref. Data 11, Suppl. 2) ΔfG° values, quoted from memory.
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateStep } from '@/lib/thermo';
import { evaluateRoute, routeNetEquation, type RouteEvaluateRequest } from '@/lib/thermo/route';

interface Route {
  name: string;
  request: RouteEvaluateRequest;
  net: string;
  /** Σ ν ΔfG° of the net reaction at 298.15 K from NBS 1982 values (from memory) */
  published_kJ: number;
  values: string;
}

const REFORMING = 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)';

const ROUTES: Route[] = [
  {
    name: 'steam reforming then methanol synthesis',
    request: {
      target: 'CH3OH(g)',
      steps: [
        { id: 'reform', equation: REFORMING },
        { id: 'meoh', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' },
      ],
      links: [
        { from: 'reform', to: 'meoh', species: 'CO(g)' },
        { from: 'reform', to: 'meoh', species: 'H2(g)' },
      ],
    },
    net: 'CH4(g) + H2O(g) -> CH3OH(g) + H2(g)',
    published_kJ: -161.96 - (-50.72 - 228.572),
    values: 'CH3OH(g) −161.96; CH4(g) −50.72; H2O(g) −228.572',
  },
  {
    name: 'steam reforming, water-gas shift, CO2 hydrogenation',
    request: {
      target: 'CH3OH(g)',
      steps: [
        { id: 'reform', equation: REFORMING },
        { id: 'shift', equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)' },
        { id: 'hydro', equation: 'CO2(g) + 3 H2(g) -> CH3OH(g) + H2O(g)' },
      ],
      links: [
        { from: 'reform', to: 'shift', species: 'CO(g)' },
        { from: 'shift', to: 'hydro', species: 'CO2(g)' },
        { from: 'reform', to: 'hydro', species: 'H2(g)' },
      ],
    },
    net: 'CH4(g) + H2O(g) -> CH3OH(g) + H2(g)',
    published_kJ: -161.96 - (-50.72 - 228.572),
    values: 'as above: same net reaction by another path',
  },
  {
    name: 'contact process (sulfur → SO2 → SO3 → sulfuric acid), 2 mol',
    request: {
      target: 'H2SO4(l)',
      targetAmount: '2 mol',
      steps: [
        { id: 'burn', equation: 'S(s) + O2(g) -> SO2(g)' },
        { id: 'oxidise', equation: '2 SO2(g) + O2(g) -> 2 SO3(g)' },
        { id: 'absorb', equation: 'SO3(g) + H2O(l) -> H2SO4(l)' },
      ],
      links: [
        { from: 'burn', to: 'oxidise', species: 'SO2(g)' },
        { from: 'oxidise', to: 'absorb', species: 'SO3(g)' },
      ],
    },
    net: '2 S(s) + 3 O2(g) + 2 H2O(l) -> 2 H2SO4(l)',
    published_kJ: 2 * (-690.003 - -237.129),
    values: 'H2SO4(l) −690.003; H2O(l) −237.129',
  },
  {
    name: 'ammonia oxidation to nitric acid (fractional extents 3/8, 3/4, 1/2)',
    request: {
      target: 'HNO3(aq)',
      steps: [
        { id: 'burn', equation: '4 NH3(g) + 5 O2(g) -> 4 NO(g) + 6 H2O(g)' },
        { id: 'oxidise', equation: '2 NO(g) + O2(g) -> 2 NO2(g)' },
        { id: 'absorb', equation: '3 NO2(g) + H2O(l) -> 2 HNO3(aq) + NO(g)' },
      ],
      links: [
        { from: 'burn', to: 'oxidise', species: 'NO(g)' },
        { from: 'oxidise', to: 'absorb', species: 'NO2(g)' },
      ],
    },
    net: '3/2 NH3(g) + 21/8 O2(g) + 1/2 H2O(l) -> 9/4 H2O(g) + HNO3(aq) + 1/2 NO(g)',
    published_kJ: 2.25 * -228.572 + -111.25 + 0.5 * 86.55 - 1.5 * -16.45 - 0.5 * -237.129,
    values: 'HNO3(aq) −111.25; NO(g) 86.55; NH3(g) −16.45; H2O(g) −228.572; H2O(l) −237.129',
  },
];

describe("Hess's law over whole routes", () => {
  it.each(ROUTES)('$name: last cumulative ΔG° = ΔrG° of the net reaction at 298.15 K [$values]', ({ request, net, published_kJ }) => {
    const r = evaluateRoute(request, { lookup: nbsLookup });
    const last = r.steps[r.steps.length - 1]!;
    const direct = evaluateStep({ equation: net }, { lookup: nbsLookup });
    expect(last.cumulative0_kJ).toBeCloseTo(direct.deltaG0_kJ, 9);
    expect(r.overall.deltaG0_kJ).toBe(last.cumulative0_kJ);
    expect(Math.abs(direct.deltaG0_kJ - published_kJ)).toBeLessThan(0.01);
  });

  it.each(ROUTES)('$name: holds at 900 K too (ΔG° linear in the stoichiometry)', ({ request, net }) => {
    const hot = { ...request, steps: request.steps.map((s) => ({ ...s, temperature: '900 K' })) };
    const r = evaluateRoute(hot, { lookup: nbsLookup });
    expect(r.overall.deltaG0_kJ).toBeCloseTo(evaluateStep({ equation: net, temperature: '900 K' }, { lookup: nbsLookup }).deltaG0_kJ, 9);
  });

  it.each(ROUTES)('$name: routeNetEquation finds the hand-worked net reaction', ({ request, net }) => {
    const nu = (equation: string): Record<string, number> =>
      Object.fromEntries(evaluateStep({ equation }, { lookup: nbsLookup }).species.map((s) => [s.key, s.nu]));
    const found = routeNetEquation(request, evaluateRoute(request, { lookup: nbsLookup }), nbsLookup);
    expect(found).not.toBeNull();
    expect(nu(found!)).toEqual(nu(net));
  });
});
