import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as compare } from '@/app/api/compare/route';
import { POST as evaluate } from '@/app/api/routes/[routeId]/evaluate/route';
import type { Comparison } from '@/lib/compare/compare-types';
import type { StepInput } from '@/lib/schemas/route';
import { createComment } from '@/lib/services/comments/create-comment';
import { resolveThread } from '@/lib/services/comments/resolve-thread';
import { createFlag } from '@/lib/services/flags/create-flag';
import { createRoute } from '@/lib/services/routes/create-route';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { saveRoute } from '@/lib/services/routes/save-route';
import type { RouteEvaluateResponse } from '@/lib/thermo/route';
import { SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { makeReviewTeam, type ReviewTeam } from './support/review-team';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let team: ReviewTeam;
beforeAll(async () => {
  process.env.SMTP_URL = 'smtp://127.0.0.1:1'; // comment notices fail fast and are reported, not thrown
  ({ dir } = await setupTestDb());
  team = await makeReviewTeam();
});
afterAll(async () => teardownTestDb(dir));

// The invented team's two methanol alternatives: steam reforming and partial oxidation, sharing the synthesis step.
const POX_STEPS: StepInput[] = [
  { id: 'pox', equation: 'CH4(g) + 1/2 O2(g) -> CO(g) + 2 H2(g)', temperature: '1100 K', yieldPct: 92, notes: '', position: { x: 0, y: 0 } },
  { id: 'synthesis', equation: 'CO(g) + 2 H2(g) = CH3OH(g)', temperature: '500 K', pressures: { 'CO(g)': '20 bar', 'H2(g)': '40 bar', 'CH3OH(g)': '0.5 bar' }, yieldPct: 90, notes: '', position: { x: 300, y: 0 } },
];
const POX_LINKS = [{ from: 'pox', to: 'synthesis', species: 'CO(g)' }, { from: 'pox', to: 'synthesis', species: 'H2(g)' }];

async function routeWith(name: string, steps: StepInput[], links: typeof SAMPLE_LINKS, teamId = team.teamId, userId = team.designerId, targetAmount = '1 mol'): Promise<RouteDocumentDto> {
  const created = await createRoute({ teamId, userId, input: { name, target: 'CH3OH(g)', targetAmount } });
  if (steps.length === 0) return created;
  const { route } = await saveRoute({ teamId, userId, routeId: created.id, input: { version: created.version, name, target: 'CH3OH(g)', targetAmount, marginalThreshold_kJ: -17, steps, links } });
  return route;
}

const reforming = () => routeWith('Methanol via steam reforming', SAMPLE_STEPS, SAMPLE_LINKS);
const partialOxidation = () => routeWith('Methanol via partial oxidation', POX_STEPS, POX_LINKS, team.teamId, team.designerId, '5 mol');

function get(userId: number | null, query: string) {
  return callRoute(compare, { method: 'GET', userId, path: `/api/compare?${query}` });
}

async function evaluated(routeId: number, draft?: unknown): Promise<RouteEvaluateResponse> {
  const res = await callRoute(evaluate, { method: 'POST', userId: team.leadId, params: { routeId: String(routeId) }, ...(draft ? { body: draft } : {}) });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return (res.body as { evaluation: RouteEvaluateResponse }).evaluation;
}

describe('GET /api/compare', () => {
  it('lets a reviewer and a designer compare two routes, in the order asked, with the evaluate endpoint\'s numbers per mol of target', async () => {
    const a = await reforming();
    const b = await partialOxidation();
    for (const userId of [team.reviewerId, team.designerId, team.leadId]) {
      const res = await get(userId, `ids=${b.id},${a.id}`);
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      const body = res.body as Comparison;
      expect(body.routes.map((r) => r.id)).toEqual([b.id, a.id]);
      expect(body.routes[1]).toMatchObject({ name: 'Methanol via steam reforming', status: 'draft', archived: false, updatedBy: 'Baptiste Osei', version: a.version });
      expect(body.caution).toMatch(/rates.*runaway.*toxicity/);
    }
    const body = (await get(team.reviewerId, `ids=${a.id},${b.id}`)).body as Comparison;
    const [ra, rb] = body.routes;
    const ea = await evaluated(a.id);
    const eb = await evaluated(b.id);
    expect(ra!.metrics.overallDeltaG_kJ).toBeCloseTo(ea.overall.deltaG_kJ, 9);
    // Route b is planned for 5 mol: the comparison divides down to one mol of target.
    expect(rb!.metrics.overallDeltaG_kJ).toBeCloseTo(eb.overall.deltaG_kJ / 5, 9);
    expect(rb!.metrics.overallDeltaG0_kJ).toBeCloseTo(eb.overall.deltaG0_kJ / 5, 9);
    expect(rb!.ladder!.steps.map((s) => s.cumulative_kJ)).toEqual(eb.steps.map((s) => expect.closeTo(s.cumulative_kJ / 5, 9)));
    expect(rb!.ladder!.order).toEqual(eb.order);
    expect(rb!.ladder!.steps[1]).toMatchObject({ id: 'synthesis', equation: 'CO(g) + 2 H2(g) = CH3OH(g)', class: eb.steps[1]!.class, temperature_K: 500 });
    expect(ra!.metrics).toMatchObject({ stepCount: 2, uphillSteps: ea.overall.uphillSteps, marginalSteps: ea.overall.marginalSteps, temperatureMin_K: 298.15, temperatureMax_K: 1100 });
    expect(rb!.metrics).toMatchObject({ temperatureMin_K: 500, temperatureMax_K: 1100 });
    // The synthesis step is the same equation, written two ways.
    expect(body.sharedEquations).toEqual([{ equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', routes: [{ routeId: a.id, stepIds: ['s2'] }, { routeId: b.id, stepIds: ['synthesis'] }] }]);
    expect(body.best.stepCount).toEqual([a.id, b.id]);
    const lower = ra!.metrics.overallDeltaG_kJ! < rb!.metrics.overallDeltaG_kJ! ? a.id : b.id;
    expect(body.best.overallDeltaG_kJ).toEqual([lower]);
  });

  it('applies a temperature offset to every step without saving anything', async () => {
    const a = await reforming();
    const before = await getDb().models.Route.findByPk(a.id);
    const res = await get(team.leadId, `ids=${a.id},${(await partialOxidation()).id}&temperatureOffset_K=50`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as Comparison;
    expect(body.whatIf).toEqual({ temperatureOffset_K: 50 });
    const shifted = SAMPLE_STEPS.map((s) => ({ ...s, temperature: s.id === 's1' ? '1150 K' : '348.15 K' }));
    const byHand = await evaluated(a.id, { name: a.name, target: a.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: shifted, links: SAMPLE_LINKS });
    expect(body.routes[0]!.metrics.overallDeltaG_kJ).toBeCloseTo(byHand.overall.deltaG_kJ, 9);
    expect(body.routes[0]!.metrics.temperatureMax_K).toBe(1150);
    const after = await getDb().models.Route.findByPk(a.id);
    expect(after!.version).toBe(before!.version);
    expect(after!.updatedAt.toISOString()).toBe(before!.updatedAt.toISOString());
    const steps = await getDb().models.Step.findAll({ where: { routeId: a.id }, order: [['sort_order', 'ASC']] });
    expect(steps.map((s) => s.conditions.temperature)).toEqual(['1100 K', '298.15 K']);
  });

  it('applies a common standard pressure: ΔG° moves by Δn·RT·ln(1.01325) from 1 bar to 1 atm (ideal gases; IUPAC Green Book, from memory)', async () => {
    const a = await reforming();
    const b = await partialOxidation();
    const bar = (await get(team.leadId, `ids=${a.id},${b.id}`)).body as Comparison;
    const atm = (await get(team.leadId, `ids=${a.id},${b.id}&standardPressure=1%20atm`)).body as Comparison;
    expect(atm.whatIf).toEqual({ standardPressure: '1 atm' });
    // s1: CH4 + H2O → CO + 3 H2 at 1100 K, Δn(gas) = +2; R = 8.314462618 J/(mol K) (CODATA 2018).
    const shift = (2 * 8.314462618 * 1100 * Math.log(1.01325)) / 1000;
    const s1 = (c: Comparison) => c.routes[0]!.ladder!.steps.find((s) => s.id === 's1')!.deltaG0_kJ!;
    expect(s1(atm) - s1(bar)).toBeCloseTo(shift, 3);
  });

  it('counts open flags and unresolved comments as the editor badges do', async () => {
    const a = await reforming();
    const b = await reforming();
    await createFlag({ teamId: team.teamId, routeId: a.id, userId: team.reviewerId, input: { stepKey: 's1', category: 'safety', reason: 'Hot hydrogen at 1100 K.' } });
    const open = await createComment({ teamId: team.teamId, routeId: a.id, userId: team.reviewerId, input: { body: 'Is 1100 K needed?', stepKey: 's1' } });
    await createComment({ teamId: team.teamId, routeId: a.id, userId: team.designerId, input: { body: 'It keeps methane slip low.', parentId: open.id } });
    const settled = await createComment({ teamId: team.teamId, routeId: a.id, userId: team.reviewerId, input: { body: 'Catalyst supplier?' } });
    await resolveThread({ teamId: team.teamId, routeId: a.id, commentId: settled.id, userId: team.leadId, resolved: true });
    const body = (await get(team.reviewerId, `ids=${a.id},${b.id}`)).body as Comparison;
    expect(body.routes[0]!.metrics).toMatchObject({ openFlags: 1, unresolvedComments: 2 });
    expect(body.routes[1]!.metrics).toMatchObject({ openFlags: 0, unresolvedComments: 0 });
    expect(body.best.openFlags).toEqual([b.id]);
  });

  it('keeps a route the engine refuses as a whole (no steps), with its reason and null energies', async () => {
    const empty = await routeWith('Not started', [], []);
    const res = await get(team.leadId, `ids=${empty.id},${(await reforming()).id}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const route = (res.body as Comparison).routes[0]!;
    expect(route.ladder).toBeNull();
    expect(route.error).toMatchObject({ code: expect.any(String), message: expect.stringMatching(/step/) });
    expect(route.metrics).toMatchObject({ overallDeltaG_kJ: null, stepCount: 0 });
  });

  it('answers bad id lists with 400 and a field message', async () => {
    const a = await reforming();
    const b = await reforming();
    const cases: [string, RegExp][] = [
      [`ids=${a.id}`, /at least 2/],
      [`ids=${a.id},${b.id},${a.id + 100},${a.id + 101},${a.id + 102}`, /at most 4/],
      [`ids=${a.id},${a.id}`, /only once/],
      ['ids=one,two', /whole numbers/],
      ['', /Name the routes/],
      [`ids=${a.id},${b.id}&temperatureOffset_K=301`, /at most \+300/],
      [`ids=${a.id},${b.id}&temperatureOffset_K=warm`, /number of kelvin/],
      [`ids=${a.id},${b.id}&standardPressure=2%20bar`, /1 bar.*1 atm/],
    ];
    for (const [query, message] of cases) {
      const res = await get(team.leadId, query);
      expect(res.status, query).toBe(400);
      const error = errorOf(res.body);
      expect(error.code).toBe('VALIDATION');
      expect(Object.values(error.fields ?? {}).join(' '), query).toMatch(message);
    }
  });

  it('refuses an offset that takes a step to 0 K or below, naming the route and step', async () => {
    const a = await reforming();
    const res = await get(team.leadId, `ids=${a.id},${(await reforming()).id}&temperatureOffset_K=-300`);
    expect(res.status).toBe(400);
    // The step by its label, never its id, and the true minus.
    expect(errorOf(res.body).message).toMatch(/Methanol via steam reforming: Step 2 \(methanol from carbon monoxide\) at 298.15 K would go to \u22121.85 K/);
    expect(errorOf(res.body).message).not.toMatch(/\bs2\b/);
    expect(errorOf(res.body).fields).toHaveProperty(['whatIf.temperatureOffset_K']);
  });

  it('answers 404 for another team\'s route or a deleted one, and 400 naming an archived one', async () => {
    const a = await reforming();
    const foreign = await routeWith('Elsewhere', SAMPLE_STEPS, SAMPLE_LINKS, team.outsiderTeamId, team.outsiderId);
    expect((await get(team.leadId, `ids=${a.id},${foreign.id}`)).status).toBe(404);
    const deleted = await reforming();
    await getDb().models.Route.update({ deletedAt: new Date(), deletedById: team.leadId }, { where: { id: deleted.id } });
    const gone = await get(team.leadId, `ids=${a.id},${deleted.id}`);
    expect(gone.status).toBe(404);
    expect(errorOf(gone.body).message).toBe(`No such route: ${deleted.id}.`);
    const archived = await routeWith('Old air-blown route', SAMPLE_STEPS, SAMPLE_LINKS);
    await getDb().models.Route.update({ archivedAt: new Date() }, { where: { id: archived.id } });
    const res = await get(team.leadId, `ids=${a.id},${archived.id}`);
    expect(res.status).toBe(400);
    expect(errorOf(res.body).message).toBe('“Old air-blown route” is archived. Unarchive it to compare.');
  });

  it('answers 404 to a caller from another team and 401 to an anonymous one', async () => {
    const ids = `ids=${(await reforming()).id},${(await reforming()).id}`;
    expect((await get(team.outsiderId, ids)).status).toBe(404);
    expect((await get(null, ids)).status).toBe(401);
  });
});
