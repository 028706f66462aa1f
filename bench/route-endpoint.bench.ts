// The 200-step route evaluated end to end on loopback: the handler, the session, the database read
// (or the draft body) and the engine. Three patterns, side by side:
// - after one edit: the editor's draft with one step's temperature changed, as after each edit;
// - saved, unchanged: the saved route evaluated again;
// - cold: every step new to the server (all temperatures shifted), so every remedy is worked out.
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seeders/demo-team';
import { signInSession, type Session } from './support/http-session';
import { percentile, round } from './support/stats';
import { syntheticChain } from './support/synthetic-route';
import { timedRequests } from './support/timed-requests';


async function createChainRoute(session: Session) {
  const chain = syntheticChain(200);
  const created = (await (await session.fetch('/api/routes', { method: 'POST', body: { name: 'Bench: 200-step chain', target: chain.target, targetAmount: '1 mol' } })).json()) as { id: number; version: number };
  const doc = { name: 'Bench: 200-step chain', targetAmount: '1 mol', marginalThreshold_kJ: -17, ...chain };
  const saved = await session.fetch(`/api/routes/${created.id}`, { method: 'PUT', body: { version: created.version, ...doc } });
  if (!saved.ok) throw new Error(`saving the bench route failed: ${saved.status} ${await saved.text()}`);
  return { id: created.id, doc };
}

export async function runRouteEndpointBench(baseUrl: string, { requests = 60 } = {}): Promise<Record<string, number>> {
  const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
  const session = await signInSession(baseUrl, designer.email, DEMO_PASSWORD);
  const { id, doc } = await createChainRoute(session);
  const evaluate = (body?: unknown) => session.fetch(`/api/routes/${id}/evaluate`, { method: 'POST', ...(body ? { body } : {}) });

  const edited = await timedRequests(requests, 'evaluate', (i) => {
    const steps = doc.steps.map((s, k) => (k === (i * 37) % doc.steps.length ? { ...s, temperature: `${450 + (i % 50)}.25 K` } : s));
    return evaluate({ ...doc, steps });
  });
  const saved = await timedRequests(requests, 'evaluate', () => evaluate());
  const coldRequests = Math.max(10, Math.floor(requests / 3));
  const cold = await timedRequests(coldRequests, 'evaluate', (i) => evaluate({ ...doc, ...syntheticChain(200, 0.001 * (i + 1)) }));
  return {
    route200_edit_http_p50_ms: round(percentile(edited, 50)),
    route200_edit_http_p95_ms: round(percentile(edited, 95)),
    route200_saved_http_p50_ms: round(percentile(saved, 50)),
    route200_saved_http_p95_ms: round(percentile(saved, 95)),
    route200_cold_http_p50_ms: round(percentile(cold, 50)),
    route200_cold_http_p95_ms: round(percentile(cold, 95)),
    route200_http_requests: edited.length + saved.length + cold.length,
  };
}
