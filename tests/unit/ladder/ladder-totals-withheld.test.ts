// A route whose totals wait (no step makes the target yet) says so in words where the totals would be, never
// "0.0 kJ" (issue 19, item 1); its steps keep their own figures.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FreeEnergyLadder } from '@/components/ladder/free-energy-ladder';
import { evaluateRoute } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

describe('ladder while the route totals wait', () => {
  it('says why instead of a route total', () => {
    const evaluation = evaluateRoute({ target: 'CH3OH(g)', steps: [{ id: 'a', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)' }] }, { lookup: nbsLookup });
    const html = renderToStaticMarkup(createElement(FreeEnergyLadder, { evaluation, energyUnit: 'kJ', selectedStepId: null, onSelectStep: () => {} }));
    expect(html).toContain('Route totals wait for a complete route:');
    expect(html).toContain('No step makes the target CH3OH(g)');
    expect(html).not.toContain('Route ΔG');
  });
});
