// Two `next start` instances on different loopback ports, one PostgreSQL database. Interleaved saves of one route
// go to both: in each round exactly one of two saves against the same version wins, the other gets 409, the
// winner's content is what both instances read back, and every acknowledged save is a revision (no lost update).
import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInSession, type Session } from '../../bench/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { startOwnServer, type OwnServer } from '../e2e/support/own-server';
import { createRoute, currentVersion, revisionVersions, saveRoute } from '../e2e/support/route-saves';
import { freePort } from '../../scripts/support/free-port';

const ROOT = path.resolve(__dirname, '../..');
const BASE_URL = process.env.TEST_POSTGRES_URL;
const ROUNDS = 20;
const TIME_BUDGET_MS = 90_000;

async function admin(sql: string, values: unknown[] = [], connectionString = BASE_URL): Promise<Record<string, unknown>[]> {
  const client = new pg.Client({ connectionString });
  await client.connect();
  try {
    return (await client.query(sql, values)).rows as Record<string, unknown>[];
  } finally {
    await client.end();
  }
}

/** The same signed-in person (the same JWT cookie) talking to another instance. */
function sameSessionOn(baseUrl: string, session: Session): Session {
  return {
    cookie: session.cookie,
    fetch: (p, init = {}) =>
      fetch(`${baseUrl}${p}`, {
        method: init.method ?? 'GET',
        headers: { cookie: session.cookie, ...(init.body === undefined ? {} : { 'content-type': 'application/json' }) },
        body: init.body === undefined ? undefined : JSON.stringify(init.body),
      }),
  };
}

async function routeName(session: Session, routeId: number): Promise<string> {
  const res = await session.fetch(`/api/routes/${routeId}`);
  expect(res.status).toBe(200);
  return ((await res.json()) as { name: string }).name;
}

const database = `stepwell_two_${randomBytes(5).toString('hex')}`;
const workDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stepwell-two-'));
const servers: OwnServer[] = [];
let a: Session;
let b: Session;
let databaseUrl = '';

describe('two app instances on one PostgreSQL database', () => {
  beforeAll(async () => {
    if (!BASE_URL) throw new Error('TEST_POSTGRES_URL is not set: run `npm run test:postgres`, which starts a throwaway PostgreSQL');
    const url = new URL(BASE_URL!);
    url.pathname = `/${database}`;
    await admin(`CREATE DATABASE ${database}`);
    databaseUrl = url.toString();
    const env = { DATABASE_URL: databaseUrl, STORAGE_DIR: path.join(workDir, 'files'), STATE_STORE: 'database' };
    // Migrate and seed once, as a site would before starting its instances.
    const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/db-seed.ts'], { cwd: ROOT, env: { ...process.env, ...env }, encoding: 'utf8' });
    if (seeded.status !== 0) throw new Error(`seeding failed: ${seeded.stdout}${seeded.stderr}`);
    const [portA, portB] = [await freePort(), await freePort()];
    // One after the other: two cold starts at once on a 2-core machine only slow both.
    servers.push(await startOwnServer({ port: portA, dbFile: path.join(workDir, 'a', 'unused.sqlite'), env }));
    servers.push(await startOwnServer({ port: portB, dbFile: path.join(workDir, 'b', 'unused.sqlite'), env }));
    const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
    a = await signInSession(servers[0]!.url, designer.email, DEMO_PASSWORD);
    b = sameSessionOn(servers[1]!.url, a);
  });

  afterAll(async () => {
    await Promise.all(servers.map((s) => s.stop()));
    if (BASE_URL) await admin(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
    fs.rmSync(workDir, { recursive: true, force: true });
  });

  it('serves one session on both instances from the one database', async () => {
    expect(servers[0]!.url).not.toBe(servers[1]!.url);
    const route = await createRoute(a, 'Two-instance check: visible everywhere');
    expect(await routeName(b, route.id)).toBe('Two-instance check: visible everywhere');
  });

  it('a save on one instance makes the other refuse the stale version with 409 and the error shape', async () => {
    const route = await createRoute(a, 'Two-instance stale save');
    expect(await saveRoute(a, route.id, route.version, 1)).toEqual({ kind: 'saved', version: route.version + 1 });
    const res = await b.fetch(`/api/routes/${route.id}`, {
      method: 'PUT',
      body: { version: route.version, name: 'Stale from B', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [], links: [] },
    });
    expect(res.status).toBe(409);
    expect(await res.json()).toMatchObject({ error: { code: 'CONFLICT', message: expect.any(String) } });
    expect(await routeName(b, route.id)).toBe('Contended route, save 1');
  });

  it('interleaved saves of one route to both instances: one winner per version, no lost update', async () => {
    const route = await createRoute(a, 'Two-instance contended route');
    const acknowledged: number[] = [];
    const until = Date.now() + TIME_BUDGET_MS;
    let marker = 0;
    let rounds = 0;
    while (rounds < ROUNDS && Date.now() < until) {
      rounds += 1;
      // Alternate who reads, so neither instance is always the one with the fresher view.
      const version = await currentVersion(rounds % 2 ? a : b, route.id);
      const markers = [(marker += 1), (marker += 1)] as const;
      const [onA, onB] = await Promise.all([saveRoute(a, route.id, version, markers[0]), saveRoute(b, route.id, version, markers[1])]);
      const outcomes = [onA, onB];
      const saved = outcomes.filter((o) => o.kind === 'saved');
      expect(saved, `round ${rounds}: ${JSON.stringify(outcomes)}`).toHaveLength(1);
      expect(outcomes.filter((o) => o.kind === 'stale'), `round ${rounds}`).toEqual([{ kind: 'stale', code: 'CONFLICT' }]);
      expect(saved[0]).toEqual({ kind: 'saved', version: version + 1 });
      acknowledged.push(version + 1);
      // Both instances read the winner's document, not the loser's and not a mix.
      const winner = onA.kind === 'saved' ? markers[0] : markers[1];
      expect(await routeName(a, route.id)).toBe(`Contended route, save ${winner}`);
      expect(await routeName(b, route.id)).toBe(`Contended route, save ${winner}`);
    }
    console.log(`[two-instance] ${rounds} rounds, ${acknowledged.length} saves acknowledged across ${servers.map((s) => s.url).join(' and ')}`);
    expect(rounds).toBeGreaterThanOrEqual(5);
    // The created revision plus exactly one per acknowledged save, read through either instance.
    expect(await revisionVersions(b, route.id)).toEqual([1, ...acknowledged]);
    expect(await revisionVersions(a, route.id)).toEqual([1, ...acknowledged]);
  });

  it('a review request sent to both instances from one version: one moves the route, the other gets 409', async () => {
    const reviewer = DEMO_USERS.find((u) => u.role === 'reviewer')!;
    const [row] = await admin('SELECT id FROM users WHERE email = $1', [reviewer.email], databaseUrl);
    const reviewerId = Number(row!.id);
    for (let round = 1; round <= 5; round += 1) {
      const route = await createRoute(a, `Two-instance review request ${round}`);
      const body = { to: 'in_review', version: route.version, note: '', reviewerIds: [reviewerId] };
      const answers = await Promise.all([a, b].map((s) => s.fetch(`/api/routes/${route.id}/transitions`, { method: 'POST', body })));
      expect(answers.map((r) => r.status).sort(), `round ${round}`).toEqual([200, 409]);
      expect(await currentVersion(b, route.id)).toBe(route.version + 1);
      const [moves] = await admin('SELECT COUNT(*) AS n FROM route_transitions WHERE route_id = $1', [route.id], databaseUrl);
      expect(Number(moves!.n), `round ${round}`).toBe(1);
    }
  });
});
