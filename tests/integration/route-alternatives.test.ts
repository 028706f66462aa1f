import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as alternatives } from '@/app/api/routes/[routeId]/alternatives/route';
import { POST as duplicate } from '@/app/api/routes/[routeId]/duplicate/route';
import { DELETE as deleteRoute } from '@/app/api/routes/[routeId]/route';
import { POST as archive } from '@/app/api/routes/[routeId]/archive/route';
import type { RouteAlternativesDto } from '@/lib/services/routes/list-alternatives';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { makeRoleSet, makeRoute } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
const tick = () => new Promise((resolve) => setTimeout(resolve, 5));

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const read = (routeId: number | string, userId: number | null) => callRoute(alternatives, { userId, path: `/api/routes/${routeId}/alternatives`, params: { routeId: String(routeId) } });
async function ok(routeId: number, userId = w.reviewerId): Promise<RouteAlternativesDto> {
  const res = await read(routeId, userId);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as RouteAlternativesDto;
}
async function copyOf(routeId: number, name: string): Promise<RouteDocumentDto> {
  const res = await callRoute(duplicate, { method: 'POST', userId: w.designerId, params: { routeId: String(routeId) }, body: { name } });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  await tick();
  return res.body as RouteDocumentDto;
}

describe('GET /api/routes/[routeId]/alternatives', () => {
  it('lists the routes duplicated from a route, most recently edited first, and names the origin of a copy', async () => {
    const base = await makeRoute(w.teamId, w.leadId);
    expect(await ok(base.id)).toEqual({ origin: null, alternatives: [] });

    const a = await copyOf(base.id, 'Methanol, option A');
    const b = await copyOf(base.id, 'Methanol, option B');
    const grandchild = await copyOf(a.id, 'Methanol, option A2');

    const list = await ok(base.id);
    expect(list.origin).toBeNull();
    expect(list.alternatives.map((r) => r.name)).toEqual(['Methanol, option B', 'Methanol, option A']);
    expect(list.alternatives[0]).toEqual({ id: b.id, name: 'Methanol, option B', status: 'draft', archived: false, updatedAt: b.updatedAt });

    // Only direct links: the copy of a copy belongs to its own parent.
    const ofA = await ok(a.id, w.designerId);
    expect(ofA.origin).toEqual({ id: base.id, name: base.name, status: 'draft', archived: false });
    expect(ofA.alternatives.map((r) => r.id)).toEqual([grandchild.id]);
    expect((await ok(grandchild.id, w.leadId)).origin?.id).toBe(a.id);
  });

  it('marks archived routes and leaves deleted ones out, on both sides', async () => {
    const base = await makeRoute(w.teamId, w.leadId);
    const kept = await copyOf(base.id, 'Kept');
    const shelf = await copyOf(base.id, 'Archived one');
    const gone = await copyOf(base.id, 'Deleted one');
    expect((await callRoute(archive, { method: 'POST', userId: w.designerId, params: { routeId: String(shelf.id) }, body: { archived: true } })).status).toBe(200);
    expect((await callRoute(deleteRoute, { method: 'DELETE', userId: w.designerId, params: { routeId: String(gone.id) } })).status).toBe(200);

    const list = await ok(base.id);
    expect(list.alternatives.map((r) => [r.name, r.archived])).toEqual([
      ['Archived one', true],
      ['Kept', false],
    ]);

    expect((await callRoute(deleteRoute, { method: 'DELETE', userId: w.leadId, params: { routeId: String(base.id) } })).status).toBe(200);
    expect((await ok(kept.id)).origin).toBeNull();
    // The deleted route itself answers 404, like every route-scoped handler.
    const res = await read(base.id, w.leadId);
    expect(res.status).toBe(404);
    expect(errorOf(res.body).code).toBe('NOT_FOUND');
  });

  it('never lists another team’s route, even one whose origin points here', async () => {
    const base = await makeRoute(w.teamId, w.leadId);
    const theirs = await makeRoute(w.foreignTeamId, w.foreignId);
    await getDb().models.Route.update({ originRouteId: base.id }, { where: { id: theirs.id } });
    await getDb().models.Route.update({ originRouteId: theirs.id }, { where: { id: base.id } });
    expect(await ok(base.id)).toEqual({ origin: null, alternatives: [] });
  });

  it('answers 404 to a caller outside the team and for a bad id, and 401 without a session', async () => {
    const base = await makeRoute(w.teamId, w.leadId);
    const foreign = await read(base.id, w.foreignId);
    expect(foreign.status).toBe(404);
    expect(errorOf(foreign.body).code).toBe('NOT_FOUND');
    for (const bad of ['abc', '0', '-3', '999999']) expect((await read(bad, w.leadId)).status).toBe(404);
    expect((await read(base.id, null)).status).toBe(401);
  });
});
