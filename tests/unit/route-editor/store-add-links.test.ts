import { describe, expect, it } from 'vitest';
import type { RouteDraft } from '@/lib/schemas/route';
import { createRouteEditorStore } from '@/stores/route-editor-store';

const EMPTY: RouteDraft = { name: 'R', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -10, steps: [], links: [] };

describe('adding several links at once', () => {
  it('adds only the new ones, as one undo entry', () => {
    const store = createRouteEditorStore(EMPTY, 1);
    const a = store.getState().addStep({ equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', position: { x: 0, y: 0 } });
    const b = store.getState().addStep({ equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', position: { x: 300, y: 0 } });
    store.getState().addLink({ from: a, to: b, species: 'CO(g)' });
    const added = store.getState().addLinks([
      { from: a, to: b, species: 'CO(g)' },
      { from: a, to: b, species: 'H2(g)' },
      { from: a, to: b, species: 'H2(g)' },
      { from: b, to: b, species: 'CH3OH(g)' },
    ]);
    expect(added).toBe(1);
    expect(store.getState().doc.links).toEqual([
      { from: a, to: b, species: 'CO(g)' },
      { from: a, to: b, species: 'H2(g)' },
    ]);
    store.getState().undo();
    expect(store.getState().doc.links).toEqual([{ from: a, to: b, species: 'CO(g)' }]);
    const before = store.getState().past.length;
    expect(store.getState().addLinks([{ from: a, to: b, species: 'CO(g)' }])).toBe(0);
    expect(store.getState().past.length).toBe(before);
  });
});
