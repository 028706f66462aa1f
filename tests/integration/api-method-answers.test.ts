// Next's own answers under /api, replaced by ours: an unknown path is a 404 and a method a route does not serve a 405
// with Allow, both in the error shape. Next answers a method a route file does not export with an empty 405 and no
// Allow header (next/dist/server/route-modules/app-route/helpers/auto-implement-methods.js), so every file must
// export every method: its own handlers, and refuseOtherMethods' answers for the rest.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isRefusedMethod } from '@/lib/api/method-not-allowed';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute } from './support/http';
import { HTTP_METHODS, importRoute, listRouteFiles, servedMethods } from './support/route-files';
import { setupTestDb, teardownTestDb } from './support/test-db';

type Handler = Parameters<typeof callRoute>[0];
let dir = '';
let leadId = 0;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  leadId = (await makeTeamWithLead('methods')).leadId;
});
afterAll(async () => teardownTestDb(dir));

const CATCH_ALL = '[[...path]]';
const routes = listRouteFiles().filter((r) => r !== CATCH_ALL);

function expectedAllow(served: readonly string[]): string {
  const allow = new Set([...served, 'OPTIONS']);
  if (allow.has('GET')) allow.add('HEAD');
  return [...allow].sort().join(', ');
}

describe('a method a route does not serve', () => {
  it('finds the route files', () => {
    expect(routes.length).toBeGreaterThan(50);
  });

  it.each(routes)('/api/%s exports every method and answers the ones it does not serve with 405 and Allow', async (route) => {
    const mod = await importRoute<Record<string, Handler>>(route);
    const served = servedMethods(mod);
    expect(served.length, 'serves at least one method').toBeGreaterThan(0);
    const allow = expectedAllow(served);
    for (const method of HTTP_METHODS) {
      expect(typeof mod[method], `${method} is exported (else Next answers an empty 405 without Allow)`).toBe('function');
      if (served.includes(method)) continue;
      expect(isRefusedMethod(mod[method])).toBe(true);
      for (const userId of [null, leadId]) {
        const res = await callRoute(mod[method]!, { method, path: `/api/${route}`, userId, body: method === 'GET' || method === 'DELETE' ? undefined : { any: 'body' } });
        expect(res.status, `${method} /api/${route}`).toBe(405);
        expect(res.headers.get('allow')).toBe(allow);
        expect(res.body).toEqual({ error: { code: 'METHOD_NOT_ALLOWED', message: `This address does not take ${method}; it takes ${allow}.` } });
      }
    }
    // OPTIONS lists what is served (Next's automatic OPTIONS would count the refusing exports as served).
    const options = await callRoute(mod.OPTIONS!, { method: 'OPTIONS', path: `/api/${route}` });
    expect(options.status).toBe(204);
    expect(options.headers.get('allow')).toBe(allow);
  });
});

describe('an /api path no handler serves', () => {
  it.each([...HTTP_METHODS, 'OPTIONS'])('answers %s with 404 in the error shape, signed in or not', async (method) => {
    const mod = await importRoute<Record<string, Handler>>(CATCH_ALL);
    for (const userId of [null, leadId]) {
      const res = await callRoute(mod[method]!, { method, path: '/api/no/such/endpoint', params: { path: 'no/such/endpoint' }, userId });
      expect(res.status).toBe(404);
      expect(res.headers.get('content-type')).toMatch(/application\/json/);
      expect(res.body).toEqual({ error: { code: 'NOT_FOUND', message: 'There is no API endpoint at this address.' } });
    }
  });

  it('is served by one catch-all at the root of app/api, so every other route is more specific', () => {
    expect(listRouteFiles().filter((r) => r.includes('[...') && !r.startsWith('auth/'))).toEqual([CATCH_ALL]);
  });
});
