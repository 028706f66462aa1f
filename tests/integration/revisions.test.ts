import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as compareRevisions } from '@/app/api/routes/[routeId]/revisions/compare/route';
import { POST as restoreRevision } from '@/app/api/routes/[routeId]/revisions/[revisionId]/restore/route';
import { GET as getRevision } from '@/app/api/routes/[routeId]/revisions/[revisionId]/route';
import { GET as listRevisions } from '@/app/api/routes/[routeId]/revisions/route';
import { POST as duplicate } from '@/app/api/routes/[routeId]/duplicate/route';
import { GET as getRoute, PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import { POST as createRoute } from '@/app/api/routes/route';
import type { RevisionDiff } from '@/lib/services/revisions/revision-diff';
import type { RevisionDto, RevisionSummaryDto } from '@/lib/services/revisions/revision-dto';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import type { RouteEvaluateResponse } from '@/lib/thermo/route';
import { makeRoleSet, SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

type Page<T> = { items: T[]; total: number; page: number; pageSize: number };
type SaveAnswer = { route: RouteDocumentDto; evaluation: RouteEvaluateResponse; revision: RevisionSummaryDto };
type DragAnswer = Omit<SaveAnswer, 'revision'> & { revision: RevisionSummaryDto | null };

async function newRoute(name: string): Promise<RouteDocumentDto> {
  const res = await callRoute(createRoute, { method: 'POST', userId: w.designerId, body: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  expect(res.status).toBe(201);
  return res.body as RouteDocumentDto;
}

function saveBody(route: { version: number; name: string }, patch: Record<string, unknown> = {}) {
  return { version: route.version, name: route.name, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS, ...patch };
}

async function save(routeId: number, body: unknown, userId = w.designerId): Promise<SaveAnswer> {
  const res = await callRoute(saveRoute, { method: 'PUT', userId, params: { routeId: String(routeId) }, body });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as SaveAnswer;
}

async function revisions(routeId: number, query = '', userId = w.reviewerId) {
  const res = await callRoute(listRevisions, { userId, params: { routeId: String(routeId) }, path: `/api/routes/${routeId}/revisions${query}` });
  return { status: res.status, page: res.body as Page<RevisionSummaryDto>, body: res.body };
}

const documentPart = (d: RouteDocumentDto) => ({ name: d.name, target: d.target, targetAmount: d.targetAmount, marginalThreshold_kJ: d.marginalThreshold_kJ, steps: d.steps, links: d.links });

describe('revisions: written by create and every save', () => {
  it('creating makes revision 1 "Created" by its author', async () => {
    const route = await newRoute('Kestrel methanol A');
    const { status, page } = await revisions(route.id);
    expect(status).toBe(200);
    expect(page.total).toBe(1);
    expect(page.items[0]).toMatchObject({ version: 1, summary: 'Created', author: { id: w.designerId }, overallDeltaG_kJ: null });
    expect(page.items[0]!.author.name).toMatch(/designer/);
  });

  it('a save writes a revision at the version it produced, with the ΔG of its own evaluation', async () => {
    const route = await newRoute('Kestrel methanol B');
    const saved = await save(route.id, saveBody(route));
    expect(saved.revision).toMatchObject({ version: route.version + 1 });
    expect(saved.revision.summary).toMatch(/^\+2 steps, \+2 links, ΔG overall now /);
    const one = await callRoute(getRevision, { userId: w.reviewerId, params: { routeId: String(route.id), revisionId: String(saved.revision.id) } });
    expect(one.status).toBe(200);
    const rev = one.body as RevisionDto;
    expect(rev.snapshot).toEqual(documentPart(saved.route));
    for (const step of saved.evaluation.steps) expect(rev.stepDeltaG[step.id]).toBe(step.result!.deltaG_kJ ?? step.result!.deltaG0_kJ);
    expect(rev.overallDeltaG_kJ).toBe(saved.evaluation.overall.deltaG_kJ);
    // CO(g) + 2 H2(g) -> CH3OH(g) at 298.15 K: ΔG° = ΔfG°(CH3OH, g) − ΔfG°(CO, g) = −162.3 − (−137.2) = −25.1 kJ/mol
    // (NIST-JANAF / CRC Handbook standard Gibbs energies of formation, from memory).
    expect(rev.stepDeltaG.s2).toBeCloseTo(-25.1, 0);
  });

  it('a refused save writes no revision', async () => {
    const route = await newRoute('Kestrel methanol C');
    await save(route.id, saveBody(route));
    const stale = await callRoute(saveRoute, { method: 'PUT', userId: w.leadId, params: { routeId: String(route.id) }, body: saveBody(route, { name: 'Late' }) });
    expect(stale.status).toBe(409);
    const bad = await callRoute(saveRoute, {
      method: 'PUT', userId: w.leadId, params: { routeId: String(route.id) }, body: saveBody({ ...route, version: route.version + 1 }, { links: [{ from: 's1', to: 'nope', species: 'CO(g)' }] }),
    });
    expect(bad.status).toBe(400);
    expect((await revisions(route.id)).page.total).toBe(2);
    expect(await getDb().models.RouteRevision.count({ where: { routeId: route.id } })).toBe(2);
  });

  it('a route saved before revisions existed (seeded rows) is compared against its saved rows', async () => {
    const route = await newRoute('Kestrel methanol seeded');
    const first = await save(route.id, saveBody(route));
    await getDb().models.RouteRevision.destroy({ where: { routeId: route.id } });
    const hotter = SAMPLE_STEPS.map((st) => (st.id === 's2' ? { ...st, temperature: '500 K' } : st));
    const next = await save(route.id, saveBody(first.route, { steps: hotter }));
    const before = first.evaluation.overall.deltaG_kJ;
    const after = next.evaluation.overall.deltaG_kJ;
    const kj = (x: number) => (Math.round(x * 10) / 10).toFixed(1).replace('-', '\u2212');
    expect(next.revision.summary).toBe(`T of Step 2 (methanol from carbon monoxide) 298.15 → 500 K, ΔG overall ${kj(before)} → ${kj(after)} kJ`);
  });

  it('moving nodes saves their places without a revision of its own; the next real save carries them', async () => {
    const route = await newRoute('Kestrel methanol moved');
    const first = await save(route.id, saveBody(route));
    const moved = SAMPLE_STEPS.map((st, i) => ({ ...st, position: { x: 40 + i * 310, y: 25 } }));
    const drag = (await save(route.id, saveBody(first.route, { steps: moved }))) as DragAnswer;
    expect(drag.revision).toBeNull();
    expect(drag.route.version).toBe(first.route.version + 1);
    expect(drag.route.steps.map((st) => st.position)).toEqual(moved.map((st) => st.position));
    expect((await revisions(route.id)).page.items.map((r) => r.version)).toEqual([first.route.version, route.version]);
    const hotter = moved.map((st) => (st.id === 's2' ? { ...st, temperature: '500 K' } : st));
    const next = await save(route.id, saveBody(drag.route, { steps: hotter }));
    expect(next.revision.summary).toMatch(/^T of Step 2 \(methanol from carbon monoxide\) 298\.15 → 500 K, 2 steps moved on the board, ΔG overall /);
    const rev = (await callRoute(getRevision, { userId: w.designerId, params: { routeId: String(route.id), revisionId: String(next.revision.id) } })).body as RevisionDto;
    expect(rev.snapshot.steps.map((st) => st.position)).toEqual(moved.map((st) => st.position));
  });

  it('a summary stored with step ids reads with labels from its own revision', async () => {
    const route = await newRoute('Kestrel methanol old summary');
    const saved = await save(route.id, saveBody(route));
    await getDb().models.RouteRevision.update({ summary: 'T of s2 298.15 → 500 K, moved s1, s2' }, { where: { id: saved.revision.id } });
    const expected = 'T of Step 2 (methanol from carbon monoxide) 298.15 → 500 K, moved Step 1 (steam reforming of methane), Step 2 (methanol from carbon monoxide)';
    expect((await revisions(route.id)).page.items[0]!.summary).toBe(expected);
    const one = (await callRoute(getRevision, { userId: w.reviewerId, params: { routeId: String(route.id), revisionId: String(saved.revision.id) } })).body as RevisionDto;
    expect(one.summary).toBe(expected);
  });

  it('lists newest first, a page at a time, and caps the page size', async () => {
    const route = await newRoute('Kestrel methanol D');
    const doc = (await save(route.id, saveBody(route))).route;
    await save(route.id, saveBody(doc, { name: 'Kestrel methanol D2' }));
    const all = await revisions(route.id);
    expect(all.page.items.map((r) => r.version)).toEqual([3, 2, 1]);
    expect(all.page.items[0]!.summary).toBe('renamed "Kestrel methanol D" → "Kestrel methanol D2"');
    const second = await revisions(route.id, '?pageSize=1&page=2');
    expect(second.page).toMatchObject({ total: 3, page: 2, pageSize: 1 });
    expect(second.page.items.map((r) => r.version)).toEqual([2]);
    expect(second.page.items[0]).not.toHaveProperty('snapshot');
    const big = await revisions(route.id, '?pageSize=101');
    expect(big.status).toBe(400);
    expect(errorOf(big.body).fields).toHaveProperty('pageSize');
  });

  it('duplicating makes the copy\'s revision 1 "Duplicated from <name>" with the source\'s energies', async () => {
    const route = await newRoute('Kestrel methanol E');
    const saved = await save(route.id, saveBody(route));
    const res = await callRoute(duplicate, { method: 'POST', userId: w.leadId, params: { routeId: String(route.id) }, body: { name: 'Kestrel methanol E, alt' } });
    expect(res.status).toBe(201);
    const copy = res.body as RouteDocumentDto;
    const list = await revisions(copy.id);
    expect(list.page.items).toHaveLength(1);
    expect(list.page.items[0]).toMatchObject({ version: copy.version, summary: 'Duplicated from Kestrel methanol E', author: { id: w.leadId } });
    const rev = (await callRoute(getRevision, { userId: w.leadId, params: { routeId: String(copy.id), revisionId: String(list.page.items[0]!.id) } })).body as RevisionDto;
    expect(rev.overallDeltaG_kJ).toBe(saved.revision.overallDeltaG_kJ);
    expect(rev.snapshot.steps).toEqual(saved.route.steps);
  });
});

describe('revisions: compare', () => {
  it('shows steps added and removed, changed fields with ΔG old → new, route fields and overall ΔG', async () => {
    const route = await newRoute('Kestrel methanol F');
    const first = await save(route.id, saveBody(route));
    const hotter = SAMPLE_STEPS.map((s) => (s.id === 's2' ? { ...s, temperature: '500 K' } : s));
    const shift = { id: 's3', equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)', temperature: '500 K', yieldPct: 100, notes: '', position: { x: 0, y: 200 } };
    const second = await save(route.id, saveBody(first.route, { marginalThreshold_kJ: -20, steps: [hotter[1], shift], links: [] }));
    const res = await callRoute(compareRevisions, {
      userId: w.reviewerId, params: { routeId: String(route.id) },
      path: `/api/routes/${route.id}/revisions/compare?from=${first.revision.id}&to=${second.revision.id}`,
    });
    expect(res.status).toBe(200);
    const { diff, from, to, stepLabels } = res.body as { diff: RevisionDiff; from: RevisionSummaryDto; to: RevisionSummaryDto; stepLabels: Record<string, string> };
    // Each step by its label: s2 and s3 as numbered now, s1 (removed) as it was numbered then.
    expect(stepLabels).toEqual({ s1: 'Step 1 (steam reforming of methane)', s2: 'Step 1 (methanol from carbon monoxide)', s3: 'Step 2 (water–gas shift)' });
    expect([from.id, to.id]).toEqual([first.revision.id, second.revision.id]);
    expect(diff.route).toEqual([{ field: 'marginalThreshold_kJ', from: -17, to: -20 }]);
    expect(diff.steps.added.map((s) => s.id)).toEqual(['s3']);
    expect(diff.steps.removed.map((s) => s.id)).toEqual(['s1']);
    const s2 = diff.steps.changed.find((c) => c.id === 's2')!;
    expect(s2.fields).toContainEqual({ field: 'temperature', from: '298.15 K', to: '500 K' });
    const oldS2 = first.evaluation.steps.find((s) => s.id === 's2')!.result!;
    const newS2 = second.evaluation.steps.find((s) => s.id === 's2')!.result!;
    expect(s2.deltaG_kJ).toEqual({ from: oldS2.deltaG_kJ ?? oldS2.deltaG0_kJ, to: newS2.deltaG_kJ ?? newS2.deltaG0_kJ });
    // 3 mol of gas become 1, so ΔS° < 0 and ΔG° = ΔH° − TΔS° rises with T (the Gibbs relation; no tabulated value needed).
    expect(s2.deltaG_kJ.to!).toBeGreaterThan(s2.deltaG_kJ.from!);
    expect(diff.links.removed).toEqual(SAMPLE_LINKS);
    expect(diff.overallDeltaG_kJ).toEqual({ from: first.evaluation.overall.deltaG_kJ, to: second.evaluation.overall.deltaG_kJ });
  });

  it('answers a missing or foreign revision id with 400 or 404, never 5xx', async () => {
    const a = await newRoute('Kestrel methanol G');
    const b = await newRoute('Kestrel methanol H');
    const revA = (await revisions(a.id)).page.items[0]!.id;
    const revB = (await revisions(b.id)).page.items[0]!.id;
    const compare = (query: string, userId = w.reviewerId, routeId = a.id) =>
      callRoute(compareRevisions, { userId, params: { routeId: String(routeId) }, path: `/api/routes/${routeId}/revisions/compare${query}` });
    const missing = await compare(`?from=${revA}`);
    expect(missing.status).toBe(400);
    expect(errorOf(missing.body).fields).toHaveProperty('to');
    expect((await compare('?from=abc&to=1')).status).toBe(400);
    expect((await compare(`?from=${revA}&to=${revB}`)).status).toBe(404);
    expect((await compare(`?from=${revA}&to=${revA}`, w.foreignId)).status).toBe(404);
    const get = (routeId: number, revisionId: string, userId = w.reviewerId) => callRoute(getRevision, { userId, params: { routeId: String(routeId), revisionId } });
    expect((await get(a.id, String(revB))).status).toBe(404);
    expect((await get(a.id, 'x')).status).toBe(404);
    expect((await get(a.id, '999999')).status).toBe(404);
    expect((await get(a.id, String(revA), w.foreignId)).status).toBe(404);
  });
});

describe('revisions: restore', () => {
  it('saves the snapshot as a new revision, round-trips exactly, and deletes nothing', async () => {
    const route = await newRoute('Kestrel methanol J');
    const withPressures = SAMPLE_STEPS.map((s, i) => ({ ...s, pressures: { 'H2(g)': `${10 + i} bar` }, heatCapacity: true, notes: `note ${i}`, position: { x: i * 123.5, y: -7.25 } }));
    const target = await save(route.id, saveBody(route, { steps: withPressures, targetAmount: '2.5 mol', marginalThreshold_kJ: -12 }));
    const later = await save(route.id, saveBody(target.route, { name: 'Kestrel methanol J, later', steps: [SAMPLE_STEPS[0]], links: [] }));
    const before = (await revisions(route.id)).page.total;

    const params = { routeId: String(route.id), revisionId: String(target.revision.id) };
    const res = await callRoute(restoreRevision, { method: 'POST', userId: w.designerId, params, body: { version: later.route.version } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const restored = res.body as SaveAnswer;
    expect(restored.route.version).toBe(later.route.version + 1);
    expect(restored.revision.summary).toMatch(new RegExp(`^Restored revision ${target.revision.version}: `));
    expect(restored.revision.restoredFromId).toBe(target.revision.id);

    const snapshot = ((await callRoute(getRevision, { userId: w.designerId, params })).body as RevisionDto).snapshot;
    const now = (await callRoute(getRoute, { userId: w.designerId, params: { routeId: String(route.id) } })).body as RouteDocumentDto;
    expect(documentPart(now)).toEqual(snapshot);
    expect((await revisions(route.id)).page.total).toBe(before + 1);
    const latest = ((await callRoute(getRevision, { userId: w.designerId, params: { routeId: String(route.id), revisionId: String(restored.revision.id) } })).body as RevisionDto);
    expect(latest.snapshot).toEqual(snapshot);
    expect(latest.overallDeltaG_kJ).toBe(target.revision.overallDeltaG_kJ);
  });

  it('answers a stale version with 409 and the current version, and a bad body with 400', async () => {
    const route = await newRoute('Kestrel methanol K');
    const saved = await save(route.id, saveBody(route));
    const first = (await revisions(route.id)).page.items.at(-1)!;
    const params = { routeId: String(route.id), revisionId: String(first.id) };
    const stale = await callRoute(restoreRevision, { method: 'POST', userId: w.leadId, params, body: { version: route.version } });
    expect(stale.status).toBe(409);
    expect((stale.body as { error: { details: { currentVersion: number } } }).error.details.currentVersion).toBe(saved.route.version);
    expect((await callRoute(restoreRevision, { method: 'POST', userId: w.leadId, params, body: {} })).status).toBe(400);
    expect((await callRoute(restoreRevision, { method: 'POST', userId: w.leadId, params, body: { version: 'x', extra: 1 } })).status).toBe(400);
    expect((await callRoute(restoreRevision, { method: 'POST', userId: w.reviewerId, params, body: { version: saved.route.version } })).status).toBe(403);
    expect((await revisions(route.id)).page.total).toBe(2);
  });
});
