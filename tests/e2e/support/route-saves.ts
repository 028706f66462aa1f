// Saving routes over HTTP for the concurrency and crash specs, and reading back which versions became revisions.
import type { Session } from '../../../bench/support/http-session';

export const SAVE_STEPS = (marker: number) => [
  { id: 's1', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: `${900 + (marker % 300)} K`, yieldPct: 100, notes: `save ${marker}`, position: { x: 0, y: 0 } },
  { id: 's2', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '298.15 K', yieldPct: 100, notes: '', position: { x: 300, y: 0 } },
];
const LINKS = [{ from: 's1', to: 's2', species: 'CO(g)' }];

export async function createRoute(session: Session, name: string): Promise<{ id: number; version: number }> {
  const res = await session.fetch('/api/routes', { method: 'POST', body: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  if (res.status !== 201) throw new Error(`creating ${name}: ${res.status} ${await res.text()}`);
  return (await res.json()) as { id: number; version: number };
}

export type SaveOutcome = { kind: 'saved'; version: number } | { kind: 'stale'; code: string } | { kind: 'other'; status: number; text: string };

/** How long a save may take before the spec calls it hung: a user would have given up long before. */
export const SAVE_DEADLINE_MS = 15_000;

/** One whole-document save against `version`: saved (with the new version), stale (409) or anything else. */
export async function saveRoute(session: Session, routeId: number, version: number, marker: number): Promise<SaveOutcome> {
  let timer: NodeJS.Timeout | undefined;
  const deadline = new Promise<null>((resolve) => (timer = setTimeout(() => resolve(null), SAVE_DEADLINE_MS)));
  const put = session
    .fetch(`/api/routes/${routeId}`, {
      method: 'PUT',
      body: { version, name: `Contended route, save ${marker}`, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAVE_STEPS(marker), links: LINKS },
    })
    .then(async (res) => ({ res, text: await res.text() }));
  const answered = await Promise.race([put, deadline]).finally(() => clearTimeout(timer));
  if (!answered) return { kind: 'other', status: 0, text: `no answer within ${SAVE_DEADLINE_MS} ms` };
  const { res, text } = answered;
  if (res.status === 200) return { kind: 'saved', version: (JSON.parse(text) as { route: { version: number } }).route.version };
  if (res.status === 409) return { kind: 'stale', code: (JSON.parse(text) as { error: { code: string } }).error.code };
  return { kind: 'other', status: res.status, text };
}

export async function currentVersion(session: Session, routeId: number): Promise<number> {
  const res = await session.fetch(`/api/routes/${routeId}`);
  if (!res.ok) throw new Error(`reading route ${routeId}: ${res.status}`);
  return ((await res.json()) as { version: number }).version;
}

/** Every revision's version for a route, through the paged revisions endpoint. */
export async function revisionVersions(session: Session, routeId: number): Promise<number[]> {
  const versions: number[] = [];
  for (let page = 1; ; page += 1) {
    const res = await session.fetch(`/api/routes/${routeId}/revisions?page=${page}&pageSize=100`);
    if (!res.ok) throw new Error(`reading revisions of ${routeId}: ${res.status}`);
    const body = (await res.json()) as { items: Array<{ version: number }>; total: number };
    versions.push(...body.items.map((i) => i.version));
    if (body.items.length === 0 || versions.length >= body.total) return versions.sort((a, b) => a - b);
  }
}
