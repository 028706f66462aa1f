// Growth: the routes list and species search of the large team (npm run db:seed:large: 5,000 routes, 100,000 steps,
// 10,000 team species) over HTTP on its own production server, side by side with the small demo team on the e2e
// server in the same run. Targets: routes list p95 ≤ 100 ms, species search p95 ≤ 50 ms (shown as p95 / target).
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { startOwnServer } from '../tests/e2e/support/own-server';
import { signInSession, type Session } from './support/http-session';
import { freePort } from '../scripts/support/free-port';
import { percentile, round } from './support/stats';
import { timedRequests } from './support/timed-requests';


const LIST_TARGET_MS = 100;
const SEARCH_TARGET_MS = 50;
const ROOT = path.resolve(__dirname, '..');

// The list as the routes page asks for it: every sort, both directions, pages deep into the list, a name search.
const SORTS = ['updatedAt', 'name', 'target', 'steps', 'overallDeltaG', 'uphillSteps'];
const listPath = (i: number) => {
  const sort = SORTS[i % SORTS.length]!;
  const q = i % 5 === 4 ? `&q=${encodeURIComponent(`Route 0${i % 10}`)}` : '';
  return `/api/routes?sort=${sort}&dir=${i % 2 ? 'asc' : 'desc'}&page=${1 + ((i * 7) % 40)}&pageSize=25${q}`;
};
// Species search as the picker types: formula prefixes, names, and words that match nothing.
const SEARCHES = ['C1', 'C12H', 'C7H20O', 'Seeded species 01', 'Seeded species 0999', 'H2O', 'CO2', 'ethanol', 'zz-nothing', 'C25H40O10'];
const searchPath = (i: number) => `/api/species?q=${encodeURIComponent(SEARCHES[i % SEARCHES.length]!)}&pageSize=25${i % 3 === 0 ? '&origin=team' : ''}`;

function seedLargeDb(file: string): void {
  for (const suffix of ['', '-wal', '-shm']) fs.rmSync(file + suffix, { force: true });
  const seeded = spawnSync(process.execPath, ['--conditions=react-server', '--import', 'tsx', 'scripts/db-seed-large.ts'], {
    cwd: ROOT, env: { ...process.env, STEPWELL_LARGE_DB: file, DATABASE_PATH: '' }, stdio: ['ignore', 'inherit', 'inherit'],
  });
  if (seeded.status !== 0) throw new Error('npm run db:seed:large failed');
}

async function measure(session: Session, requests: number) {
  const list = await timedRequests(requests, 'routes list', (i) => session.fetch(listPath(i)));
  const search = await timedRequests(requests, 'species search', (i) => session.fetch(searchPath(i)));
  return { listP50: percentile(list, 50), listP95: percentile(list, 95), searchP50: percentile(search, 50), searchP95: percentile(search, 95) };
}

export async function runLargeBench(smallBaseUrl: string, { requests = 200 } = {}): Promise<Record<string, number>> {
  const lead = DEMO_USERS.find((u) => u.role === 'lead')!;
  const file = path.join(ROOT, 'var/bench-large/stepwell.sqlite');
  seedLargeDb(file);
  const server = await startOwnServer({ port: await freePort(), dbFile: file });
  try {
    const large = await measure(await signInSession(server.url, lead.email, DEMO_PASSWORD), requests);
    const small = await measure(await signInSession(smallBaseUrl, lead.email, DEMO_PASSWORD), requests);
    return {
      routes_list_large_p50_ms: round(large.listP50),
      routes_list_large_p95_ms: round(large.listP95),
      routes_list_small_p95_ms: round(small.listP95),
      routes_list_p95_large_over_small: round(large.listP95 / small.listP95),
      routes_list_p95_over_100ms_target: round(large.listP95 / LIST_TARGET_MS),
      species_search_large_p50_ms: round(large.searchP50),
      species_search_large_p95_ms: round(large.searchP95),
      species_search_small_p95_ms: round(small.searchP95),
      species_search_p95_large_over_small: round(large.searchP95 / small.searchP95),
      species_search_p95_over_50ms_target: round(large.searchP95 / SEARCH_TARGET_MS),
      large_requests: requests * 2,
    };
  } finally {
    await server.stop();
  }
}

if (require.main === module) {
  // Alone: npx tsx bench/large.bench.ts (needs a build, and the e2e server on its port for the small side).
  void import('../tests/e2e/support/e2e-env').then(({ E2E_BASE_URL }) => runLargeBench(E2E_BASE_URL).then((f) => console.log(f)));
}
