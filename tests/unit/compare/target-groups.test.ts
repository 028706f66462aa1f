import { describe, expect, it } from 'vitest';
import { differentTargets } from '@/lib/compare/target-groups';

describe('differentTargets', () => {
  it('is null when every route makes the same target, spacing aside', () => {
    expect(differentTargets([{ name: 'A', target: 'CH3OH(l)' }, { name: 'B', target: 'CH3OH (l)' }])).toBeNull();
  });

  it('groups the routes by target in first-seen order', () => {
    const groups = differentTargets([
      { name: 'Syngas route', target: 'CH3OH(l)' },
      { name: 'Ethanol route', target: 'C2H5OH(l)' },
      { name: 'CO2 route', target: 'CH3OH(l)' },
    ]);
    expect(groups).toEqual([
      { target: 'CH3OH(l)', routeNames: ['Syngas route', 'CO2 route'] },
      { target: 'C2H5OH(l)', routeNames: ['Ethanol route'] },
    ]);
  });

  it('tells a phase apart and keeps case: CO is not Co, the gas is not the liquid', () => {
    expect(differentTargets([{ name: 'A', target: 'CO(g)' }, { name: 'B', target: 'Co(s)' }])).toHaveLength(2);
    expect(differentTargets([{ name: 'A', target: 'CH3OH(g)' }, { name: 'B', target: 'CH3OH(l)' }])).toHaveLength(2);
  });
});
