import { describe, expect, it } from 'vitest';
import { nbsLookup } from '@/lib/thermo/species-library';
import { ThermoError } from '@/lib/thermo';
import { RouteTooLargeError, evaluateRoute, MAX_ROUTE_STEPS, type RouteEvaluateRequest } from '@/lib/thermo/route';
import { NH3_SYNTHESIS, ammoniumChlorideTree, chain } from './route-fixtures';

function thrown(fn: () => unknown): ThermoError {
  try {
    fn();
  } catch (err) {
    expect(err).toBeInstanceOf(ThermoError);
    return err as ThermoError;
  }
  throw new Error('expected a ThermoError');
}

describe('topological order', () => {
  it('runs a chain given backwards in link order', () => {
    const req = chain('NH4Cl(s)', [NH3_SYNTHESIS, 'NH3(g) + HCl(g) -> NH4Cl(s)'], ['NH3(g)']);
    req.steps.reverse();
    expect(evaluateRoute(req, { lookup: nbsLookup }).order).toEqual(['s1', 's2']);
  });

  it('puts both branches of a tree before the step they feed, ties in input order', () => {
    expect(evaluateRoute(ammoniumChlorideTree(['salt', 'nh3', 'hcl']), { lookup: nbsLookup }).order).toEqual(['nh3', 'hcl', 'salt']);
    expect(evaluateRoute(ammoniumChlorideTree(['salt', 'hcl', 'nh3']), { lookup: nbsLookup }).order).toEqual(['hcl', 'nh3', 'salt']);
  });

  it('lists the steps of the response in that order, with ids matching', () => {
    const r = evaluateRoute(ammoniumChlorideTree(['salt', 'nh3', 'hcl']), { lookup: nbsLookup });
    expect(r.steps.map((s) => s.id)).toEqual(r.order);
  });
});

describe('graph errors', () => {
  const cyclic: RouteEvaluateRequest = {
    target: 'NH4Cl(s)',
    steps: [
      { id: 'a', equation: 'H2(g) + Cl2(g) -> 2 HCl(g)' },
      { id: 'b', equation: 'NH3(g) + HCl(g) -> NH4Cl(s)' },
      { id: 'c', equation: 'NH4Cl(s) -> NH3(g) + HCl(g)' },
      { id: 'd', equation: 'NH3(g) + HCl(g) -> NH4Cl(s)' },
    ],
    links: [
      { from: 'a', to: 'b', species: 'HCl(g)' },
      { from: 'b', to: 'c', species: 'NH4Cl(s)' },
      { from: 'c', to: 'b', species: 'NH3(g)' },
      { from: 'c', to: 'd', species: 'HCl(g)' },
    ],
  };

  // A loop or a dangling link holds back the totals only: each step is still evaluated on its own.
  it('names the steps of a cycle, and only those, while every step keeps its result', () => {
    const r = evaluateRoute(cyclic, { lookup: nbsLookup });
    const problem = r.totalsWithheld!;
    expect(problem.code).toBe('INVALID_VALUE');
    expect(problem.field).toBe('links');
    expect(new Set(problem.details?.cycle as string[])).toEqual(new Set(['b', 'c']));
    expect(problem.message).toMatch(/b → c → b|c → b → c/);
    expect(r.order).toEqual(['a', 'b', 'c', 'd']);
    expect(r.steps.every((s) => s.result !== null && s.extent_mol === null)).toBe(true);
  });

  it('treats a step linked to itself as a cycle', () => {
    const req = chain('NH3(g)', [NH3_SYNTHESIS], []);
    req.links = [{ from: 's1', to: 's1', species: 'NH3(g)' }];
    expect(evaluateRoute(req, { lookup: nbsLookup }).totalsWithheld?.details?.cycle).toEqual(['s1']);
  });

  it('names a link end that is not a step', () => {
    const req = chain('NH3(g)', [NH3_SYNTHESIS], []);
    req.links = [{ from: 's1', to: 'ghost', species: 'NH3(g)' }];
    const problem = evaluateRoute(req, { lookup: nbsLookup }).totalsWithheld!;
    expect(problem.field).toBe('links.0.to');
    expect(problem.message).toContain('ghost');
  });

  it('rejects duplicate ids, naming the id', () => {
    const req = chain('NH3(g)', [NH3_SYNTHESIS, NH3_SYNTHESIS], []);
    req.steps[1]!.id = 's1';
    const err = thrown(() => evaluateRoute(req, { lookup: nbsLookup }));
    expect(err.field).toBe('steps.1.id');
    expect(err.message).toContain('"s1"');
  });

  it('rejects an empty route', () => {
    expect(thrown(() => evaluateRoute({ target: 'NH3(g)', steps: [] }, { lookup: nbsLookup })).field).toBe('steps');
  });

  it(`rejects more than ${MAX_ROUTE_STEPS} steps with RouteTooLargeError (a ThermoError marked tooLarge)`, () => {
    const steps = Array.from({ length: MAX_ROUTE_STEPS + 1 }, (_, i) => ({ id: `s${i}`, equation: NH3_SYNTHESIS }));
    const err = thrown(() => evaluateRoute({ target: 'NH3(g)', steps }, { lookup: nbsLookup }));
    expect(err).toBeInstanceOf(RouteTooLargeError);
    expect(err.code).toBe('OUT_OF_RANGE');
    expect(err.details).toMatchObject({ tooLarge: true, limit: MAX_ROUTE_STEPS, count: MAX_ROUTE_STEPS + 1 });
  });

  it('accepts exactly the limit', () => {
    const steps = Array.from({ length: MAX_ROUTE_STEPS }, (_, i) => ({ id: `s${i}`, equation: NH3_SYNTHESIS }));
    const links = steps.slice(1).map((_, i) => ({ from: `s${i}`, to: `s${i + 1}`, species: 'NH3(g)' }));
    // Every step makes NH3 and passes it on except the last, which is therefore the final step.
    const r = evaluateRoute({ target: 'NH3(g)', steps, links }, { lookup: nbsLookup });
    expect(r.order).toHaveLength(MAX_ROUTE_STEPS);
  });
});
