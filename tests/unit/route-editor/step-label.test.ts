import { describe, expect, it } from 'vitest';
import { AFTER_STEP_WORD, labelOf, relabelStepIds, routeStepOrder, stepLabels, stepName } from '@/lib/route-editor/step-label';
import { buildRouteGraph } from '@/lib/thermo/route/route-graph';

// Document order: the linked pair first, the lone step last.
const steps = [
  { id: 'reform', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)' },
  { id: 's-8ab5e2fd', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' },
  { id: 's-c522bf8f', equation: 'C2H5OH(g) -> CH3CHO(g) + H2(g)' },
];
const links = [{ from: 'reform', to: 's-8ab5e2fd' }];

describe('route order', () => {
  it('is the engine\'s order (Kahn, ties by document order) whenever the engine can build the graph', () => {
    const cases: { ids: string[]; links: { from: string; to: string }[] }[] = [
      { ids: ['a', 'b', 'c'], links: [] },
      { ids: ['c', 'b', 'a'], links: [{ from: 'a', to: 'b' }, { from: 'b', to: 'c' }] },
      { ids: ['x', 'y', 'z', 'w'], links: [{ from: 'w', to: 'x' }, { from: 'z', to: 'x' }, { from: 'y', to: 'z' }] },
      { ids: ['p', 'q', 'r', 's', 't'], links: [{ from: 't', to: 'p' }, { from: 't', to: 'q' }, { from: 's', to: 'p' }, { from: 't', to: 'p' }] },
    ];
    for (const c of cases) {
      const graph = buildRouteGraph(c.ids, c.links.map((l) => ({ ...l, species: 'X' })));
      expect(routeStepOrder(c.ids.map((id) => ({ id })), c.links)).toEqual(graph.order.map((i) => c.ids[i]));
    }
  });

  it('still numbers every step when links form a cycle or name a missing step', () => {
    const order = routeStepOrder([{ id: 'a' }, { id: 'b' }, { id: 'c' }], [{ from: 'a', to: 'b' }, { from: 'b', to: 'a' }, { from: 'c', to: 'gone' }]);
    expect(order).toEqual(['c', 'a', 'b']);
  });

  it('puts a step after the steps that feed it, even when the document lists it first', () => {
    expect(routeStepOrder([{ id: 'late' }, { id: 'early' }], [{ from: 'early', to: 'late' }])).toEqual(['early', 'late']);
  });
});

describe('step labels', () => {
  it('say "Step n (what it does)": the library name where the equation is a library reaction, else the equation', () => {
    const labels = stepLabels(steps, links);
    expect(labels.get('reform')).toEqual({ number: 1, short: 'Step 1', full: 'Step 1 (steam reforming of methane)' });
    expect(labels.get('s-8ab5e2fd')!.full).toBe('Step 2 (methanol from carbon monoxide)');
    expect(labels.get('s-c522bf8f')!.full).toBe('Step 3 (ethanol dehydrogenation)');
    expect(stepName('H2O(g) + CH4(g)  ->  3 H2(g) + CO(g)')).toBe('steam reforming of methane');
    expect(stepName('N2O4(g) -> 2 NO2(g)')).toBe('N2O4(g) → 2 NO2(g)');
    expect(stepName('n-C4H10(g) -> C4H8(g) + H2(g)')).not.toMatch(/^N/);
    expect(stepName('')).toBe('blank');
    expect(labelOf(labels, 'gone')).toBe('a removed step');
    expect(labelOf(labels, null)).toBe('the whole route');
  });

  it('relabels ids in prose as whole tokens only, swallowing a "step" before them', () => {
    const labels = stepLabels(steps, links);
    expect(relabelStepIds('Step reform: no extent', labels)).toBe('Step 1 (steam reforming of methane): no extent');
    expect(relabelStepIds('Could not evaluate s-c522bf8f; the totals leave it out', labels)).toBe('Could not evaluate Step 3 (ethanol dehydrogenation); the totals leave it out');
    expect(relabelStepIds('the reformer, s-8ab5e2fd0', labels)).toBe('the reformer, s-8ab5e2fd0');
    // Only after the word "step" where prose might share the letters.
    expect(relabelStepIds('Ana commented on reform works · step reform', labels, AFTER_STEP_WORD)).toBe('Ana commented on reform works · Step 1 (steam reforming of methane)');
  });
});
