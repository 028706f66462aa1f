// The ladder numbers its risers as the board numbers its nodes (the draft's route order), even while the answer on
// screen came from an earlier order; running sums then follow the drawn order (issue 19: stable step numbers).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FreeEnergyLadder } from '@/components/ladder/free-energy-ladder';
import { buildLadder } from '@/components/ladder/ladder-geometry';
import { ladderInRouteOrder } from '@/components/ladder/ladder-order';
import { stepLabels } from '@/lib/route-editor/step-label';
import { evaluateRoute } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

const steps = [
  { id: 'reform', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '298.15 K' },
  { id: 'synth', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '298.15 K' },
];
// Evaluated while the links ran reform → synth.
const evaluation = evaluateRoute({ target: 'CH3OH(g)', steps, links: [{ from: 'reform', to: 'synth', species: 'CO(g)' }] }, { lookup: nbsLookup });

describe('ladder in route order', () => {
  it('keeps the engine\'s order and sums exactly when the draft agrees', () => {
    const labels = stepLabels(steps, [{ from: 'reform', to: 'synth' }]);
    const drawn = ladderInRouteOrder(evaluation, new Map([...labels].map(([id, l]) => [id, l.number])));
    expect(drawn.order).toEqual(evaluation.order);
    expect(drawn.steps).toEqual(evaluation.steps);
    expect([...drawn.slots]).toEqual([['reform', 1], ['synth', 2]]);
  });

  it('follows the draft once its order differs, numbering as the board and summing along the drawn order', () => {
    // The draft now lists synth first (a new link the evaluation has not seen yet).
    const numbers = new Map([['synth', 1], ['reform', 2]]);
    const drawn = ladderInRouteOrder(evaluation, numbers);
    expect(drawn.order).toEqual(['synth', 'reform']);
    const [first, second] = drawn.steps;
    const byId = new Map(evaluation.steps.map((s) => [s.id, s]));
    expect(first!.cumulative_kJ).toBeCloseTo(byId.get('synth')!.deltaG_kJ!, 9);
    expect(second!.cumulative_kJ).toBeCloseTo(evaluation.overall.deltaG_kJ, 9);
    expect(second!.cumulative0_kJ).toBeCloseTo(evaluation.overall.deltaG0_kJ, 9);
    const model = buildLadder(drawn.order, drawn.steps, 'kJ', drawn.slots);
    expect(model.steps.map((s) => [s.id, s.slot])).toEqual([['synth', 1], ['reform', 2]]);
  });

  it('drops a step the draft no longer holds and keeps the board\'s number for the rest', () => {
    const drawn = ladderInRouteOrder(evaluation, new Map([['synth', 1]]));
    expect(drawn.order).toEqual(['synth']);
    expect(drawn.slots.get('synth')).toBe(1);
  });

  it('draws the riser numbers the board shows', () => {
    const labels = new Map([
      ['synth', { number: 1, short: 'Step 1', full: 'Step 1 (methanol synthesis)' }],
      ['reform', { number: 2, short: 'Step 2', full: 'Step 2 (steam reforming of methane)' }],
    ]);
    const html = renderToStaticMarkup(createElement(FreeEnergyLadder, { evaluation, energyUnit: 'kJ', selectedStepId: null, onSelectStep: () => {}, routeLabels: labels }));
    // Each riser's spoken name is "Step n, <its label>"; without stepLabels the label falls back to the id.
    const spoken = [...html.matchAll(/aria-label="Step (\d+), (\w+)/g)].map((m) => `${m[1]} ${m[2]}`);
    expect(spoken).toEqual(['1 synth', '2 reform']);
  });
});
