// The endpoint fuzz: every POST/PUT/PATCH handler found in app/api, 2,000 bodies each, as the lead of the owning team.
import fc from 'fast-check';
import { encode } from 'next-auth/jwt';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { addMember, makeTeamWithLead } from './fixtures';
import { edgeExamples, fuzzRequests, type FuzzRequest } from './fuzz-bodies';
import { makeParams, missingParamMakers, SEED_BODIES, type FuzzWorld } from './fuzz-targets';
import { callRoute } from './http';
import { importRoute, listRouteFiles, servedMethods, type HTTP_METHODS } from './route-files';
import { setupTestDb, teardownTestDb, TEST_SECRET } from './test-db';

// 2,000 bodies per handler is the bar; FUZZ_RUNS lowers it for a quick local loop only.
const RUNS = Number(process.env.FUZZ_RUNS ?? 2000);
const BODY_METHODS = ['POST', 'PUT', 'PATCH'] as const;
// next-auth's own endpoints are not withRoute handlers; the e2e sign-in tests cover them.
const NOT_OURS = new Set(['auth/[...nextauth]']);
// Handlers that take no JSON body (none at all, or a raw upload): fuzzed all the same, but with no seed to mutate.
// The catch-all answers 404 to any body.
const NO_JSON_BODY = new Set([
  'POST me/sign-out-everywhere', 'POST routes/[routeId]/undelete', 'POST species/imports', 'POST [[...path]]', 'PUT [[...path]]', 'PATCH [[...path]]',
]);

type Handler = Parameters<typeof callRoute>[0];
interface Target {
  key: string;
  route: string;
  method: (typeof HTTP_METHODS)[number];
  handler: Handler;
}

// Built from the handler files, so a new JSON handler is fuzzed without anyone listing it.
async function jsonTargets(): Promise<Target[]> {
  const targets: Target[] = [];
  for (const route of listRouteFiles()) {
    if (NOT_OURS.has(route)) continue;
    const mod = await importRoute<Record<string, Handler>>(route);
    const served = servedMethods(mod);
    for (const method of BODY_METHODS) if (served.includes(method)) targets.push({ key: `${method} ${route}`, route, method, handler: mod[method]! });
  }
  return targets;
}

// Each handler gets its own team, so one handler's successful writes (active team, roles, sign-out) never steer another's.
interface Caller {
  world: FuzzWorld;
  cookie: string;
  epoch: number;
}

async function makeCaller(): Promise<Caller> {
  const main = await makeTeamWithLead('fuzz');
  const world = { teamId: main.teamId, leadId: main.leadId, reviewerId: await addMember(main.teamId, 'reviewer') };
  const caller = { world, cookie: '', epoch: 0 };
  await renewSession(caller);
  return caller;
}

// A session at the user's current epoch, so a "sign out everywhere" among the bodies doesn't end the run.
async function renewSession(caller: Caller): Promise<void> {
  caller.epoch = (await getDb().models.User.findByPk(caller.world.leadId))!.sessionEpoch;
  const token = await encode({ token: { sub: String(caller.world.leadId), epoch: caller.epoch, authAt: Math.floor(Date.now() / 1000) }, secret: TEST_SECRET });
  caller.cookie = `next-auth.session-token=${token}`;
}

async function send(target: Target, caller: Caller, params: Record<string, string>, req: FuzzRequest) {
  const res = await callRoute(target.handler, {
    method: target.method, params, rawBody: req.raw, headers: { cookie: caller.cookie, 'content-type': req.contentType }, path: `/api/${target.route}`,
  });
  if (res.status < 300 && (await getDb().models.User.findByPk(caller.world.leadId))!.sessionEpoch !== caller.epoch) await renewSession(caller);
  return res;
}

function checkAnswer(res: { status: number; body: unknown }, req: FuzzRequest) {
  const where = `${req.kind} body ${req.raw.slice(0, 300)} → ${res.status} ${JSON.stringify(res.body)?.slice(0, 300)}`;
  expect(res.status, where).toBeLessThan(500);
  if (res.status >= 400) {
    expect(res.body, where).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
    const fields = (res.body as { error: { fields?: unknown } }).error.fields;
    if (fields !== undefined) for (const v of Object.values(fields as object)) expect(typeof v, where).toBe('string');
  }
  expect(({} as Record<string, unknown>).polluted, `prototype polluted by ${where}`).toBeUndefined();
}

async function fuzzOne(target: Target): Promise<Map<number, number>> {
  const caller = await makeCaller();
  const params = await makeParams(target.route, caller.world);
  const makeSeed = SEED_BODIES[target.key];
  const seed = makeSeed ? await makeSeed(caller.world, params) : undefined;
  if (seed !== undefined) {
    // The seed itself must get past validation, or its mutations are not near-valid.
    const req = { kind: 'seed', raw: JSON.stringify(seed), contentType: 'application/json' };
    const res = await send(target, caller, params, req);
    checkAnswer(res, req);
    expect((res.body as { error?: { code?: string } } | undefined)?.error?.code, `the seed body of ${target.key} fails validation: ${JSON.stringify(res.body)}`).not.toBe('VALIDATION');
  }
  const statuses = new Map<number, number>();
  await fc.assert(
    fc.asyncProperty(fuzzRequests(seed), async (req) => {
      const res = await send(target, caller, params, req);
      statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      checkAnswer(res, req);
    }),
    { numRuns: RUNS, examples: edgeExamples(seed).map((req) => [req] as [FuzzRequest]) },
  );
  return statuses;
}

/** Fuzzes every other JSON handler (in path order, starting at `half`), so two files share the work evenly;
 *  the file with `checkCoverage` also checks that every handler can be fuzzed. */
export async function fuzzEndpoints({ half, checkCoverage = false }: { half: 0 | 1; checkCoverage?: boolean }) {
  const all = await jsonTargets();
  const report: string[] = [];
  let dir = '';

  beforeAll(async () => {
    process.env.SMTP_URL = 'smtp://127.0.0.1:1'; // nothing listens: invitation mail fails fast and is logged
    ({ dir } = await setupTestDb());
  });
  afterAll(async () => {
    if (process.env.FUZZ_REPORT) console.log(report.join('\n'));
    await teardownTestDb(dir);
  });

  // Concurrent: while one handler waits on SQLite, another's bodies are generated and validated.
  describe.concurrent('fuzzing JSON endpoints as the lead of the owning team', () => {
    if (checkCoverage) {
      it('finds the JSON handlers, can fill every path parameter and has a valid body for each', () => {
        expect(all.length).toBeGreaterThan(20);
        const unfilled = all.flatMap((t) => missingParamMakers(t.route).map((name) => `${t.key}: [${name}]`));
        expect(unfilled, 'add a maker for these path parameters to PARAM_MAKERS in tests/integration/support/fuzz-targets.ts').toEqual([]);
        const unseeded = all.filter((t) => !SEED_BODIES[t.key] && !NO_JSON_BODY.has(t.key)).map((t) => t.key);
        expect(unseeded, 'give these handlers a valid body in SEED_BODIES (tests/integration/support/fuzz-targets.ts), or list them in NO_JSON_BODY; until then they get generic bodies only').toEqual([]);
        const stale = [...Object.keys(SEED_BODIES), ...NO_JSON_BODY].filter((key) => !all.some((t) => t.key === key));
        expect(stale, 'seed bodies for handlers that no longer exist').toEqual([]);
      });
    }

    for (const target of all.filter((_t, i) => i % 2 === half)) {
      it(`${target.key}: ${RUNS} bodies, no 5xx, every 4xx in the error shape`, async () => {
        const statuses = await fuzzOne(target);
        // Validation must have refused some bodies: a handler that accepts everything is not reading its body.
        if (!NO_JSON_BODY.has(target.key)) expect(statuses.get(400) ?? 0, JSON.stringify([...statuses])).toBeGreaterThan(0);
        report.push(`${target.key}: ${JSON.stringify(Object.fromEntries(statuses))}`);
      }, 90_000);
    }
  });
}
