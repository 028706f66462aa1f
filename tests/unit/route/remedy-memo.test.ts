// Remedies are memoised per step: a re-evaluation must give the same answer as a fresh one, and an
// edited step must get fresh remedies. Calcination values: NBS Tables 1982 (Wagman et al.), by hand.
import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { evaluateRoute, type RouteEvaluateRequest } from '@/lib/thermo/route';
import { layeredLookup } from '@/lib/thermo';

const CALCINATION = 'CaCO3(s) -> CaO(s) + CO2(g)';

function route(temperature2: string): RouteEvaluateRequest {
  return {
    target: 'CaO(s)',
    steps: [
      { id: 'a', equation: 'CaO(s) + CO2(g) -> CaCO3(s)', temperature: '298.15 K' },
      { id: 'b', equation: CALCINATION, temperature: temperature2 },
    ],
    links: [{ from: 'a', to: 'b', species: 'CaCO3(s)' }],
  };
}

describe('remedy memo', () => {
  it('a second evaluation reuses the remedies and equals a fresh evaluation with an empty memo', () => {
    const first = evaluateRoute(route('700 K'), { lookup: nbsLookup });
    const second = evaluateRoute(route('700 K'), { lookup: nbsLookup });
    const b1 = first.steps.find((s) => s.id === 'b')!;
    const b2 = second.steps.find((s) => s.id === 'b')!;
    expect(b1.class).toBe('uphill');
    expect(b1.remedies.length).toBeGreaterThan(1);
    expect(b2.remedies).toBe(b1.remedies);
    // A lookup of its own has its own memo: the same numbers computed from scratch.
    const fresh = evaluateRoute(route('700 K'), { lookup: layeredLookup([], nbsLookup) });
    expect(JSON.parse(JSON.stringify(fresh))).toEqual(JSON.parse(JSON.stringify(second)));
  });

  it('an edited step gets remedies for its new conditions', () => {
    const at700 = evaluateRoute(route('700 K'), { lookup: nbsLookup }).steps.find((s) => s.id === 'b')!;
    const at800 = evaluateRoute(route('800 K'), { lookup: nbsLookup }).steps.find((s) => s.id === 'b')!;
    expect(at800.remedies).not.toBe(at700.remedies);
    const t700 = at700.remedies.find((r) => r.kind === 'temperature')!;
    const t800 = at800.remedies.find((r) => r.kind === 'temperature')!;
    expect(t700.kind === 'temperature' && t700.current_K).toBe(700);
    expect(t800.kind === 'temperature' && t800.current_K).toBe(800);
  });

  it('a different driver list is a different key', () => {
    const all = evaluateRoute(route('700 K'), { lookup: nbsLookup }).steps.find((s) => s.id === 'b')!;
    const none = evaluateRoute(route('700 K'), { lookup: nbsLookup, drivers: [] }).steps.find((s) => s.id === 'b')!;
    expect(all.remedies.some((r) => r.kind === 'coupling')).toBe(true);
    expect(none.remedies.some((r) => r.kind === 'coupling')).toBe(false);
  });
});
