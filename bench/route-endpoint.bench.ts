// The 200-step route evaluated end to end on loopback: the handler, the session, the database read and the engine.
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { signInSession } from './support/http-session';
import { percentile, round } from './support/stats';
import { syntheticChain } from './support/synthetic-route';

export async function runRouteEndpointBench(baseUrl: string, { requests = 60 } = {}): Promise<Record<string, number>> {
  const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
  const session = await signInSession(baseUrl, designer.email, DEMO_PASSWORD);
  const chain = syntheticChain(200);
  const created = (await (await session.fetch('/api/routes', { method: 'POST', body: { name: 'Bench: 200-step chain', target: chain.target, targetAmount: '1 mol' } })).json()) as { id: number; version: number };
  const saved = await session.fetch(`/api/routes/${created.id}`, {
    method: 'PUT',
    body: { version: created.version, name: 'Bench: 200-step chain', targetAmount: '1 mol', marginalThreshold_kJ: -17, ...chain },
  });
  if (!saved.ok) throw new Error(`saving the bench route failed: ${saved.status} ${await saved.text()}`);
  const timings: number[] = [];
  for (let i = 0; i < requests + 5; i += 1) {
    const started = performance.now();
    const res = await session.fetch(`/api/routes/${created.id}/evaluate`, { method: 'POST' });
    await res.arrayBuffer();
    if (!res.ok) throw new Error(`evaluate failed: ${res.status}`);
    if (i >= 5) timings.push(performance.now() - started);
  }
  return { route200_http_p50_ms: round(percentile(timings, 50)), route200_http_p95_ms: round(percentile(timings, 95)), route200_http_requests: timings.length };
}
