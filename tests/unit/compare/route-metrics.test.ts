// Metric columns against hand sums of NBS Tables 1982 (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2)
// ΔfG° values at 298.15 K, quoted from memory: CO2(g) −394.359, CaCO3(calcite) −1128.79, CaO −604.03,
// NO2 51.31, N2O4 97.89, NH3(g) −16.45, CH4 −50.72, H2O(g) −228.572, CO −137.168 kJ/mol.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { CompareLadder, sharedDomain } from '@/components/compare/compare-ladder';
import { metricText } from '@/components/compare/metric-format';
import { metricsCsv } from '@/components/compare/metrics-csv';
import { buildComparison } from '@/lib/compare/build-comparison';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import { DEFAULT_DRIVERS, evaluateRoute, type RouteEvaluateRequest } from '@/lib/thermo/route';
import { builtinLookup, nbsLookup } from '@/lib/thermo/species-library';
import { loadChem } from '@/lib/thermo/structure/chem';
import { structureLookup } from '@/lib/thermo/structure/structure-lookup';
import {
  CALCINATION, CARBON_BURN, NH3_SYNTHESIS, NO2_DIMER, forComparison, oneStep, reformingThenShift,
} from './compare-fixtures';

const TOL = 0.01; // kJ, as in tests/reference/nbs-reactions-298.test.ts

function metricsOf(...args: Parameters<typeof forComparison>) {
  const route = forComparison(...args);
  return buildComparison([route], {}, nbsLookup).routes[0]!;
}

describe('route metrics', () => {
  it('a downhill one-step route: C + O2 → CO2, ΔG° = −394.359 kJ per mol CO2 (NBS 1982, from memory)', () => {
    const { metrics: m } = metricsOf(oneStep('CO2(g)', CARBON_BURN));
    expect(Math.abs(m.overallDeltaG0_kJ! - -394.359)).toBeLessThanOrEqual(TOL);
    expect(Math.abs(m.overallDeltaG_kJ! - -394.359)).toBeLessThanOrEqual(TOL); // no pressures given: ΔG = ΔG°
    expect(m).toMatchObject({ stepCount: 1, uphillSteps: 0, marginalSteps: 0, errorSteps: 0, largestUphill_kJ: null, driversNeeded: [], uncoupledUphillSteps: 0, estimatedSteps: 0 });
    expect(Math.abs(m.smallestDrivingForce_kJ! - 394.359)).toBeLessThanOrEqual(TOL);
    expect(m.temperatureMin_K).toBe(298.15);
    expect(m.temperatureMax_K).toBe(298.15);
  });

  it('an uphill step: CaCO3 → CaO + CO2, ΔG° = +130.401 kJ (NBS 1982, from memory); its coupling drivers are named once each', () => {
    const { metrics: m } = metricsOf(oneStep('CO2(g)', CALCINATION));
    expect(Math.abs(m.overallDeltaG0_kJ! - 130.401)).toBeLessThanOrEqual(TOL);
    expect(m.uphillSteps).toBe(1);
    expect(Math.abs(m.largestUphill_kJ! - 130.401)).toBeLessThanOrEqual(TOL);
    expect(Math.abs(m.smallestDrivingForce_kJ! - -130.401)).toBeLessThanOrEqual(TOL);
    expect(m.driversNeeded.length).toBeGreaterThan(0);
    const known = DEFAULT_DRIVERS.map((d) => d.name);
    for (const name of m.driversNeeded) expect(known).toContain(name);
    expect(m.uncoupledUphillSteps).toBe(0);
  });

  it('names a driver once when two uphill steps use it', () => {
    // Calcination (+130.401) feeds CO2 to the reverse shift (+28.619): both uphill at 298.15 K (NBS 1982, from memory).
    const request = {
      target: 'CO(g)',
      steps: [{ id: 'calcine', equation: CALCINATION }, { id: 'reverse', equation: 'CO2(g) + H2(g) -> CO(g) + H2O(g)' }],
      links: [{ from: 'calcine', to: 'reverse', species: 'CO2(g)' }],
    };
    const route = forComparison(request);
    const evaluation = 'evaluation' in route.outcome ? route.outcome.evaluation : null;
    const used = evaluation!.steps.filter((s) => s.class === 'uphill').flatMap((s) => s.remedies.flatMap((r) => (r.kind === 'coupling' ? [r.driverName] : [])));
    expect(new Set(used).size).toBeLessThan(used.length); // some driver serves both steps
    const { metrics } = buildComparison([route], {}, nbsLookup).routes[0]!;
    expect(metrics.uphillSteps).toBe(2);
    expect(metrics.driversNeeded).toEqual([...new Set(used)]);
  });

  it('a marginal step: 2 NO2 → N2O4, ΔG° = −4.73 kJ (NBS 1982, from memory) is above the −17 kJ threshold (common practice)', () => {
    const { metrics: m } = metricsOf(oneStep('N2O4(g)', NO2_DIMER));
    expect(m).toMatchObject({ uphillSteps: 0, marginalSteps: 1, largestUphill_kJ: null });
    expect(Math.abs(m.smallestDrivingForce_kJ! - 4.73)).toBeLessThanOrEqual(TOL);
  });

  it('gives energies per mol of target whatever amount the route plans for: NH3 ΔfG° = −16.45 kJ/mol (NBS 1982, from memory)', () => {
    for (const targetAmount of ['1 mol', '2 mol', '250 mol']) {
      const route = metricsOf(oneStep('NH3(g)', NH3_SYNTHESIS, { targetAmount }));
      expect(Math.abs(route.metrics.overallDeltaG0_kJ! - -16.45)).toBeLessThanOrEqual(TOL);
      expect(Math.abs(route.ladder!.steps[0]!.deltaG0_kJ! - -16.45)).toBeLessThanOrEqual(TOL);
      // The driving force stays per mol of reaction as written (−32.90 kJ for 2 NH3), the basis of the classes.
      expect(Math.abs(route.metrics.smallestDrivingForce_kJ! - 32.9)).toBeLessThanOrEqual(TOL);
    }
  });

  it('a two-step ladder: reforming (+142.124) then shift (−28.619) gives +113.505 kJ per mol CO2 (NBS 1982 sums, from memory)', () => {
    const route = metricsOf(reformingThenShift());
    const [s1, s2] = route.ladder!.steps;
    expect(route.ladder!.order).toEqual(['s1', 's2']);
    expect(s1).toMatchObject({ id: 's1', class: 'uphill', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)' });
    expect(Math.abs(s1!.cumulative0_kJ - 142.124)).toBeLessThanOrEqual(TOL);
    expect(s2!.class).toBe('downhill');
    expect(Math.abs(s2!.deltaG0_kJ! - -28.619)).toBeLessThanOrEqual(TOL);
    expect(Math.abs(s2!.cumulative0_kJ - 113.505)).toBeLessThanOrEqual(TOL);
    expect(Math.abs(route.metrics.overallDeltaG0_kJ! - 113.505)).toBeLessThanOrEqual(TOL);
    expect(Math.abs(route.metrics.largestUphill_kJ! - 142.124)).toBeLessThanOrEqual(TOL);
    expect(route.metrics).toMatchObject({ stepCount: 2, uphillSteps: 1, marginalSteps: 0 });
  });

  it('spans the temperatures the steps are set to', () => {
    const { metrics: m } = metricsOf(reformingThenShift(['1100 K', '500 K']));
    expect(m.temperatureMin_K).toBe(500);
    expect(m.temperatureMax_K).toBe(1100);
  });

  it('counts a failed step and leaves it out of the totals', () => {
    const route = metricsOf({ target: 'CO2(g)', steps: [{ id: 's1', equation: CARBON_BURN }, { id: 's2', equation: 'Unobtainium(s) -> CO2(g)' }] });
    expect(route.metrics.errorSteps).toBe(1);
    expect(route.ladder!.steps.find((s) => s.id === 's2')).toMatchObject({ class: 'error', deltaG_kJ: null, error: expect.any(String) });
    expect(Math.abs(route.metrics.overallDeltaG0_kJ! - -394.359)).toBeLessThanOrEqual(TOL);
  });

  it('keeps review counts, status and last edit as given, and leaves energy rows null for a route the engine refused', () => {
    const refused = forComparison(oneStep('CO2(g)', CARBON_BURN), {
      status: 'in_review', openFlags: 2, unresolvedComments: 3, updatedBy: 'Hanne Vasquez-Lind',
      outcome: { error: { code: 'ROUTE_CYCLE', message: 'The links form a cycle', field: 'links' } },
    });
    const [r] = buildComparison([refused], {}, nbsLookup).routes;
    expect(r!.ladder).toBeNull();
    expect(r!.error).toMatchObject({ code: 'ROUTE_CYCLE' });
    expect(r!.metrics).toMatchObject({
      overallDeltaG_kJ: null, overallDeltaG0_kJ: null, uphillSteps: null, largestUphill_kJ: null, smallestDrivingForce_kJ: null,
      stepCount: 1, openFlags: 2, unresolvedComments: 3, status: 'in_review', updatedBy: 'Hanne Vasquez-Lind', updatedAt: '2026-12-01T09:00:00.000Z',
    });
  });
});

describe('the "Estimated values used" row', () => {
  it('counts the steps whose ΔG uses an estimated species, and is the same number in the table text and the CSV', async () => {
    // Ethyl acetate forced through the estimator in one step; the other step is all library values.
    const lookup = structureLookup(builtinLookup, await loadChem());
    const request: RouteEvaluateRequest = {
      target: 'EtOAc',
      steps: [
        { id: 'hydrogenate', equation: 'MeCHO + H2(g) -> EtOH', species: { MeCHO: { name: 'acetaldehyde', phase: 'l' as const }, EtOH: { name: 'ethanol', phase: 'l' as const } } },
        { id: 'esterify', equation: 'EtOH + AcOH -> EtOAc + H2O(l)', species: { EtOH: { name: 'ethanol', phase: 'l' as const }, AcOH: { smiles: 'CC(=O)O', phase: 'l' as const }, EtOAc: { smiles: 'CCOC(C)=O', phase: 'l' as const, estimate: true } } },
      ],
      links: [{ from: 'hydrogenate', to: 'esterify', species: 'EtOH' }],
    };
    const route = { ...forComparison(oneStep('CO2(g)', CARBON_BURN)), name: 'Estimated ester', request, stepCount: 2, outcome: { evaluation: evaluateRoute(request, { lookup }) } };
    const plain = { ...forComparison(oneStep('CO2(g)', CARBON_BURN)), name: 'Plain' };
    const comparison = buildComparison([route, plain], {}, lookup);
    const [m, p] = comparison.routes.map((r) => r.metrics);
    expect(m!.estimatedSteps).toBe(1);
    expect(p!.estimatedSteps).toBe(0);
    expect(comparison.best.estimatedSteps).toEqual([]); // not ranked
    const units = { energyUnit: 'kJ', temperatureUnit: 'K' } as const;
    expect(metricText('estimatedSteps', m!, units)).toBe('1');
    // A decision recorded before the row existed has no value: a dash, never "undefined".
    const { estimatedSteps: _gone, ...old } = m!;
    expect(metricText('estimatedSteps', old, units)).toBe('—');
    const csvRow = metricsCsv(comparison, units, new Set(METRIC_ROWS.map((r) => r.key))).split('\r\n').find((l) => l.startsWith('Estimated values used'));
    expect(csvRow).toBe('Estimated values used,steps,1,0,');
    // The compared ladder marks the same step: a dotted frame and the words in its title.
    const ladder = comparison.routes[0]!.ladder!;
    expect(ladder.steps.map((st) => [st.id, st.estimated])).toEqual([['hydrogenate', false], ['esterify', true]]);
    const svg = renderToStaticMarkup(createElement(CompareLadder, { name: 'Estimated ester', ladder, domain_kJ: sharedDomain([ladder], 'conditions'), basis: 'conditions', unit: 'kJ', sharedStepIds: new Set<string>() }));
    expect(svg.match(/data-estimated="true"/g)).toHaveLength(1);
    expect(svg).toContain('stroke-dasharray="1 2.5"');
    expect(svg).toMatch(/2\. EtOH \+ AcOH -&gt; EtOAc \+ H2O\(l\): [^<]*uses estimated values/);
  });
});
