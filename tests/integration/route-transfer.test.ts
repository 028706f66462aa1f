import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as exportRoute } from '@/app/api/routes/[routeId]/export/route';
import { POST as evaluate } from '@/app/api/routes/[routeId]/evaluate/route';
import { POST as importRoute } from '@/app/api/routes/import/route';
import type { StepInput } from '@/lib/schemas/route';
import { createRoute } from '@/lib/services/routes/create-route';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { saveRoute } from '@/lib/services/routes/save-route';
import { RouteEvaluateRequestSchema, type RouteEvaluateResponse } from '@/lib/thermo/route';
import { callRoute, errorOf } from './support/http';
import { makeReviewTeam, type ReviewTeam } from './support/review-team';
import { setupTestDb, teardownTestDb } from './support/test-db';

const ROOT = path.resolve(__dirname, '../..');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');

let dir = '';
let team: ReviewTeam;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  team = await makeReviewTeam();
});
afterAll(async () => teardownTestDb(dir));

// The team's steam-reforming proposal, with every field the board keeps: conditions, yields, notes, positions.
const STEPS: StepInput[] = [
  { id: 'reform', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '750 K', yieldPct: 95, notes: 'Tube reformer; temperature still to be fixed.', position: { x: 10, y: 20 } },
  {
    id: 'synthesis', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', standardPressure: '1 atm',
    pressures: { 'CO(g)': '20 bar', 'H2(g)': '40 bar', 'CH3OH(g)': '0.5 bar' }, yieldPct: 7, notes: '', position: { x: 360.5, y: -40 },
  },
];
const LINKS = [{ from: 'reform', to: 'synthesis', species: 'CO(g)' }, { from: 'reform', to: 'synthesis', species: 'H2(g)' }];

async function savedRoute(steps = STEPS): Promise<RouteDocumentDto> {
  const created = await createRoute({ teamId: team.teamId, userId: team.designerId, input: { name: 'Methanol via steam reforming (Line 2 proposal)', target: 'CH3OH(g)', targetAmount: '2 mol' } });
  const { route } = await saveRoute({
    teamId: team.teamId, userId: team.designerId, routeId: created.id,
    input: { version: created.version, name: created.name, target: 'CH3OH(g)', targetAmount: '2 mol', marginalThreshold_kJ: -12, steps, links: LINKS },
  });
  return route;
}

async function exported(routeId: number, userId = team.reviewerId) {
  return callRoute(exportRoute, { userId, params: { routeId: String(routeId) } });
}

async function apiEvaluation(routeId: number, userId: number): Promise<RouteEvaluateResponse> {
  const res = await callRoute(evaluate, { method: 'POST', userId, params: { routeId: String(routeId) } });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return (res.body as { evaluation: RouteEvaluateResponse }).evaluation;
}

// Team drivers are rows with their own ids; everything else must match exactly.
function withoutDriverIds(value: unknown): unknown {
  return JSON.parse(JSON.stringify(value, (key, v) => (key === 'driverId' ? undefined : v)));
}

function runCli(input: unknown): { status: number | null; out: unknown; stderr: string } {
  const r = spawnSync(TSX, ['scripts/thermo.ts', 'route'], { cwd: ROOT, input: JSON.stringify(input), encoding: 'utf8', timeout: 60000 });
  return { status: r.status, out: r.stdout ? JSON.parse(r.stdout) : null, stderr: r.stderr };
}

describe('GET /api/routes/[routeId]/export', () => {
  it('is the CLI route request plus a stepwell header, and the CLI evaluates it exactly as the API evaluates the route', async () => {
    const route = await savedRoute();
    const res = await exported(route.id);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toBe('attachment; filename="methanol-via-steam-reforming-line-2-proposal.route.json"');
    const file = res.body as Record<string, unknown>;
    expect(file).toMatchObject({
      target: 'CH3OH(g)', targetAmount: '2 mol', marginalThreshold_kJ: -12, links: LINKS,
      stepwell: {
        format: 'stepwell.route/1', name: route.name,
        positions: { reform: { x: 10, y: 20 }, synthesis: { x: 360.5, y: -40 } },
        notes: { reform: 'Tube reformer; temperature still to be fixed.' },
        caution: expect.stringMatching(/^Thermodynamic screen only: it says nothing of rates, runaway/),
      },
    });
    expect((file.steps as unknown[])[1]).toEqual({
      id: 'synthesis', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', standardPressure: '1 atm',
      pressures: { 'CO(g)': '20 bar', 'H2(g)': '40 bar', 'CH3OH(g)': '0.5 bar' }, yield: 0.07,
    });
    expect(RouteEvaluateRequestSchema.safeParse(file).success).toBe(true);
    const cli = runCli(file);
    expect(cli.status, cli.stderr).toBe(0);
    expect(cli.out).not.toHaveProperty('error');
    expect(withoutDriverIds(cli.out)).toEqual(withoutDriverIds(await apiEvaluation(route.id, team.reviewerId)));
  });

  it('the CLI still refuses other unknown keys', () => {
    const r = runCli({ target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)' }], colour: 'blue' });
    expect(r.out).toMatchObject({ error: { code: 'VALIDATION', field: 'colour' } });
  });

  it('answers 404 to another team and 422 for a step without an equation', async () => {
    const route = await savedRoute();
    expect((await exported(route.id, team.outsiderId)).status).toBe(404);
    // A step still being typed, written straight to the table as the editor's autosave would leave it.
    const unfinished = await savedRoute();
    await getDb().models.Step.create({ routeId: unfinished.id, stepKey: 'later', sortOrder: 2, equation: '', conditions: {}, yieldPct: 100, notes: '', positionX: 0, positionY: 0 });
    const res = await exported(unfinished.id);
    expect(res.status).toBe(422);
    // Named by its place in route order, never by its key.
    expect(errorOf(res.body).message).toMatch(/^Step 3 has no equation yet/);
    expect(errorOf(res.body).message).not.toContain('later');
  });
});

describe('POST /api/routes/import', () => {
  it('round-trips: the export imported into another team gives the same board and identical evaluation results', async () => {
    const route = await savedRoute();
    const file = (await exported(route.id)).body;
    const res = await callRoute(importRoute, { method: 'POST', userId: team.outsiderId, body: file });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const copy = res.body as RouteDocumentDto;
    const row = await getDb().models.Route.findByPk(copy.id);
    expect(row!.teamId).toBe(team.outsiderTeamId);
    expect(copy).toMatchObject({ name: route.name, target: route.target, targetAmount: '2 mol', marginalThreshold_kJ: -12, status: 'draft', version: 1, links: route.links });
    expect(copy.steps).toEqual(route.steps);
    expect(withoutDriverIds(await apiEvaluation(copy.id, team.outsiderId))).toEqual(withoutDriverIds(await apiEvaluation(route.id, team.leadId)));
    const revisions = await getDb().models.RouteRevision.findAll({ where: { routeId: copy.id } });
    expect(revisions.map((r) => r.summary)).toEqual([expect.stringMatching(/Imported from a route file/)]);
    expect(row!.overallDgKj).not.toBeNull(); // the list's cached totals are filled in
  });

  it('accepts a plain CLI request without a header, laying the steps out in a row', async () => {
    const res = await callRoute(importRoute, {
      method: 'POST', userId: team.designerId,
      body: { target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperature: '700 K' }, { id: 'b', equation: 'NH3(g) + HCl(g) -> NH4Cl(s)', yield: 0.5 }] },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      name: 'Imported route to NH3(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17,
      steps: [{ id: 'a', yieldPct: 100, position: { x: 0, y: 0 }, notes: '' }, { id: 'b', yieldPct: 50, position: { x: 320, y: 0 } }],
    });
  });

  it('gives per-field errors for a malformed file and creates nothing', async () => {
    const count = () => getDb().models.Route.count();
    const before = await count();
    const good = { target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)' }] };
    const cases: [unknown, string, RegExp][] = [
      [{ steps: good.steps }, 'target', /./],
      [{ ...good, steps: [] }, 'steps', /at least one step/],
      [{ ...good, steps: [{ id: 'a b', equation: 'N2(g) -> N2(g)' }] }, 'steps.0.id', /letters, digits/],
      [{ ...good, steps: [{ id: 'a' }] }, 'steps.0.equation', /needs an equation/],
      [{ ...good, steps: [{ ...good.steps[0], yield: 1.5 }] }, 'steps.0.yield', /at most 1/],
      [{ ...good, steps: [{ ...good.steps[0], volume: '1 L' }] }, 'steps.0.volume', /do not store a solution volume/],
      [{ ...good, steps: [good.steps[0], good.steps[0]] }, 'steps.1.id', /share the id "a"/],
      [{ ...good, links: [{ from: 'a', to: 'z', species: 'NH3(g)' }] }, 'links.0.to', /No step has the id "z"/],
      [{ ...good, stepwell: { format: 'other/9', name: 'X' } }, 'stepwell.format', /stepwell.route\/1/],
      [{ ...good, stepwell: { format: 'stepwell.route/1', name: 'X', positions: { q: { x: 0, y: 0 } } } }, 'stepwell.positions.q', /No step/],
      [{ ...good, marginalThreshold_kJ: 5 }, 'marginalThreshold_kJ', /zero or negative/],
    ];
    for (const [body, field, message] of cases) {
      const res = await callRoute(importRoute, { method: 'POST', userId: team.designerId, body });
      expect(res.status, field).toBe(400);
      expect(errorOf(res.body).fields?.[field], `${field}: ${JSON.stringify(res.body)}`).toMatch(message);
    }
    const notJson = await callRoute(importRoute, { method: 'POST', userId: team.designerId, rawBody: '{"target": ', headers: { 'content-type': 'application/json' } });
    expect(notJson.status).toBe(400);
    expect(await count()).toBe(before);
  });

  it('answers a __proto__ key anywhere in the file with 400 naming the field, and creates nothing', async () => {
    const count = () => getDb().models.Route.count();
    const before = await count();
    // Written as raw JSON text: an object literal would set the prototype instead of making a key.
    const step = '{"id": "a", "equation": "N2(g) + 3 H2(g) -> 2 NH3(g)"}';
    const cases: [string, string][] = [
      [`{"target": "NH3(g)", "steps": [${step}], "stepwell": {"format": "stepwell.route/1", "name": "X", "positions": {"__proto__": {"x": 1, "y": 2}}}}`, 'stepwell.positions.__proto__'],
      [`{"target": "NH3(g)", "steps": [${step}], "stepwell": {"format": "stepwell.route/1", "name": "X", "notes": {"__proto__": "hidden"}}}`, 'stepwell.notes.__proto__'],
      ['{"target": "NH3(g)", "steps": [{"id": "a", "equation": "N2(g) + 3 H2(g) -> 2 NH3(g)", "pressures": {"__proto__": "1 bar"}}]}', 'steps.0.pressures.__proto__'],
      ['{"target": "NH3(g)", "steps": [{"id": "__proto__", "equation": "N2(g) + 3 H2(g) -> 2 NH3(g)"}]}', 'steps.0.id'],
      ['{"target": "NH3(g)", "steps": [{"id": "constructor", "equation": "N2(g) + 3 H2(g) -> 2 NH3(g)"}]}', 'steps.0.id'],
    ];
    for (const [rawBody, field] of cases) {
      const res = await callRoute(importRoute, { method: 'POST', userId: team.designerId, rawBody, headers: { 'content-type': 'application/json' } });
      expect(res.status, field).toBe(400);
      expect(errorOf(res.body).fields?.[field], `${field}: ${JSON.stringify(res.body)}`).toMatch(/reserved|cannot be used/);
    }
    expect(await count()).toBe(before);
  });

  it('is for designers and leads: a reviewer gets 403, an anonymous caller 401', async () => {
    const body = { target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)' }] };
    expect((await callRoute(importRoute, { method: 'POST', userId: team.reviewerId, body })).status).toBe(403);
    expect((await callRoute(importRoute, { method: 'POST', userId: null, body })).status).toBe(401);
    expect((await callRoute(importRoute, { method: 'POST', userId: team.leadId, body })).status).toBe(201);
  });
});
