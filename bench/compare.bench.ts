// A 4-route comparison of 50 steps each over loopback: the handler, the session, the database reads
// and four route evaluations with remedies. Two patterns, side by side:
// - unchanged: the same comparison again, as when the page is reopened;
// - what-if: a different temperature offset each call, so every step and remedy is new to the server.
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { signInSession, type Session } from './support/http-session';
import { percentile, round } from './support/stats';
import { syntheticChain } from './support/synthetic-route';
import { timedRequests } from './support/timed-requests';

const ROUTES = 4;
const STEPS = 50;

async function createRoute(session: Session, k: number): Promise<number> {
  // Each route its own temperatures, so the four share no remedies.
  const chain = syntheticChain(STEPS, 7.25 * k);
  const name = `Bench: compare route ${k + 1} (${STEPS} steps)`;
  const created = (await (await session.fetch('/api/routes', { method: 'POST', body: { name, target: chain.target, targetAmount: '1 mol' } })).json()) as { id: number; version: number };
  const saved = await session.fetch(`/api/routes/${created.id}`, {
    method: 'PUT',
    body: { version: created.version, name, targetAmount: '1 mol', marginalThreshold_kJ: -17, ...chain },
  });
  if (!saved.ok) throw new Error(`saving a bench route failed: ${saved.status} ${await saved.text()}`);
  return created.id;
}

export async function runCompareBench(baseUrl: string, { requests = 60 } = {}): Promise<Record<string, number>> {
  const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
  const session = await signInSession(baseUrl, designer.email, DEMO_PASSWORD);
  const ids: number[] = [];
  for (let k = 0; k < ROUTES; k += 1) ids.push(await createRoute(session, k));
  const compare = (offset?: number) => session.fetch(`/api/compare?ids=${ids.join(',')}${offset === undefined ? '' : `&temperatureOffset_K=${offset}`}`);

  const unchanged = await timedRequests(requests, 'compare', () => compare());
  const whatIfRequests = Math.max(10, Math.floor(requests / 3));
  // Offsets from +1.013 K upwards, never repeating, never matching a step's saved temperature.
  const whatIf = await timedRequests(whatIfRequests, 'compare', (i) => compare(Number((1.013 + i * 0.731).toFixed(3))));
  return {
    compare4x50_http_p50_ms: round(percentile(unchanged, 50)),
    compare4x50_http_p95_ms: round(percentile(unchanged, 95)),
    compare4x50_whatif_http_p50_ms: round(percentile(whatIf, 50)),
    compare4x50_whatif_http_p95_ms: round(percentile(whatIf, 95)),
    compare4x50_http_requests: unchanged.length + whatIf.length,
  };
}
