import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as activity } from '@/app/api/routes/[routeId]/activity/route';
import { DELETE as removeComment, PATCH as editComment } from '@/app/api/routes/[routeId]/comments/[commentId]/route';
import { POST as resolveThread } from '@/app/api/routes/[routeId]/comments/[commentId]/resolve/route';
import { POST as postComment } from '@/app/api/routes/[routeId]/comments/route';
import { POST as clearFlag } from '@/app/api/routes/[routeId]/flags/[flagId]/clear/route';
import { POST as raiseFlag } from '@/app/api/routes/[routeId]/flags/route';
import { DELETE as deleteRoute, PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import { POST as transition } from '@/app/api/routes/[routeId]/transitions/route';
import type { ActivityItem, ActivityPageDto } from '@/lib/schemas/activity';
import type { CommentDto } from '@/lib/schemas/comment';
import type { FlagDto } from '@/lib/schemas/flag';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { makeOwnedRoute, makeReviewTeam, startMailbox, type ReviewTeam } from './support/review-team';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let smtp: { close: () => Promise<void> };
let team: ReviewTeam;
let route: RouteDocumentDto;
let feed: ActivityItem[] = [];
const made: Record<string, number> = {};

// Each step lands in a later millisecond than the one before, so the expected order is the order of the steps.
const tick = () => new Promise((resolve) => setTimeout(resolve, 3));
const params = (extra: Record<string, string> = {}) => ({ routeId: String(route.id), ...extra });
const ok = async <T>(res: Promise<{ status: number; body: unknown }>, status = 200): Promise<T> => {
  const r = await res;
  expect(r.status, JSON.stringify(r.body)).toBe(status);
  await tick();
  return r.body as T;
};
const read = (userId: number | null, query = '') => callRoute(activity, { userId, path: `/api/routes/${route.id}/activity${query}`, params: params() });

const LONG_BODY =
  '**Is 1100 K** really needed on `s1`? The [steam reforming](https://example.test/reforming) step is strongly uphill below about 900 K, ' +
  'so the temperature is right, but please check the furnace rating and the nickel catalyst life at that duty before we go further.';

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  smtp = await startMailbox();
  team = await makeReviewTeam();
  route = await makeOwnedRoute(team, team.designerId); // revisions 1 (create) and 2 (first save)
  await tick();

  const send = await ok<{ route: { version: number }; transition: { id: number } }>(
    callRoute(transition, { method: 'POST', userId: team.designerId, params: params(), body: { to: 'in_review', version: route.version, note: 'Ready for a look.', reviewerIds: [team.reviewerId] } }),
  );
  made.sendId = send.transition.id;
  const root = await ok<CommentDto>(callRoute(postComment, { method: 'POST', userId: team.reviewerId, params: params(), body: { body: LONG_BODY, stepKey: 's1' } }), 201);
  made.rootId = root.id;
  const reply = await ok<CommentDto>(callRoute(postComment, { method: 'POST', userId: team.designerId, params: params(), body: { body: 'Rated to 1150 K; _checked_ today.', parentId: root.id } }), 201);
  made.replyId = reply.id;
  await ok(callRoute(editComment, { method: 'PATCH', userId: team.designerId, params: params({ commentId: String(reply.id) }), body: { body: 'Rated to 1150 K; *checked* with the vendor today.' } }));
  const flag = await ok<FlagDto>(callRoute(raiseFlag, { method: 'POST', userId: team.reviewerId, params: params(), body: { stepKey: 's2', category: 'safety', reason: 'Methanol vapour at the outlet: check venting.' } }), 201);
  made.flagId = flag.id;
  await ok(callRoute(resolveThread, { method: 'POST', userId: team.leadId, params: params({ commentId: String(root.id) }), body: { resolved: true } }));
  await ok(callRoute(resolveThread, { method: 'POST', userId: team.reviewerId, params: params({ commentId: String(root.id) }), body: { resolved: false } }));
  const stray = await ok<CommentDto>(callRoute(postComment, { method: 'POST', userId: team.reviewerId, params: params(), body: { body: 'Secret draft thought.' } }), 201);
  made.strayId = stray.id;
  await ok(callRoute(removeComment, { method: 'DELETE', userId: team.reviewerId, params: params({ commentId: String(stray.id) }) }));
  const cleared = await ok<{ comment: CommentDto }>(callRoute(clearFlag, { method: 'POST', userId: team.designerId, params: params({ flagId: String(flag.id) }), body: { comment: 'Vent line added to the outlet.' } }));
  made.clearCommentId = cleared.comment.id;
  await ok(callRoute(transition, { method: 'POST', userId: team.leadId, params: params(), body: { to: 'approved', version: send.route.version } }));
  // Editing the approved route saves a revision and moves it back to draft, in one transaction.
  await ok(
    callRoute(saveRoute, {
      method: 'PUT', userId: team.designerId, params: params(),
      body: { version: send.route.version + 1, name: route.name, target: route.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS.map((s) => ({ ...s, notes: 'Vent line on the outlet.' })), links: SAMPLE_LINKS },
    }),
  );

  const res = await read(team.reviewerId, '?limit=100');
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  feed = (res.body as ActivityPageDto).items;
});
afterAll(async () => {
  await smtp.close();
  await teardownTestDb(dir);
});

describe('the activity feed', () => {
  it('merges every kind of event into one list, newest first', () => {
    expect(feed.map((i) => i.kind)).toEqual([
      'transition', // approved → draft on edit (written after its revision)
      'revision',
      'transition', // approved
      'flag_cleared', // written after the clearing comment
      'comment',
      'comment', // the deleted one
      'thread_reopened',
      'thread_resolved',
      'flag_raised',
      'comment', // reply
      'comment', // thread start
      'transition', // sent for review
      'revision',
      'revision',
    ]);
    const times = feed.map((i) => Date.parse(i.at));
    expect(times).toEqual([...times].sort((a, b) => b - a));
    expect(new Set(feed.map((i) => i.id)).size).toBe(feed.length);
  });

  it('names who did what, and carries each kind’s own fields', () => {
    const [backToDraft, lastSave, approval, clear, clearComment, deleted, reopened, resolved, raised, reply, root, send, firstSave, created] = feed as [ActivityItem, ...ActivityItem[]];
    expect(backToDraft).toMatchObject({ kind: 'transition', from: 'approved', to: 'draft', actor: { id: team.designerId, name: 'Baptiste Osei' }, stepKey: null, reviewers: [] });
    expect(backToDraft!.text).toMatch(/^Edited after approval/);
    expect(lastSave).toMatchObject({ kind: 'revision', actor: { id: team.designerId, name: 'Baptiste Osei' }, version: 5, restoredFromId: null });
    expect(lastSave!.text).toBe((lastSave as { summary: string }).summary);
    expect(approval).toMatchObject({ kind: 'transition', from: 'in_review', to: 'approved', actor: { id: team.leadId, name: 'Ottilie Marchetti' }, note: '' });
    expect(clear).toMatchObject({ kind: 'flag_cleared', flagId: made.flagId, category: 'safety', stepKey: 's2', actor: { name: 'Baptiste Osei' }, clearCommentId: made.clearCommentId, text: 'Methanol vapour at the outlet: check venting.' });
    expect(clearComment).toMatchObject({ kind: 'comment', commentId: made.clearCommentId, stepKey: 's2', text: 'Vent line added to the outlet.', isReply: false });
    expect(deleted).toMatchObject({ kind: 'comment', commentId: made.strayId, isDeleted: true, text: '', actor: { name: 'Hanne Vasquez-Lind' } });
    expect(reopened).toMatchObject({ kind: 'thread_reopened', threadId: made.rootId, stepKey: 's1', actor: { id: team.reviewerId, name: 'Hanne Vasquez-Lind' } });
    expect(resolved).toMatchObject({ kind: 'thread_resolved', threadId: made.rootId, stepKey: 's1', actor: { id: team.leadId, name: 'Ottilie Marchetti' } });
    expect(raised).toMatchObject({ kind: 'flag_raised', flagId: made.flagId, category: 'safety', reason: 'Methanol vapour at the outlet: check venting.', stepKey: 's2', actor: { name: 'Hanne Vasquez-Lind' } });
    expect(reply).toMatchObject({ kind: 'comment', commentId: made.replyId, threadId: made.rootId, isReply: true, isEdited: true, stepKey: 's1', text: 'Rated to 1150 K; checked with the vendor today.' });
    expect(root).toMatchObject({ kind: 'comment', commentId: made.rootId, threadId: made.rootId, isReply: false, isEdited: false, isDeleted: false, actor: { name: 'Hanne Vasquez-Lind' } });
    expect(send).toMatchObject({ kind: 'transition', transitionId: made.sendId, from: 'draft', to: 'in_review', note: 'Ready for a look.', text: 'Ready for a look.', reviewers: [{ id: team.reviewerId, name: 'Hanne Vasquez-Lind' }] });
    expect(firstSave).toMatchObject({ kind: 'revision', version: 2 });
    expect(created).toMatchObject({ kind: 'revision', version: 1, actor: { id: team.designerId } });
  });

  it('gives a comment as a plain-text excerpt of about 160 characters', () => {
    const root = feed.find((i) => i.kind === 'comment' && i.commentId === made.rootId)!;
    expect(root.text.length).toBeLessThanOrEqual(160);
    expect(root.text.startsWith('Is 1100 K really needed on s1? The steam reforming step is strongly uphill')).toBe(true);
    expect(root.text.endsWith('…')).toBe(true);
    expect(root.text).not.toMatch(/[*`[\]]|https?:/);
  });
});

describe('keyset pages', () => {
  it('walks the whole feed in pages of 4 by nextBefore, each item once and in the same order', async () => {
    const seen: string[] = [];
    let before: string | null = null;
    for (let guard = 0; guard < 10; guard += 1) {
      const res = await read(team.leadId, `?limit=4${before ? `&before=${encodeURIComponent(before)}` : ''}`);
      expect(res.status).toBe(200);
      const page = res.body as ActivityPageDto;
      expect(page.items.length).toBeLessThanOrEqual(4);
      seen.push(...page.items.map((i) => i.id));
      before = page.nextBefore;
      if (!before) break;
    }
    expect(seen).toEqual(feed.map((i) => i.id));
  });

  it('takes a plain ISO time as before: only what happened strictly earlier', async () => {
    const send = feed.find((i) => i.kind === 'transition' && i.to === 'in_review')!;
    const res = await read(team.designerId, `?before=${encodeURIComponent(send.at)}`);
    expect(res.status).toBe(200);
    const items = (res.body as ActivityPageDto).items;
    expect(items.map((i) => i.kind)).toEqual(['revision', 'revision']);
    expect((res.body as ActivityPageDto).nextBefore).toBeNull();
  });

  it.each([['?before=last-tuesday'], ['?before=2026-12-02T09:00:00'], ['?limit=101'], ['?limit=0'], ['?limit=ten']])('answers 400 with the field for %s', async (query) => {
    const res = await read(team.leadId, query);
    expect(res.status).toBe(400);
    expect(errorOf(res.body).code).toBe('VALIDATION');
    expect(Object.keys(errorOf(res.body).fields ?? {})).toHaveLength(1);
  });
});

describe('who may read it', () => {
  it('every member of the team may; anonymous callers get 401, another team 404', async () => {
    for (const userId of [team.reviewerId, team.designerId, team.leadId]) expect((await read(userId, '?limit=1')).status).toBe(200);
    expect((await read(null)).status).toBe(401);
    const foreign = await read(team.outsiderId);
    expect(foreign.status).toBe(404);
    expect(errorOf(foreign.body).code).toBe('NOT_FOUND');
  });

  it('a missing or malformed route id is 404', async () => {
    for (const routeId of ['999999', 'abc', '0']) {
      const res = await callRoute(activity, { userId: team.leadId, params: { routeId } });
      expect(res.status).toBe(404);
    }
  });

  it('a deleted route has no feed, not even for the lead', async () => {
    const other = await makeOwnedRoute(team, team.designerId);
    const call = () => callRoute(activity, { userId: team.leadId, params: { routeId: String(other.id) } });
    expect((await call()).status).toBe(200);
    expect((await callRoute(deleteRoute, { method: 'DELETE', userId: team.designerId, params: { routeId: String(other.id) } })).status).toBe(200);
    expect((await call()).status).toBe(404);
  });

  it('shows only this route’s events', async () => {
    const other = await makeOwnedRoute(team, team.leadId);
    const res = await callRoute(activity, { userId: team.reviewerId, params: { routeId: String(other.id) } });
    expect((res.body as ActivityPageDto).items.map((i) => i.kind)).toEqual(['revision', 'revision']);
  });
});

describe('how it names steps', () => {
  it('a save summary stored with step ids reads with labels from that revision\'s document', async () => {
    const { getDb } = await import('@/db');
    const other = await makeOwnedRoute(team, team.designerId);
    const { RouteRevision } = getDb().models;
    const latest = await RouteRevision.findOne({ where: { routeId: other.id }, order: [['version', 'DESC']] });
    await latest!.update({ summary: 'T of s2 298.15 → 500 K, moved s1' });
    const res = await callRoute(activity, { userId: team.reviewerId, params: { routeId: String(other.id) } });
    const save = (res.body as ActivityPageDto).items.find((i) => i.kind === 'revision' && i.version === latest!.version)!;
    const expected = 'T of Step 2 (methanol from carbon monoxide) 298.15 → 500 K, moved Step 1 (steam reforming of methane)';
    expect(save.text).toBe(expected);
    expect((save as { summary: string }).summary).toBe(expected);
  });
});
