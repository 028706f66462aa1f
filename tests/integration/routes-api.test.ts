import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as palette } from '@/app/api/palette/route';
import { POST as archive } from '@/app/api/routes/[routeId]/archive/route';
import { POST as duplicate } from '@/app/api/routes/[routeId]/duplicate/route';
import { POST as evaluate } from '@/app/api/routes/[routeId]/evaluate/route';
import { GET as getRoute, PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import { GET as listRoutes, POST as createRoute } from '@/app/api/routes/route';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { addMember, makeRoleSet, SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

async function newRoute(name = 'Methanol trial', userId = w.designerId): Promise<RouteDocumentDto> {
  const res = await callRoute(createRoute, { method: 'POST', userId, body: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  expect(res.status).toBe(201);
  return res.body as RouteDocumentDto;
}

function saveBody(route: RouteDocumentDto, patch: Partial<Record<string, unknown>> = {}) {
  return { version: route.version, name: route.name, target: route.target, targetAmount: route.targetAmount, marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS, ...patch };
}

describe('routes: create, save, versions', () => {
  it('saves the whole document, bumps the version and returns the evaluation', async () => {
    const route = await newRoute();
    const res = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route) });
    expect(res.status).toBe(200);
    const body = res.body as { route: RouteDocumentDto; evaluation: { steps: unknown[]; overall: { deltaG_kJ: number } } };
    expect(body.route.version).toBe(route.version + 1);
    expect(body.route.steps.map((s) => s.id)).toEqual(['s1', 's2']);
    expect(body.route.steps[0]).toMatchObject({ equation: SAMPLE_STEPS[0]!.equation, temperature: '1100 K', position: { x: 0, y: 0 } });
    expect(body.route.links).toEqual(SAMPLE_LINKS);
    expect(body.evaluation.steps).toHaveLength(2);
    const reread = await callRoute(getRoute, { userId: w.reviewerId, params: { routeId: String(route.id) } });
    expect((reread.body as RouteDocumentDto).version).toBe(route.version + 1);
  });

  it('answers a stale version with 409 and the current version, and keeps the newer save', async () => {
    const route = await newRoute('Stale check');
    const first = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route, { name: 'First writer' }) });
    expect(first.status).toBe(200);
    const stale = await callRoute(saveRoute, { method: 'PUT', userId: w.leadId, params: { routeId: String(route.id) }, body: saveBody(route, { name: 'Second writer' }) });
    expect(stale.status).toBe(409);
    expect(errorOf(stale.body)).toMatchObject({ code: 'CONFLICT' });
    expect((stale.body as { error: { details: { currentVersion: number } } }).error.details.currentVersion).toBe(route.version + 1);
    const now = await callRoute(getRoute, { userId: w.designerId, params: { routeId: String(route.id) } });
    expect((now.body as RouteDocumentDto).name).toBe('First writer');
  });

  it('writes nothing when the document is inconsistent (link to a missing step)', async () => {
    const route = await newRoute('Consistency');
    const res = await callRoute(saveRoute, {
      method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) },
      body: saveBody(route, { links: [{ from: 's1', to: 'nope', species: 'CO(g)' }] }),
    });
    expect(res.status).toBe(400);
    expect(await getDb().models.Step.count({ where: { routeId: route.id } })).toBe(0);
    const reread = await callRoute(getRoute, { userId: w.designerId, params: { routeId: String(route.id) } });
    expect((reread.body as RouteDocumentDto).version).toBe(route.version);
  });

  it('saves a blank step (just dropped from the palette) and reports it on that step only', async () => {
    const route = await newRoute('Blank step');
    const blank = { id: 'b1', equation: '', yieldPct: 100, notes: '', position: { x: 0, y: 200 } };
    const res = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route, { steps: [...SAMPLE_STEPS, blank] }) });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const { evaluation } = res.body as { evaluation: { steps: { id: string; class: string; error: { message: string } | null }[] } };
    const b1 = evaluation.steps.find((s) => s.id === 'b1')!;
    expect(b1.class).toBe('error');
    expect(b1.error?.message).toBeTruthy();
    expect(evaluation.steps.filter((s) => s.class !== 'error')).toHaveLength(2);
    const draft = await callRoute(evaluate, { method: 'POST', userId: w.designerId, params: { routeId: String(route.id) }, body: { ...saveBody(route, { steps: [blank, ...SAMPLE_STEPS] }), version: undefined } });
    expect(draft.status, JSON.stringify(draft.body)).toBe(200);
  });

  it('refuses more than 500 steps and duplicate step ids', async () => {
    const route = await newRoute('Too big');
    const many = Array.from({ length: 501 }, (_, i) => ({ ...SAMPLE_STEPS[0]!, id: `s${i}` }));
    const big = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route, { steps: many, links: [] }) });
    expect(big.status).toBe(400);
    const dupes = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route, { steps: [SAMPLE_STEPS[0], SAMPLE_STEPS[0]], links: [] }) });
    expect(dupes.status).toBe(400);
  });

  it('keeps a reviewer from editing and hides the route from another team', async () => {
    const route = await newRoute('Guarded');
    const params = { routeId: String(route.id) };
    expect((await callRoute(saveRoute, { method: 'PUT', userId: w.reviewerId, params, body: saveBody(route) })).status).toBe(403);
    for (const [handler, method] of [[getRoute, 'GET'], [saveRoute, 'PUT'], [evaluate, 'POST'], [duplicate, 'POST'], [archive, 'POST']] as const) {
      const res = await callRoute(handler, { method, userId: w.foreignId, params, body: method === 'GET' ? undefined : method === 'PUT' ? saveBody(route) : {} });
      expect(res.status, `${method} as a member of another team`).toBe(404);
    }
  });
});

describe('routes: list, duplicate, archive', () => {
  it('searches, sorts, pages and caps the page size', async () => {
    await newRoute('Zeta ammonia route');
    await newRoute('Alpha ammonia route');
    const res = await callRoute(listRoutes, { userId: w.reviewerId, path: '/api/routes?q=ammonia&sort=name&dir=asc&pageSize=1&page=2' });
    expect(res.status).toBe(200);
    const page = res.body as { items: { name: string }[]; total: number };
    expect(page.total).toBe(2);
    expect(page.items.map((i) => i.name)).toEqual(['Zeta ammonia route']);
    expect((await callRoute(listRoutes, { userId: w.reviewerId, path: '/api/routes?pageSize=1000' })).status).toBe(400);
    expect((await callRoute(listRoutes, { userId: w.reviewerId, path: '/api/routes?q=%25' })).status).toBe(200);
  });

  it('searches without regard to case, and reads % and _ as themselves, on either database', async () => {
    await newRoute('Glycerol 50% feed');
    await newRoute('Glycerol 50 feed');
    await newRoute('Glycerol_b feed');
    const names = async (q: string) =>
      ((await callRoute(listRoutes, { userId: w.reviewerId, path: `/api/routes?q=${encodeURIComponent(q)}&sort=name&dir=asc` })).body as { items: { name: string }[] }).items.map((i) => i.name);
    expect(await names('GLYCEROL')).toEqual(['Glycerol 50 feed', 'Glycerol 50% feed', 'Glycerol_b feed']);
    expect(await names('50%')).toEqual(['Glycerol 50% feed']);
    expect(await names('l_b')).toEqual(['Glycerol_b feed']);
  });

  it('duplicates as an alternative that remembers its origin, and archives out of the default list', async () => {
    const route = await newRoute('Original');
    await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route) });
    const copy = await callRoute(duplicate, { method: 'POST', userId: w.leadId, params: { routeId: String(route.id) }, body: {} });
    expect(copy.status).toBe(201);
    const doc = copy.body as RouteDocumentDto;
    expect(doc).toMatchObject({ originRouteId: route.id, name: 'Original (alternative)' });
    expect(doc.steps).toHaveLength(2);

    expect((await callRoute(archive, { method: 'POST', userId: w.designerId, params: { routeId: String(route.id) }, body: { archived: true } })).status).toBe(200);
    const active = (await callRoute(listRoutes, { userId: w.designerId, path: '/api/routes?q=Original' })).body as { items: { id: number }[] };
    expect(active.items.map((i) => i.id)).toEqual([doc.id]);
    const archived = (await callRoute(listRoutes, { userId: w.designerId, path: '/api/routes?q=Original&archived=1' })).body as { items: { id: number }[] };
    expect(archived.items.map((i) => i.id)).toEqual([route.id]);
    // Archived is read-only: a save is refused with a reason, and nothing changes.
    const current = (await callRoute(getRoute, { userId: w.designerId, params: { routeId: String(route.id) } })).body as RouteDocumentDto;
    const refused = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(current, { name: 'Edited while archived' }) });
    expect(refused.status).toBe(422);
    expect(errorOf(refused.body).message).toMatch(/archived/);
    expect(((await callRoute(getRoute, { userId: w.designerId, params: { routeId: String(route.id) } })).body as RouteDocumentDto).name).toBe('Original');
    await callRoute(archive, { method: 'POST', userId: w.designerId, params: { routeId: String(route.id) }, body: { archived: false } });
    const back = (await callRoute(listRoutes, { userId: w.designerId, path: '/api/routes?q=Original' })).body as { items: unknown[] };
    expect(back.items).toHaveLength(2);
  });
});

describe('routes: the saved evaluation is reused only while nothing it depends on changes', () => {
  it('a new version, a team species or a new driver gives a fresh evaluation', async () => {
    const route = await newRoute('Reuse');
    await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: saveBody(route) });
    const params = { routeId: String(route.id) };
    type Answer = { version: number; evaluation: { steps: { id: string; result: { deltaG0_kJ: number; species: { key: string; origin: string }[] } | null }[] } };
    const first = (await callRoute(evaluate, { method: 'POST', userId: w.designerId, params })).body as Answer;
    const again = (await callRoute(evaluate, { method: 'POST', userId: w.designerId, params })).body as Answer;
    expect(again).toEqual(first);
    // The team's own methanol (invented value, test only) must show in the next evaluation.
    const { createTeamSpecies } = await import('@/lib/services/species/create-team-species');
    await createTeamSpecies({
      teamId: w.teamId, userId: w.designerId,
      input: { formula: 'CH3OH', phase: 'g', name: 'methanol (team test value)', dfH: -190, dfG: null, S: 240, provenance: { kind: 'estimated', method: 'test only' } },
    });
    const afterSpecies = (await callRoute(evaluate, { method: 'POST', userId: w.designerId, params })).body as Answer;
    const s2 = (a: Answer) => a.evaluation.steps.find((s) => s.id === 's2')!.result!;
    expect(s2(afterSpecies).species.find((x) => x.key === 'CH3OH(g)')?.origin).toBe('team');
    expect(s2(afterSpecies).deltaG0_kJ).not.toBeCloseTo(s2(first).deltaG0_kJ, 3);
  });
});

describe('routes: evaluation and palette', () => {
  it('evaluates the saved route, or a draft without saving it', async () => {
    const route = await newRoute('Evaluate me');
    const params = { routeId: String(route.id) };
    await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params, body: saveBody(route) });
    const saved = await callRoute(evaluate, { method: 'POST', userId: w.reviewerId, params });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ draft: false, evaluation: { order: ['s1', 's2'] } });
    const draftBody = { name: 'x', target: 'CH3OH(g)', targetAmount: '2 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS };
    const draft = await callRoute(evaluate, { method: 'POST', userId: w.designerId, params, body: draftBody });
    expect(draft.body).toMatchObject({ draft: true });
    const extents = (d: unknown) => (d as { evaluation: { steps: { extent_mol: number }[] } }).evaluation.steps.map((s) => s.extent_mol);
    expect(extents(draft.body)[1]).toBeCloseTo(2 * extents(saved.body)[1]!, 9);
    const again = await callRoute(getRoute, { userId: w.designerId, params });
    expect((again.body as RouteDocumentDto).targetAmount).toBe('1 mol');
  });

  it('answers an empty route with a clear 400, and a cycle with every step evaluated and the totals withheld', async () => {
    const route = await newRoute('Empty');
    const params = { routeId: String(route.id) };
    const empty = await callRoute(evaluate, { method: 'POST', userId: w.designerId, params });
    expect(empty.status).toBe(400);
    const cyclic = {
      name: 'c', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS,
      links: [...SAMPLE_LINKS, { from: 's2', to: 's1', species: 'CH3OH(g)' }],
    };
    const cycle = await callRoute(evaluate, { method: 'POST', userId: w.designerId, params, body: cyclic });
    expect(cycle.status).toBe(200);
    const answer = cycle.body as { evaluation: { steps: { result: unknown }[]; totalsWithheld: { field: string; message: string } } };
    expect(answer.evaluation.totalsWithheld.field).toBe('links');
    expect(answer.evaluation.totalsWithheld.message).toMatch(/s1|s2/);
    expect(answer.evaluation.steps.every((s) => s.result !== null)).toBe(true);
  });

  it('offers recent team equations and library reactions by species', async () => {
    const res = await callRoute(palette, { userId: w.designerId, path: '/api/palette?species=CH3OH(g)' });
    expect(res.status).toBe(200);
    const body = res.body as { recent: string[]; library: { equation: string; consumes: string[]; produces: string[] }[] };
    expect(body.recent).toContain(SAMPLE_STEPS[1]!.equation);
    expect(body.library.length).toBeGreaterThan(0);
    expect(body.library.every((r) => [...r.consumes, ...r.produces].includes('CH3OH(g)'))).toBe(true);
    const other = await addMember(w.foreignTeamId, 'designer');
    const foreign = (await callRoute(palette, { userId: other })).body as { recent: string[] };
    expect(foreign.recent).not.toContain(SAMPLE_STEPS[1]!.equation);
  });
});

describe('routes list summary', () => {
  it('shows overall ΔG per mol of target, whatever the planned amount', async () => {
    const one = await newRoute('Per mol one');
    const two = await newRoute('Per mol two');
    await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(one.id) }, body: saveBody(one) });
    const saved = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(two.id) }, body: saveBody(two, { targetAmount: '2 mol' }) });
    const total2 = (saved.body as { evaluation: { overall: { deltaG_kJ: number } } }).evaluation.overall.deltaG_kJ;
    const list = (await callRoute(listRoutes, { userId: w.designerId, path: '/api/routes?q=Per%20mol&sort=name&dir=asc' })).body as { items: { overallDeltaG_kJ: number }[] };
    expect(list.items[1]!.overallDeltaG_kJ).toBeCloseTo(total2 / 2, 9);
    expect(list.items[0]!.overallDeltaG_kJ).toBeCloseTo(list.items[1]!.overallDeltaG_kJ, 9);
  });
});

describe('palette search', () => {
  it('finds library reactions by key, by library name and by a formula prefix', async () => {
    const { searchLibraryReactions } = await import('@/lib/services/routes/search-library-reactions');
    const byKey = searchLibraryReactions({ species: 'CH3OH(g)' }).map((r) => r.id);
    expect(byKey.length).toBeGreaterThan(0);
    expect(searchLibraryReactions({ species: 'methanol(g)' }).map((r) => r.id)).toEqual(byKey);
    expect(searchLibraryReactions({ species: 'CH3OH' }).length).toBeGreaterThanOrEqual(byKey.length);
    expect(searchLibraryReactions({ species: 'Unobtainium(s)' })).toEqual([]);
  });
});
