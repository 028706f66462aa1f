import { describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as compare } from '@/app/api/compare/route';
import { GET as getOne } from '@/app/api/decisions/[decisionId]/route';
import * as decisionsModule from '@/app/api/decisions/route';
import type { Comparison } from '@/lib/compare/compare-types';
import type { DecisionDetailDto, DecisionListDto } from '@/lib/services/decisions/decision-dto';
import { makeRoute } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { type ReviewTeam, withReviewWorld } from './support/review-team';

const { GET: list, POST: record } = decisionsModule;

let team: ReviewTeam;
withReviewWorld((t) => (team = t));

const route = () => makeRoute(team.teamId, team.designerId);
const post = (userId: number | null, body: unknown) => callRoute(record, { method: 'POST', userId, body });
const decisionCount = () => getDb().models.Decision.count({ where: { teamId: team.teamId } });

async function decide(routeIds: number[], chosenRouteId: number, extra: Record<string, unknown> = {}) {
  const res = await post(team.leadId, { routeIds, chosenRouteId, rationale: 'Fewer uphill steps and no open flags.', ...extra });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body as { decision: DecisionDetailDto; caution: string }).decision;
}

describe('POST /api/decisions', () => {
  it('lets only a lead record a decision; a designer or reviewer is refused and nothing is saved', async () => {
    const [a, b] = [await route(), await route()];
    const before = await decisionCount();
    for (const userId of [team.designerId, team.reviewerId]) {
      const res = await post(userId, { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Looks better.' });
      expect(res.status).toBe(403);
      expect(errorOf(res.body).code).toBe('FORBIDDEN');
    }
    expect((await post(null, { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'x' })).status).toBe(401);
    // A lead of another team: these routes do not exist for them.
    expect((await post(team.outsiderId, { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Mine now.' })).status).toBe(404);
    expect(await decisionCount()).toBe(before);
  });

  it('saves the choice with the comparison recomputed server-side, what-if included, and reads it back', async () => {
    const [a, b] = [await route(), await route()];
    const whatIf = { temperatureOffset_K: 50 };
    const res = await post(team.leadId, { routeIds: [a.id, b.id], chosenRouteId: b.id, rationale: '  Same ladder; b has the cheaper feed.  ', whatIf });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const { decision, caution } = res.body as { decision: DecisionDetailDto; caution: string };
    expect(caution).toMatch(/rates.*runaway.*toxicity/);
    expect(decision).toMatchObject({
      routes: [{ id: a.id, name: a.name, deleted: false }, { id: b.id, name: b.name, deleted: false }],
      chosen: { id: b.id, name: b.name },
      rationale: 'Same ladder; b has the cheaper feed.',
      author: { id: team.leadId, name: 'Ottilie Marchetti' },
      supersededById: null,
      shelvedRouteIds: [],
    });
    const compared = (await callRoute(compare, { userId: team.reviewerId, path: `/api/compare?ids=${a.id},${b.id}&temperatureOffset_K=50` })).body as Comparison;
    expect(decision.snapshot.whatIf).toEqual(whatIf);
    expect(decision.snapshot.routes).toEqual(compared.routes.map((r) => ({ id: r.id, name: r.name, status: r.status, metrics: r.metrics })));
    expect(decision.snapshot.best).toEqual(compared.best);
    const one = await callRoute(getOne, { userId: team.reviewerId, params: { decisionId: String(decision.id) } });
    expect(one.status).toBe(200);
    expect(one.body).toEqual(decision);
  });

  it('gives field errors for a missing, blank or over-long rationale and a choice outside the compared routes, saving nothing', async () => {
    const [a, b, c] = [await route(), await route(), await route()];
    const before = await decisionCount();
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [{ routeIds: [a.id, b.id], chosenRouteId: a.id }, 'rationale', /Say why/],
      [{ routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: '   ' }, 'rationale', /Say why/],
      [{ routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'x'.repeat(5001) }, 'rationale', /at most 5,000/],
      [{ routeIds: [a.id, b.id], chosenRouteId: c.id, rationale: 'Neither.' }, 'chosenRouteId', /one of the compared routes/],
      [{ routeIds: [a.id], chosenRouteId: a.id, rationale: 'Alone.' }, 'routeIds', /at least 2/],
      [{ routeIds: [a.id, a.id], chosenRouteId: a.id, rationale: 'Twice.' }, 'routeIds', /only once/],
    ];
    for (const [body, field, message] of cases) {
      const res = await post(team.leadId, body);
      expect(res.status, field).toBe(400);
      expect(errorOf(res.body).fields?.[field], JSON.stringify(res.body)).toMatch(message);
    }
    expect((await post(team.leadId, { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'x'.repeat(5000) })).status).toBe(201);
    expect(await decisionCount()).toBe(before + 1);
  });

  it('refuses an archived route (400) and a deleted one (404)', async () => {
    const [a, b, c] = [await route(), await route(), await route()];
    await getDb().models.Route.update({ archivedAt: new Date() }, { where: { id: b.id } });
    await getDb().models.Route.update({ deletedAt: new Date(), deletedById: team.leadId }, { where: { id: c.id } });
    const before = await decisionCount();
    expect((await post(team.leadId, { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'a' })).status).toBe(400);
    expect((await post(team.leadId, { routeIds: [a.id, c.id], chosenRouteId: a.id, rationale: 'a' })).status).toBe(404);
    expect(await decisionCount()).toBe(before);
  });

  it('shelves the other routes through the workflow, leaving shelved ones and the choice alone, and tells the owner', async () => {
    const [chosen, approved, shelved] = [await route(), await route(), await route()];
    await getDb().models.Route.update({ status: 'approved' }, { where: { id: approved.id } });
    await getDb().models.Route.update({ status: 'shelved' }, { where: { id: shelved.id } });
    const decision = await decide([chosen.id, approved.id, shelved.id], chosen.id, { shelveOthers: true });
    expect(decision.shelvedRouteIds).toEqual([approved.id]);
    const { Route, RouteTransition, Notification } = getDb().models;
    const rows = new Map((await Route.findAll({ where: { id: [chosen.id, approved.id, shelved.id] } })).map((r) => [r.id, r]));
    expect(rows.get(chosen.id)!.status).toBe('draft');
    expect(rows.get(approved.id)!).toMatchObject({ status: 'shelved', version: approved.version + 1 });
    expect(rows.get(shelved.id)!).toMatchObject({ status: 'shelved', version: shelved.version });
    const moves = await RouteTransition.findAll({ where: { routeId: [chosen.id, approved.id, shelved.id] } });
    expect(moves.map((m) => [m.routeId, m.fromStatus, m.toStatus, m.actorId])).toEqual([[approved.id, 'approved', 'shelved', team.leadId]]);
    expect(moves[0]!.note).toBe(`Shelved by decision #${decision.id}: the group goes on with “${chosen.name}”.`);
    const notices = await Notification.findAll({ where: { userId: team.designerId, routeId: approved.id, kind: 'status_change' } });
    expect(notices).toHaveLength(1);
  });

  it('supersedes the current decisions about any of the same routes, and only those', async () => {
    const [a, b, c, x, y] = [await route(), await route(), await route(), await route(), await route()];
    const first = await decide([a.id, b.id], a.id);
    const unrelated = await decide([x.id, y.id], x.id);
    const second = await decide([b.id, c.id], c.id);
    const read = async (id: number) => (await callRoute(getOne, { userId: team.leadId, params: { decisionId: String(id) } })).body as DecisionDetailDto;
    expect((await read(first.id)).supersededById).toBe(second.id);
    expect((await read(unrelated.id)).supersededById).toBeNull();
    expect((await read(second.id)).supersededById).toBeNull();
    // A decision already superseded keeps the one that superseded it first.
    const third = await decide([a.id, c.id], a.id);
    expect((await read(first.id)).supersededById).toBe(second.id);
    expect((await read(second.id)).supersededById).toBe(third.id);
  });

  it('has no way to edit or delete a decision: PUT, PATCH and DELETE answer 405', async () => {
    for (const method of ['PUT', 'PATCH', 'DELETE'] as const) {
      const res = await callRoute(decisionsModule[method] as unknown as Parameters<typeof callRoute>[0], { method, userId: team.leadId, body: {} });
      expect(res.status, method).toBe(405);
    }
  });
});

describe('GET /api/decisions', () => {
  it('lists the team\'s decisions newest first, paged, to every member; another team sees only its own', async () => {
    const [a, b] = [await route(), await route()];
    const older = await decide([a.id, b.id], a.id);
    const newer = await decide([a.id, b.id], b.id);
    for (const userId of [team.reviewerId, team.designerId, team.leadId]) {
      const res = await callRoute(list, { userId, path: '/api/decisions?pageSize=2' });
      expect(res.status).toBe(200);
      const body = res.body as DecisionListDto;
      expect(body.items.map((d) => d.id)).toEqual([newer.id, older.id]);
      expect(body.items[0]).toMatchObject({ chosen: { id: b.id }, author: { name: 'Ottilie Marchetti' }, routes: [{ id: a.id }, { id: b.id }] });
      expect(body.items[0]).not.toHaveProperty('snapshot');
      expect(body.total).toBe(await decisionCount());
    }
    const page2 = (await callRoute(list, { userId: team.leadId, path: '/api/decisions?pageSize=1&page=2' })).body as DecisionListDto;
    expect(page2.items.map((d) => d.id)).toEqual([older.id]);
    const outside = (await callRoute(list, { userId: team.outsiderId, path: '/api/decisions' })).body as DecisionListDto;
    expect(outside).toMatchObject({ items: [], total: 0 });
    expect((await callRoute(list, { userId: team.leadId, path: '/api/decisions?page=0' })).status).toBe(400);
  });

  it('keeps a deleted route\'s name in the log, marked deleted', async () => {
    const [a, b] = [await route(), await route()];
    const decision = await decide([a.id, b.id], a.id);
    await getDb().models.Route.update({ deletedAt: new Date(), deletedById: team.leadId }, { where: { id: b.id } });
    const body = (await callRoute(getOne, { userId: team.leadId, params: { decisionId: String(decision.id) } })).body as DecisionDetailDto;
    expect(body.routes[1]).toEqual({ id: b.id, name: b.name, deleted: true });
  });

  it('answers 404 for another team\'s decision, a missing one and a malformed id', async () => {
    const [a, b] = [await route(), await route()];
    const decision = await decide([a.id, b.id], a.id);
    expect((await callRoute(getOne, { userId: team.outsiderId, params: { decisionId: String(decision.id) } })).status).toBe(404);
    expect((await callRoute(getOne, { userId: team.leadId, params: { decisionId: '999999' } })).status).toBe(404);
    expect((await callRoute(getOne, { userId: team.leadId, params: { decisionId: 'abc' } })).status).toBe(404);
  });
});
