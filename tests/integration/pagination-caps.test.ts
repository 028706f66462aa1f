// Pagination is capped: no list answers more than 100 items, and a huge page size is refused with the field named.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeRoleSet, makeRoute } from './support/fixtures';
import { makeParams, missingParamMakers, type FuzzWorld } from './support/fuzz-targets';
import { callRoute } from './support/http';
import { importRoute, listRouteFiles } from './support/route-files';
import { setupTestDb, teardownTestDb } from './support/test-db';

type Handler = Parameters<typeof callRoute>[0];
const CAP = 100;
const HUGE = '1000000';
// Endpoints that page, and the query parameter they page with: each must refuse HUGE by name.
const PAGED: Record<string, 'pageSize' | 'limit'> = {
  routes: 'pageSize',
  decisions: 'pageSize',
  notifications: 'limit',
  species: 'pageSize',
  'routes/[routeId]/revisions': 'pageSize',
  'routes/[routeId]/transitions': 'pageSize',
  'routes/[routeId]/activity': 'limit',
};

// Whole documents, not lists: one file with everything the team holds.
const DOCUMENTS = new Set(['teams/[teamId]/export']);

let dir = '';
let world: FuzzWorld & { leadId: number };
const getRoutes: string[] = [];

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  const roles = await makeRoleSet();
  world = { teamId: roles.teamId, leadId: roles.leadId, reviewerId: roles.reviewerId };
  // More routes than any cap, so an uncapped list would show it.
  for (let i = 0; i < CAP + 20; i += 1) await makeRoute(world.teamId, world.leadId, false);
  for (const route of listRouteFiles()) {
    if (route.startsWith('auth/')) continue;
    if (typeof (await importRoute(route)).GET === 'function') getRoutes.push(route);
  }
});
afterAll(async () => teardownTestDb(dir));

function longestArray(value: unknown): number {
  if (Array.isArray(value)) return Math.max(value.length, ...value.map(longestArray));
  if (value && typeof value === 'object') return Math.max(0, ...Object.values(value).map(longestArray));
  return 0;
}

async function get(route: string, query: string) {
  const mod = await importRoute<Record<string, Handler>>(route);
  const params = await makeParams(route, world);
  const path = `/api/${route.replace(/\[(\w+)\]/g, (_m, name: string) => params[name]!)}?${query}`;
  return callRoute(mod.GET!, { path, params, userId: world.leadId });
}

describe('pagination caps', () => {
  it('lists every paging endpoint that exists', () => {
    expect([...Object.keys(PAGED), ...DOCUMENTS].filter((route) => !getRoutes.includes(route)), 'names endpoints that are gone').toEqual([]);
    expect(getRoutes.flatMap((r) => missingParamMakers(r)), 'path parameters without a maker in fuzz-targets.ts').toEqual([]);
  });

  it('refuses a huge page size on each paging endpoint, naming the parameter', async () => {
    for (const [route, param] of Object.entries(PAGED)) {
      const res = await get(route, `${param}=${HUGE}`);
      expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBe(400);
      expect((res.body as { error: { fields?: Record<string, string> } }).error.fields, route).toHaveProperty(param);
    }
  });

  it('still answers at most 100 items at the largest allowed page size', async () => {
    const res = await get('routes', `pageSize=${CAP}`);
    expect(res.status).toBe(200);
    const n = longestArray(res.body);
    expect(n).toBe(CAP); // the team has more routes than that, so exactly the cap
  });

  it('never answers more than 100 items from any GET handler, whatever page size or limit it is given', async () => {
    expect(getRoutes.length).toBeGreaterThan(20);
    for (const route of getRoutes.filter((r) => !DOCUMENTS.has(r))) {
      for (const query of [`pageSize=${HUGE}`, `limit=${HUGE}`, `page=1&pageSize=${HUGE}&limit=${HUGE}`]) {
        const res = await get(route, query);
        expect(res.status, `${route}?${query}`).toBeLessThan(500);
        if (res.status === 200 && res.headers.get('content-type')?.includes('json')) {
          expect(longestArray(res.body), `${route}?${query} answered a list longer than ${CAP}`).toBeLessThanOrEqual(CAP);
        }
      }
    }
  });
});
