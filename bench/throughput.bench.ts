// Throughput of the authenticated evaluate endpoint against GET /api/ping, a signed-in no-op (session and
// user only), on the same server, one after the other, with autocannon on loopback.
import { createRequire } from 'node:module';
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { signInSession } from './support/http-session';
import { round } from './support/stats';

const SECONDS = 8;
const CONNECTIONS = 10;

interface Run {
  requests: { average: number };
  latency: { p50: number; p97_5: number; p99: number };
  non2xx: number;
  errors: number;
}

async function cannon(opts: Record<string, unknown>): Promise<Run> {
  // autocannon ships no types; its result object is read only through Run.
  const autocannon = createRequire(__filename)('autocannon') as (o: Record<string, unknown>) => Promise<Run>;
  const run = await autocannon({ connections: CONNECTIONS, duration: SECONDS, ...opts });
  if (run.non2xx || run.errors) throw new Error(`${String(opts.url)}: ${run.non2xx} non-2xx answers and ${run.errors} errors`);
  return run;
}

export async function runThroughputBench(baseUrl: string): Promise<Record<string, number>> {
  const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
  const session = await signInSession(baseUrl, designer.email, DEMO_PASSWORD);
  const headers = { cookie: session.cookie, 'content-type': 'application/json' };
  const noop = await cannon({ url: `${baseUrl}/api/ping`, headers });
  const evaluate = await cannon({
    url: `${baseUrl}/api/evaluate`, method: 'POST', headers,
    body: JSON.stringify({ equation: 'N2(g) + 3 H2(g) <=> 2 NH3(g)', temperature: '700 K', pressures: { 'N2(g)': '50 bar', 'H2(g)': '150 bar', 'NH3(g)': '10 bar' } }),
  });
  return {
    evaluate_rps_over_noop_rps: round(evaluate.requests.average / noop.requests.average, 3),
    evaluate_latency_p50_ms: evaluate.latency.p50,
    evaluate_latency_p99_ms: evaluate.latency.p99,
    noop_latency_p50_ms: noop.latency.p50,
    noop_latency_p99_ms: noop.latency.p99,
    evaluate_rps: round(evaluate.requests.average),
    noop_rps: round(noop.requests.average),
  };
}
