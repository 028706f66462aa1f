import { describe, expect, it } from 'vitest';
import { DELETE as deleteComment, PATCH as editComment } from '@/app/api/routes/[routeId]/comments/[commentId]/route';
import { POST as resolveThread } from '@/app/api/routes/[routeId]/comments/[commentId]/resolve/route';
import { GET as listComments, POST as postComment } from '@/app/api/routes/[routeId]/comments/route';
import type { CommentDto, CommentListDto, ThreadDto } from '@/lib/schemas/comment';
import { getRoute } from '@/lib/services/routes/get-route';
import { saveRoute } from '@/lib/services/routes/save-route';
import { callRoute, errorOf } from './support/http';
import { makeOwnedRoute, type ReviewTeam, withReviewWorld } from './support/review-team';

let team: ReviewTeam;
withReviewWorld((t) => (team = t));

const post = (routeId: number, userId: number, body: unknown) => callRoute(postComment, { method: 'POST', userId, params: { routeId: String(routeId) }, body });
const list = async (routeId: number, userId = team.reviewerId, path?: string) => {
  const res = await callRoute(listComments, { userId, params: { routeId: String(routeId) }, path });
  expect(res.status).toBe(200);
  return res.body as CommentListDto;
};
const threadOf = (l: CommentListDto, rootId: number) => l.threads.find((t) => t.root.id === rootId) as ThreadDto;

// Saves the route with one step changed by `edit`.
async function editStep(routeId: number, stepKey: string, edit: (step: Record<string, unknown>) => Record<string, unknown>) {
  const doc = await getRoute({ teamId: team.teamId, routeId });
  const steps = doc.steps.map((s) => (s.id === stepKey ? (edit(s as unknown as Record<string, unknown>) as unknown as typeof s) : s));
  await saveRoute({ teamId: team.teamId, userId: team.designerId, routeId, input: { version: doc.version, name: doc.name, target: doc.target, targetAmount: doc.targetAmount, marginalThreshold_kJ: doc.marginalThreshold_kJ, steps, links: doc.links } });
}

describe('threads', () => {
  it('start on a step or on the route, take replies under their root, and list with unresolved counts per step', async () => {
    const route = await makeOwnedRoute(team);
    const onStep = await post(route.id, team.reviewerId, { body: '  Is 1100 K realistic for **s1**?  ', stepKey: 's1' });
    expect(onStep.status).toBe(201);
    const root = onStep.body as CommentDto;
    expect(root).toMatchObject({ stepKey: 's1', parentId: null, body: 'Is 1100 K realistic for **s1**?', author: { id: team.reviewerId, name: 'Hanne Vasquez-Lind' }, routeVersion: route.version, outdated: false, isDeleted: false });

    const reply = await post(route.id, team.designerId, { body: 'Yes, reformers run there.', parentId: root.id });
    expect(reply.status).toBe(201);
    expect(reply.body).toMatchObject({ parentId: root.id, stepKey: 's1' });
    const onRoute = await post(route.id, team.leadId, { body: 'Overall looks downhill.' });
    expect((onRoute.body as CommentDto).stepKey).toBeNull();
    await post(route.id, team.leadId, { body: 'Second s2 thought.', stepKey: 's2' });

    const l = await list(route.id);
    expect(l.threads.map((t) => [t.root.stepKey, t.replies.length])).toEqual([['s1', 1], [null, 0], ['s2', 0]]);
    expect(l.unresolvedByStep).toEqual({ s1: 2, s2: 1 });
    expect(l.unresolvedOnRoute).toBe(1);

    const onlyS1 = await list(route.id, team.reviewerId, `/api/test?stepKey=s1`);
    expect(onlyS1.threads).toHaveLength(1);
    expect(onlyS1.unresolvedByStep).toEqual({ s1: 2, s2: 1 });
  });

  it('reject an empty, blank or over-long body with a field error on "body", and accept exactly 10,000 characters', async () => {
    const route = await makeOwnedRoute(team);
    for (const body of ['', '   \n\t ', 'x'.repeat(10_001)]) {
      const res = await post(route.id, team.reviewerId, { body });
      expect(res.status).toBe(400);
      expect(errorOf(res.body).fields?.body).toBeTruthy();
    }
    expect((await post(route.id, team.reviewerId, {})).status).toBe(400);
    expect((await post(route.id, team.reviewerId, { body: 'y'.repeat(10_000) })).status).toBe(201);
  });

  it('refuse a step the route does not have, a reply to a reply, and a parent from another route', async () => {
    const route = await makeOwnedRoute(team);
    const other = await makeOwnedRoute(team);
    const missing = await post(route.id, team.reviewerId, { body: 'Where?', stepKey: 's9' });
    expect(missing.status).toBe(400);
    expect(errorOf(missing.body).fields?.stepKey).toBeTruthy();
    expect((await post(route.id, team.reviewerId, { body: 'Bad key', stepKey: 'no spaces allowed' })).status).toBe(400);

    const root = (await post(route.id, team.reviewerId, { body: 'Root', stepKey: 's1' })).body as CommentDto;
    const reply = (await post(route.id, team.designerId, { body: 'Reply', parentId: root.id })).body as CommentDto;
    const nested = await post(route.id, team.leadId, { body: 'Nested', parentId: reply.id });
    expect(nested.status).toBe(400);
    expect(errorOf(nested.body).fields?.parentId).toBeTruthy();
    const wrongStep = await post(route.id, team.leadId, { body: 'Elsewhere', parentId: root.id, stepKey: 's2' });
    expect(wrongStep.status).toBe(400);
    expect((await post(other.id, team.leadId, { body: 'Cross', parentId: root.id })).status).toBe(404);
  });

  it('answer 404 for another team’s route, and to an outsider for this team’s route', async () => {
    const route = await makeOwnedRoute(team);
    const { makeRoute } = await import('./support/fixtures');
    const foreignRoute = await makeRoute(team.outsiderTeamId, team.outsiderId);
    expect((await post(foreignRoute.id, team.reviewerId, { body: 'Peek' })).status).toBe(404);
    expect((await post(route.id, team.outsiderId, { body: 'Peek' })).status).toBe(404);
    expect((await callRoute(listComments, { userId: team.outsiderId, params: { routeId: String(route.id) } })).status).toBe(404);
    expect((await post(999_999, team.reviewerId, { body: 'Nothing' })).status).toBe(404);
  });
});

describe('outdated comments', () => {
  it('mark a step comment once the step’s fields change, but not when the node only moves', async () => {
    const route = await makeOwnedRoute(team);
    const s1 = (await post(route.id, team.reviewerId, { body: 'About s1', stepKey: 's1' })).body as CommentDto;
    const s2 = (await post(route.id, team.reviewerId, { body: 'About s2', stepKey: 's2' })).body as CommentDto;
    const whole = (await post(route.id, team.reviewerId, { body: 'About the route' })).body as CommentDto;

    await editStep(route.id, 's2', (s) => ({ ...s, position: { x: 999, y: 42 } }));
    let l = await list(route.id);
    expect(threadOf(l, s1.id).root.outdated).toBe(false);
    expect(threadOf(l, s2.id).root.outdated).toBe(false);
    expect(threadOf(l, whole.id).root.outdated).toBe(true); // the route was saved since

    await editStep(route.id, 's1', (s) => ({ ...s, temperature: '1000 K' }));
    l = await list(route.id);
    expect(threadOf(l, s1.id).root.outdated).toBe(true);
    expect(threadOf(l, s2.id).root.outdated).toBe(false);

    const fresh = (await post(route.id, team.reviewerId, { body: 'About s1 again', stepKey: 's1' })).body as CommentDto;
    expect(fresh.outdated).toBe(false);
    expect(fresh.routeVersion).toBe(route.version + 2);
  });
});

describe('editing and deleting', () => {
  it('lets the author edit and delete, answers 403 to anyone else, and 410 once deleted', async () => {
    const route = await makeOwnedRoute(team);
    const c = (await post(route.id, team.reviewerId, { body: 'Draft thought', stepKey: 's1' })).body as CommentDto;
    const params = { routeId: String(route.id), commentId: String(c.id) };

    const byLead = await callRoute(editComment, { method: 'PATCH', userId: team.leadId, params, body: { body: 'Hijack' } });
    expect(byLead.status).toBe(403);
    expect((await callRoute(deleteComment, { method: 'DELETE', userId: team.designerId, params })).status).toBe(403);

    const blank = await callRoute(editComment, { method: 'PATCH', userId: team.reviewerId, params, body: { body: ' ' } });
    expect(blank.status).toBe(400);
    expect(errorOf(blank.body).fields?.body).toBeTruthy();

    const edited = await callRoute(editComment, { method: 'PATCH', userId: team.reviewerId, params, body: { body: 'Second thought' } });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ body: 'Second thought', editedAt: expect.any(String) });

    expect((await callRoute(deleteComment, { method: 'DELETE', userId: team.reviewerId, params })).status).toBe(200);
    expect((await list(route.id)).threads).toEqual([]);
    expect((await callRoute(editComment, { method: 'PATCH', userId: team.reviewerId, params, body: { body: 'Back' } })).status).toBe(410);
    expect((await callRoute(deleteComment, { method: 'DELETE', userId: team.reviewerId, params: { ...params, commentId: '0' } })).status).toBe(404);
  });

  it('keeps a deleted thread head with replies as "comment deleted", without its text', async () => {
    const route = await makeOwnedRoute(team);
    const root = (await post(route.id, team.reviewerId, { body: 'Secret-ish remark @baptiste.osei', stepKey: 's2' })).body as CommentDto;
    await post(route.id, team.designerId, { body: 'An answer', parentId: root.id });
    expect((await callRoute(deleteComment, { method: 'DELETE', userId: team.reviewerId, params: { routeId: String(route.id), commentId: String(root.id) } })).status).toBe(200);
    const l = await list(route.id);
    const t = threadOf(l, root.id);
    expect(t.root).toMatchObject({ isDeleted: true, body: '', mentions: [] });
    expect(t.replies.map((r) => r.body)).toEqual(['An answer']);
    expect(l.unresolvedByStep).toEqual({ s2: 1 });
  });
});

describe('resolving', () => {
  it('lets any member who may comment resolve and reopen a thread, through its first comment only', async () => {
    const route = await makeOwnedRoute(team);
    const root = (await post(route.id, team.designerId, { body: 'Check the yield', stepKey: 's1' })).body as CommentDto;
    const reply = (await post(route.id, team.leadId, { body: 'Will do', parentId: root.id })).body as CommentDto;
    const at = (commentId: number) => ({ routeId: String(route.id), commentId: String(commentId) });

    const resolved = await callRoute(resolveThread, { method: 'POST', userId: team.reviewerId, params: at(root.id), body: { resolved: true } });
    expect(resolved.status).toBe(200);
    expect(resolved.body).toMatchObject({ resolved: true, resolvedBy: { id: team.reviewerId, name: 'Hanne Vasquez-Lind' }, replies: [{ id: reply.id }] });
    expect((await list(route.id)).unresolvedByStep).toEqual({});

    const viaReply = await callRoute(resolveThread, { method: 'POST', userId: team.reviewerId, params: at(reply.id), body: { resolved: false } });
    expect(viaReply.status).toBe(400);
    expect((await callRoute(resolveThread, { method: 'POST', userId: team.reviewerId, params: at(root.id), body: { resolved: 'yes' } })).status).toBe(400);

    const reopened = await callRoute(resolveThread, { method: 'POST', userId: team.designerId, params: at(root.id), body: { resolved: false } });
    expect(reopened.body).toMatchObject({ resolved: false, resolvedAt: null, resolvedBy: null });
    expect((await list(route.id)).unresolvedByStep).toEqual({ s1: 2 });
  });
});

describe('mentions', () => {
  it('resolve @handles of team members case-insensitively and return them with names; others stay plain text', async () => {
    const route = await makeOwnedRoute(team);
    const handle = team.email.reviewer.split('@')[0]!;
    const outsiderHandle = team.email.outsider.split('@')[0]!;
    const res = await post(route.id, team.designerId, { body: `@${handle.toUpperCase()} and @${outsiderHandle}, see \`@${team.email.lead.split('@')[0]}\``, stepKey: 's1' });
    expect(res.status).toBe(201);
    expect((res.body as CommentDto).mentions).toEqual([{ userId: team.reviewerId, handle, name: 'Hanne Vasquez-Lind' }]);
  });
});
