// A NUL character (%00) in a path segment or the query string is bad input: 400 in the error shape, never a 5xx.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as listRoutes } from '@/app/api/routes/route';
import { GET as speciesByKey } from '@/app/api/species/[key]/route';
import { GET as searchSpecies } from '@/app/api/species/route';
import { makeRoleSet } from './support/fixtures';
import { paramNames } from './support/fuzz-targets';
import { callRoute, errorOf } from './support/http';
import { importRoute, listRouteFiles, servedMethods } from './support/route-files';
import { setupTestDb, teardownTestDb } from './support/test-db';

type Handler = Parameters<typeof callRoute>[0];
let dir = '';
let world: Awaited<ReturnType<typeof makeRoleSet>>;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  world = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

function expectNulRefused(res: { status: number; body: unknown }, field: string) {
  expect(res.status, JSON.stringify(res.body)).toBe(400);
  expect(errorOf(res.body)).toMatchObject({ code: 'VALIDATION', message: expect.stringContaining('NUL'), fields: { [field]: expect.stringContaining('%00') } });
}

describe('NUL in the request address', () => {
  it('in a path segment (a species key) answers 400, where the lookup used to fail with 500', async () => {
    expectNulRefused(await callRoute(speciesByKey, { userId: world.leadId, params: { key: 'H2O\u0000(g)' } }), 'key');
  });

  it('in a query value or name answers 400 before any search runs', async () => {
    expectNulRefused(await callRoute(listRoutes, { userId: world.leadId, path: '/api/routes?q=meth%00anol' }), 'q');
    expectNulRefused(await callRoute(searchSpecies, { userId: world.leadId, path: '/api/species?q=%00' }), 'q');
    expectNulRefused(await callRoute(listRoutes, { userId: world.leadId, path: '/api/routes?so%00rt=name' }), 'so%00rt');
  });

  it('is refused by every handler under app/api, in the query and in each path parameter', async () => {
    const problems: string[] = [];
    for (const route of listRouteFiles()) {
      if (route.startsWith('auth/')) continue; // next-auth's own endpoints
      const mod = await importRoute<Record<string, Handler>>(route);
      for (const method of servedMethods(mod)) {
        const handler = mod[method]!;
        const body = method === 'GET' || method === 'DELETE' ? undefined : {};
        const names = paramNames(route);
        const good = Object.fromEntries(names.map((n) => [n, '1']));
        const attempts: Array<[string, Parameters<typeof callRoute>[1]]> = [
          ['query', { path: `/api/${route}?q=a%00b`, params: good }],
          ...names.map((n): [string, Parameters<typeof callRoute>[1]] => [n, { params: { ...good, [n]: 'a\u0000b' } }]),
        ];
        for (const [field, opts] of attempts) {
          const res = await callRoute(handler, { ...opts, method, body, userId: world.leadId });
          const fields = (res.body as { error?: { fields?: Record<string, string> } } | undefined)?.error?.fields ?? {};
          if (res.status !== 400 || !(field === 'query' ? fields.q : fields[field])) problems.push(`${method} ${route} (${field}): ${res.status} ${JSON.stringify(res.body).slice(0, 120)}`);
        }
      }
    }
    expect(problems).toEqual([]);
  }, 60_000);
});
