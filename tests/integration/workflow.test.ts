import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { POST as evaluate } from '@/app/api/routes/[routeId]/evaluate/route';
import { POST as duplicate } from '@/app/api/routes/[routeId]/duplicate/route';
import { GET as listRevisions } from '@/app/api/routes/[routeId]/revisions/route';
import { DELETE as deleteRoute, GET as getRoute, PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import { GET as listTransitions, POST as transition } from '@/app/api/routes/[routeId]/transitions/route';
import { POST as undelete } from '@/app/api/routes/[routeId]/undelete/route';
import { GET as listRoutes } from '@/app/api/routes/route';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import type { TransitionDto, TransitionOutcome } from '@/lib/services/workflow/transition-dto';
import { addMember, makeRoleSet, makeRoute, SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

type Role = 'reviewer' | 'designer' | 'lead';
type Status = 'draft' | 'in_review' | 'changes_requested' | 'approved' | 'shelved';
const STATUSES: Status[] = ['draft', 'in_review', 'changes_requested', 'approved', 'shelved'];
const ROLES: Role[] = ['reviewer', 'designer', 'lead'];

// The review rules as the product states them, written out here independently of the service's table.
const RULES: Record<string, Role[]> = {
  'draft>in_review': ['designer', 'lead'],
  'changes_requested>in_review': ['designer', 'lead'],
  'in_review>changes_requested': ['reviewer', 'lead'],
  'in_review>approved': ['lead'],
  'draft>shelved': ['lead'],
  'in_review>shelved': ['lead'],
  'changes_requested>shelved': ['lead'],
  'approved>shelved': ['lead'],
  'shelved>draft': ['lead'],
};

const userOf = (role: Role) => ({ reviewer: w.reviewerId, designer: w.designerId, lead: w.leadId })[role];

// Test setup: put a fresh route straight into a status.
async function routeIn(status: Status) {
  const route = await makeRoute(w.teamId, w.designerId, false);
  await getDb().models.Route.update({ status }, { where: { id: route.id } });
  return route;
}

function bodyFor(to: Status, caller: number, version: number) {
  const reviewer = caller === w.reviewerId ? w.leadId : w.reviewerId;
  return { to, version, note: to === 'changes_requested' ? 'Check the s2 temperature.' : '', ...(to === 'in_review' ? { reviewerIds: [reviewer] } : {}) };
}

const post = (routeId: number, userId: number, body: unknown) => callRoute(transition, { method: 'POST', userId, params: { routeId: String(routeId) }, body });

describe('workflow: every (from, to) pair for every role', () => {
  for (const from of STATUSES) {
    for (const to of STATUSES) {
      it(`${from} → ${to}`, async () => {
        const rule = RULES[`${from}>${to}`];
        for (const role of ROLES) {
          const route = await routeIn(from);
          const res = await post(route.id, userOf(role), bodyFor(to, userOf(role), route.version));
          const expected = !rule ? 409 : rule.includes(role) ? 200 : 403;
          expect(res.status, `${role}: ${JSON.stringify(res.body)}`).toBe(expected);
          const row = await getDb().models.Route.findByPk(route.id);
          const recorded = await getDb().models.RouteTransition.count({ where: { routeId: route.id } });
          if (expected === 200) {
            expect(row!.status).toBe(to);
            expect(row!.version).toBe(route.version + 1);
            expect(recorded).toBe(1);
            expect((res.body as TransitionOutcome).transition).toMatchObject({ from, to, actor: { id: userOf(role) } });
            // An approval is of a thermodynamic screen only, and the answer says so.
            if (to === 'approved') expect((res.body as TransitionOutcome).caution).toMatch(/rates.*runaway.*toxicity/);
            else expect(res.body).not.toHaveProperty('caution');
          } else {
            expect(row!.status).toBe(from);
            expect(recorded).toBe(0);
          }
          if (expected === 409) expect(errorOf(res.body).message).toContain(`This route is ${from.replace('_', ' ')}`);
        }
      });
    }
  }
});

describe('workflow: moves and their checks', () => {
  it('names the current status and the allowed moves when a move is not possible', async () => {
    const route = await routeIn('approved');
    const res = await post(route.id, w.designerId, bodyFor('in_review', w.designerId, route.version));
    expect(res.status).toBe(409);
    expect(errorOf(res.body).message).toBe('This route is approved, so it cannot move to in review. From approved it can move to shelved; your role cannot move it from here.');
    const lead = await post(route.id, w.leadId, bodyFor('draft', w.leadId, route.version));
    expect(errorOf(lead.body).message).toMatch(/you can move it to shelved\.$/);
    expect((lead.body as { error: { details: { status: string; allowed: string[] } } }).error.details).toEqual({ status: 'approved', allowed: ['shelved'] });
  });

  it('checks the named reviewers: at least one, team members, not the caller, each once', async () => {
    const route = await routeIn('draft');
    const outsider = await addMember(w.foreignTeamId, 'reviewer');
    for (const reviewerIds of [undefined, [], [w.designerId], [outsider], [w.reviewerId, w.reviewerId]]) {
      const res = await post(route.id, w.designerId, { to: 'in_review', version: route.version, ...(reviewerIds ? { reviewerIds } : {}) });
      expect(res.status, JSON.stringify(reviewerIds)).toBe(400);
      expect(errorOf(res.body).fields).toHaveProperty('reviewerIds');
    }
    const elsewhere = await routeIn('in_review');
    const shelve = await post(elsewhere.id, w.leadId, { to: 'shelved', version: elsewhere.version, reviewerIds: [w.reviewerId] });
    expect(shelve.status).toBe(400);
    expect(await getDb().models.RouteTransition.count({ where: { routeId: route.id } })).toBe(0);
  });

  it('requires a note to request changes, caps it at 2,000 characters, and refuses unknown statuses', async () => {
    const route = await routeIn('in_review');
    const noNote = await post(route.id, w.reviewerId, { to: 'changes_requested', version: route.version, note: '   ' });
    expect(noNote.status).toBe(400);
    expect(errorOf(noNote.body).fields).toHaveProperty('note');
    const long = await post(route.id, w.reviewerId, { to: 'changes_requested', version: route.version, note: 'x'.repeat(2001) });
    expect(long.status).toBe(400);
    expect(errorOf(long.body).fields).toHaveProperty('note');
    expect((await post(route.id, w.reviewerId, { to: 'published', version: route.version })).status).toBe(400);
    expect((await post(route.id, w.reviewerId, { to: 'approved' })).status).toBe(400);
    expect((await post(route.id, w.reviewerId, { to: 'changes_requested', version: route.version, note: 'x'.repeat(2000) })).status).toBe(200);
  });

  it('refuses a move made from a stale view with 409 and the current version', async () => {
    const route = await routeIn('draft');
    const first = await post(route.id, w.designerId, bodyFor('in_review', w.designerId, route.version));
    expect(first.status).toBe(200);
    const stale = await post(route.id, w.leadId, { to: 'approved', version: route.version, note: '' });
    expect(stale.status).toBe(409);
    expect((stale.body as { error: { details: { currentVersion: number } } }).error.details.currentVersion).toBe(route.version + 1);
  });

  it('returns what a notifier needs, and lists the history newest first with names', async () => {
    const route = await routeIn('draft');
    const extra = await addMember(w.teamId, 'reviewer');
    const submit = await post(route.id, w.designerId, { to: 'in_review', version: route.version, note: 'Ready for a look.', reviewerIds: [extra, w.reviewerId] });
    const submitted = submit.body as TransitionOutcome;
    expect(submitted).toMatchObject({
      route: { id: route.id, teamId: w.teamId, status: 'in_review', version: route.version + 1 },
      transition: { from: 'draft', to: 'in_review', actor: { id: w.designerId }, note: 'Ready for a look.' },
      reviewerIds: [extra, w.reviewerId],
      submitterId: w.designerId,
    });
    const ask = await post(route.id, w.reviewerId, { to: 'changes_requested', version: route.version + 1, note: 'Raise s1 pressure.' });
    expect(ask.body).toMatchObject({ transition: { from: 'in_review', to: 'changes_requested', reviewers: [] }, reviewerIds: [extra, w.reviewerId], submitterId: w.designerId });

    const list = await callRoute(listTransitions, { userId: w.reviewerId, params: { routeId: String(route.id) }, path: `/api/routes/${route.id}/transitions` });
    expect(list.status).toBe(200);
    const items = (list.body as { items: TransitionDto[]; total: number }).items;
    expect(items.map((t) => t.to)).toEqual(['changes_requested', 'in_review']);
    expect(items[1]!.reviewers.map((r) => r.id)).toEqual([w.reviewerId, extra].sort((a, b) => a - b));
    expect(items[1]!.reviewers.every((r) => r.name !== '—')).toBe(true);
    expect(items[0]!.actor.name).toMatch(/reviewer/);
    const foreign = await callRoute(listTransitions, { userId: w.foreignId, params: { routeId: String(route.id) } });
    expect(foreign.status).toBe(404);
  });

  it('sends an approved route back to draft when it is edited, recording why in the same save', async () => {
    const route = await routeIn('approved');
    const body = { version: route.version, name: route.name, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS };
    const res = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body });
    expect(res.status).toBe(200);
    const saved = res.body as { route: RouteDocumentDto; transition: TransitionOutcome };
    expect(saved.route.status).toBe('draft');
    expect(saved.transition.transition).toMatchObject({ from: 'approved', to: 'draft', actor: { id: w.designerId } });
    expect(saved.transition.transition.note).toMatch(/edited after approval/i);
    const rows = await getDb().models.RouteTransition.findAll({ where: { routeId: route.id } });
    expect(rows.map((r) => [r.fromStatus, r.toStatus, r.routeVersion])).toEqual([['approved', 'draft', saved.route.version]]);
    const again = await callRoute(saveRoute, { method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) }, body: { ...body, version: saved.route.version } });
    expect((again.body as { transition: unknown }).transition).toBeNull();
  });
});

describe('soft delete', () => {
  const p = (id: number) => ({ routeId: String(id) });

  it('hides a deleted route from the list, reading, saving, evaluating and every route handler', async () => {
    const route = await makeRoute(w.teamId, w.designerId);
    expect((await callRoute(deleteRoute, { method: 'DELETE', userId: w.reviewerId, params: p(route.id) })).status).toBe(403);
    const res = await callRoute(deleteRoute, { method: 'DELETE', userId: w.designerId, params: p(route.id) });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: route.id, deleted: true });
    const list = (await callRoute(listRoutes, { userId: w.leadId, path: '/api/routes?pageSize=100' })).body as { items: { id: number }[] };
    expect(list.items.map((i) => i.id)).not.toContain(route.id);
    const save = { version: route.version, name: route.name, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS };
    const calls = [
      callRoute(getRoute, { userId: w.leadId, params: p(route.id) }),
      callRoute(saveRoute, { method: 'PUT', userId: w.leadId, params: p(route.id), body: save }),
      callRoute(evaluate, { method: 'POST', userId: w.leadId, params: p(route.id) }),
      callRoute(duplicate, { method: 'POST', userId: w.leadId, params: p(route.id), body: {} }),
      callRoute(listRevisions, { userId: w.leadId, params: p(route.id) }),
      callRoute(listTransitions, { userId: w.leadId, params: p(route.id) }),
      callRoute(transition, { method: 'POST', userId: w.leadId, params: p(route.id), body: { to: 'shelved', version: route.version } }),
      callRoute(deleteRoute, { method: 'DELETE', userId: w.leadId, params: p(route.id) }),
    ];
    for (const r of await Promise.all(calls)) expect(r.status).toBe(404);
    expect(await getDb().models.Step.count({ where: { routeId: route.id } })).toBe(2);
  });

  it('lists recently deleted routes with who and when, for a lead only', async () => {
    const route = await makeRoute(w.teamId, w.designerId, false);
    await callRoute(deleteRoute, { method: 'DELETE', userId: w.designerId, params: p(route.id) });
    const res = await callRoute(listRoutes, { userId: w.leadId, path: '/api/routes?deleted=1' });
    expect(res.status).toBe(200);
    const item = (res.body as { items: { id: number; deletedBy: string; deletedAt: string; restorableUntil: string }[] }).items.find((i) => i.id === route.id)!;
    expect(item.deletedBy).toMatch(/designer/);
    expect(Date.parse(item.restorableUntil) - Date.parse(item.deletedAt)).toBe(30 * 86_400_000);
    for (const userId of [w.designerId, w.reviewerId]) expect((await callRoute(listRoutes, { userId, path: '/api/routes?deleted=1' })).status).toBe(403);
    const foreign = (await callRoute(listRoutes, { userId: w.foreignId, path: '/api/routes?deleted=1' })).body as { items: { id: number }[] };
    expect(foreign.items.map((i) => i.id)).not.toContain(route.id);
  });

  it('brings a route back within 30 days (lead only), and refuses after', async () => {
    const route = await makeRoute(w.teamId, w.designerId, false);
    await callRoute(deleteRoute, { method: 'DELETE', userId: w.designerId, params: p(route.id) });
    expect((await callRoute(undelete, { method: 'POST', userId: w.designerId, params: p(route.id) })).status).toBe(403);
    expect((await callRoute(undelete, { method: 'POST', userId: w.foreignId, params: p(route.id) })).status).toBe(404);
    expect((await callRoute(undelete, { method: 'POST', userId: w.leadId, params: p(route.id) })).status).toBe(200);
    expect((await callRoute(getRoute, { userId: w.reviewerId, params: p(route.id) })).status).toBe(200);
    const twice = await callRoute(undelete, { method: 'POST', userId: w.leadId, params: p(route.id) });
    expect(twice.status).toBe(409);

    await callRoute(deleteRoute, { method: 'DELETE', userId: w.leadId, params: p(route.id) });
    await getDb().models.Route.update({ deletedAt: new Date(Date.now() - 31 * 86_400_000) }, { where: { id: route.id } });
    const late = await callRoute(undelete, { method: 'POST', userId: w.leadId, params: p(route.id) });
    expect(late.status).toBe(410);
    expect(errorOf(late.body).message).toMatch(/more than 30 days ago/);
    const recent = (await callRoute(listRoutes, { userId: w.leadId, path: '/api/routes?deleted=1&pageSize=100' })).body as { items: { id: number }[] };
    expect(recent.items.map((i) => i.id)).not.toContain(route.id);
    expect((await callRoute(undelete, { method: 'POST', userId: w.leadId, params: { routeId: 'abc' } })).status).toBe(404);
  });
});
