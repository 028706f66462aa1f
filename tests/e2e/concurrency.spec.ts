// Concurrency on loopback against the production server: 20 clients save one shared route and routes of their own
// for a bounded time. Every acknowledged save is a revision, stale versions get 409, and nothing else reaches a client.
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signInSession, type Session } from '../../bench/support/http-session';
import { E2E_BASE_URL } from './support/e2e-env';
import { createRoute, currentVersion, revisionVersions, saveRoute } from './support/route-saves';

const CLIENTS = 20;
const SHARED_CLIENTS = 10;
const SECONDS = Number(process.env.CONCURRENCY_SECONDS ?? 30);

test('20 clients saving the same and different routes: no save lost, stale ones 409, no 5xx or SQLITE_BUSY', async () => {
  test.setTimeout((SECONDS + 60) * 1000);
  // One sign-in per person, shared by their clients, so the sign-in limiter is not what is measured.
  const people = await Promise.all(
    DEMO_USERS.filter((u) => u.role !== 'reviewer').map((u) => signInSession(E2E_BASE_URL, u.email, DEMO_PASSWORD)),
  );
  const sessionOf = (client: number): Session => people[client % people.length]!;
  const shared = await createRoute(people[0]!, 'Contended: shared by ten clients');
  const own: Array<{ id: number; version: number }> = [];
  for (let i = SHARED_CLIENTS; i < CLIENTS; i += 1) own.push(await createRoute(sessionOf(i), `Contended: client ${i} alone`));

  const acked = new Map<number, number[]>([[shared.id, []], ...own.map((r) => [r.id, []] as [number, number[]])]);
  const unexpected: string[] = [];
  let stale = 0;
  let marker = 0;
  const until = Date.now() + SECONDS * 1000;

  const client = async (i: number) => {
    const session = sessionOf(i);
    const route = i < SHARED_CLIENTS ? shared : own[i - SHARED_CLIENTS]!;
    let version = route.version;
    while (Date.now() < until) {
      const outcome = await saveRoute(session, route.id, version, (marker += 1));
      if (outcome.kind === 'saved') {
        acked.get(route.id)!.push(outcome.version);
        version = outcome.version;
      } else if (outcome.kind === 'stale' && i < SHARED_CLIENTS) {
        expect(outcome.code).toBe('CONFLICT');
        stale += 1;
        version = await currentVersion(session, route.id); // what the "changed elsewhere" dialog does: reload, then save again
      } else {
        unexpected.push(`client ${i}: ${JSON.stringify(outcome).slice(0, 300)}`);
        return;
      }
    }
  };
  await Promise.all(Array.from({ length: CLIENTS }, (_, i) => client(i)));
  console.log(`[concurrency] ${SECONDS} s: ${[...acked.values()].reduce((n, v) => n + v.length, 0)} saves acknowledged, ${stale} stale`);

  expect(unexpected, 'answers other than 200 and 409').toEqual([]);
  expect(stale, 'the shared route must have seen stale saves').toBeGreaterThan(0);
  for (const [routeId, versions] of acked) {
    expect(versions.length, `saves acknowledged on route ${routeId}`).toBeGreaterThan(0);
    expect(new Set(versions).size, `two saves acknowledged with one version on route ${routeId}`).toBe(versions.length);
    // Exactly the created revision plus one per acknowledged save: nothing lost, nothing extra.
    const revisions = await revisionVersions(people[0]!, routeId);
    expect(revisions).toEqual([1, ...[...versions].sort((a, b) => a - b)]);
  }
  // A save against a version long gone is refused, not merged.
  const late = await saveRoute(people[0]!, shared.id, 1, 0);
  expect(late).toEqual({ kind: 'stale', code: 'CONFLICT' });
});
