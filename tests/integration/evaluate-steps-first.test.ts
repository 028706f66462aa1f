// Issue 19, items 1–2 over the API: each step of a new route is evaluated before the route is complete, and
// errors come back at the step and field they belong to. Published values: NBS 1982, worked by hand.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as balance } from '@/app/api/balance/route';
import { POST as evaluate } from '@/app/api/routes/[routeId]/evaluate/route';
import { POST as createRoute, GET as listRoutes } from '@/app/api/routes/route';
import { PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import type { RouteEvaluateResponse } from '@/lib/thermo/route';
import { makeRoleSet } from './support/fixtures';
import { callRoute } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const REFORMING = 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)';
const step = (id: string, equation: string, extra: Record<string, unknown> = {}) => ({ id, equation, yieldPct: 100, notes: '', position: { x: 0, y: 0 }, ...extra });

async function newRoute(name: string): Promise<RouteDocumentDto> {
  const res = await callRoute(createRoute, { method: 'POST', userId: w.designerId, body: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  expect(res.status).toBe(201);
  return res.body as RouteDocumentDto;
}

async function evaluateDraft(route: RouteDocumentDto, steps: unknown[], links: unknown[] = []): Promise<RouteEvaluateResponse> {
  const body = { name: route.name, target: route.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links };
  const res = await callRoute(evaluate, { method: 'POST', userId: w.designerId, params: { routeId: String(route.id) }, body });
  expect(res.status).toBe(200);
  return (res.body as { evaluation: RouteEvaluateResponse }).evaluation;
}

describe('evaluate: steps before the route is complete', () => {
  it('gives a new route’s first step its ΔG, K and class, and says the totals wait for the target', async () => {
    const route = await newRoute('First step only');
    const e = await evaluateDraft(route, [step('a', REFORMING)]);
    const a = e.steps[0]!;
    // 142.124 kJ/mol = −137.168 − (−50.72 − 228.572) (NBS 1982).
    expect(a.result!.deltaG0_kJ).toBeCloseTo(142.124, 2);
    expect(a.result!.K).toBeGreaterThan(0);
    expect(a.class).toBe('uphill');
    expect(a.remedies.length).toBeGreaterThan(0);
    expect(e.totalsWithheld).toMatchObject({ field: 'target' });
    expect(e.totalsWithheld!.message).toContain('CH3OH(g)');
  });

  it('puts a misspelt species, a bad temperature and an unreadable pressure on their own step and field', async () => {
    const route = await newRoute('Errors at their cause');
    const e = await evaluateDraft(route, [
      step('a', 'CO(g) + 2 H2(g) -> CH3OHH(g)'),
      step('b', REFORMING, { temperature: '-5 K' }),
      step('c', REFORMING, { pressures: { 'CO(g)': '50 atm' } }),
    ]);
    const byId = (id: string) => e.steps.find((s) => s.id === id)!;
    expect(byId('a').error).toMatchObject({ code: 'UNKNOWN_SPECIES', field: 'steps.0.equation' });
    expect(byId('a').error!.message).toContain('CH3OH(g)'); // the suggestion
    expect(byId('b').error).toMatchObject({ field: 'steps.1.temperature' });
    // 50 atm is read in atm (1 atm = 1.01325 bar, exact by definition): the step evaluates.
    expect(byId('c').error).toBeNull();
    expect(byId('c').result!.lnQ).toBeCloseTo(Math.log(50 * 1.01325), 9);
  });

  it('saves a route whose totals wait with no overall ΔG in the list, never 0', async () => {
    const route = await newRoute('Waiting totals');
    const saved = await callRoute(saveRoute, {
      method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) },
      body: { version: route.version, name: route.name, target: route.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [step('a', REFORMING)], links: [] },
    });
    expect(saved.status).toBe(200);
    const list = (await callRoute(listRoutes, { userId: w.designerId, path: '/api/routes?q=Waiting%20totals' })).body as { items: { overallDeltaG_kJ: number | null; uphillSteps: number | null }[] };
    expect(list.items[0]!.overallDeltaG_kJ).toBeNull();
    expect(list.items[0]!.uphillSteps).toBe(1);
  });
});

describe('new route input', () => {
  it('refuses an amount of “lots” at its field, and the target probe names a species the library lacks', async () => {
    const res = await callRoute(createRoute, { method: 'POST', userId: w.designerId, body: { name: 'Lots', target: 'CH3OH(g)', targetAmount: 'lots' } });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain('targetAmount');
    const probe = await callRoute(balance, { method: 'POST', userId: w.designerId, body: { equation: 'Unobtainium(g) -> Unobtainium(g)' } });
    expect(probe.status).toBe(200);
    expect((probe.body as { error: { code: string } }).error.code).toBe('PARSE_ERROR');
  });
});

describe('balance check names a species the library lacks', () => {
  it('does not call an equation with a misspelt species balanced', async () => {
    const res = await callRoute(balance, { method: 'POST', userId: w.designerId, body: { equation: 'CO(g) + 2 H2(g) -> CH3OHH(g)' } });
    expect(res.status).toBe(200);
    const body = res.body as { isBalanced: boolean; unknownSpecies: string[]; message: string };
    expect(body.unknownSpecies).toEqual(['CH3OHH(g)']);
    expect(body.message).toMatch(/not in the species library/);
    const ok = (await callRoute(balance, { method: 'POST', userId: w.designerId, body: { equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' } })).body as { isBalanced: boolean; unknownSpecies: string[] };
    expect(ok).toMatchObject({ isBalanced: true, unknownSpecies: [] });
  });
});
