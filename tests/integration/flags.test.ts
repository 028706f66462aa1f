import { describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as listComments } from '@/app/api/routes/[routeId]/comments/route';
import { POST as clearFlag } from '@/app/api/routes/[routeId]/flags/[flagId]/clear/route';
import { GET as listFlags, POST as postFlag } from '@/app/api/routes/[routeId]/flags/route';
import type { CommentListDto } from '@/lib/schemas/comment';
import type { FlagDto, FlagListDto } from '@/lib/schemas/flag';
import { makeRoute } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { makeOwnedRoute, type ReviewTeam, withReviewWorld } from './support/review-team';
import { failUpdatesOf } from './support/fault-trigger';

let team: ReviewTeam;
withReviewWorld((t) => (team = t));

const flag = (routeId: number, userId: number, body: unknown) => callRoute(postFlag, { method: 'POST', userId, params: { routeId: String(routeId) }, body });
const clear = (routeId: number, flagId: number, userId: number, body: unknown) =>
  callRoute(clearFlag, { method: 'POST', userId, params: { routeId: String(routeId), flagId: String(flagId) }, body });
const flagsOf = async (routeId: number, path?: string) => (await callRoute(listFlags, { userId: team.reviewerId, params: { routeId: String(routeId) }, path })).body as FlagListDto;

describe('flags', () => {
  it('let a reviewer, designer or lead flag a step, listed open per step', async () => {
    const route = await makeOwnedRoute(team);
    const byReviewer = await flag(route.id, team.reviewerId, { stepKey: 's1', category: 'safety', reason: '  Hydrogen at 1100 K: check the reformer’s relief sizing.  ' });
    expect(byReviewer.status).toBe(201);
    expect(byReviewer.body).toMatchObject({ stepKey: 's1', category: 'safety', reason: 'Hydrogen at 1100 K: check the reformer’s relief sizing.', isOpen: true, createdBy: { id: team.reviewerId, name: 'Hanne Vasquez-Lind' } });
    expect((await flag(route.id, team.designerId, { stepKey: 's1', category: 'thermodynamics', reason: 'Barely downhill.' })).status).toBe(201);
    expect((await flag(route.id, team.leadId, { stepKey: 's2', category: 'supply', reason: 'Single supplier of the catalyst.' })).status).toBe(201);

    const listed = await flagsOf(route.id);
    expect(listed.flags.map((f) => f.category)).toEqual(['supply', 'thermodynamics', 'safety']);
    expect(listed.openByStep).toEqual({ s1: 2, s2: 1 });
  });

  it('reject an unknown category, an empty or over-long reason and a step not in the route', async () => {
    const route = await makeOwnedRoute(team);
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ stepKey: 's1', category: 'vibes', reason: 'x' }, 'category'],
      [{ stepKey: 's1', category: 'cost', reason: '   ' }, 'reason'],
      [{ stepKey: 's1', category: 'cost', reason: 'r'.repeat(2001) }, 'reason'],
      [{ stepKey: 's7', category: 'cost', reason: 'Where is it?' }, 'stepKey'],
      [{ category: 'cost', reason: 'No step' }, 'stepKey'],
    ];
    for (const [body, field] of cases) {
      const res = await flag(route.id, team.reviewerId, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(errorOf(res.body).fields?.[field], JSON.stringify(res.body)).toBeTruthy();
    }
    expect((await flag(route.id, team.reviewerId, { stepKey: 's1', category: 'other', reason: 'r'.repeat(2000) })).status).toBe(201);
  });

  it('clear only with a comment, which lands on the step in the same transaction', async () => {
    const route = await makeOwnedRoute(team);
    const f = (await flag(route.id, team.reviewerId, { stepKey: 's2', category: 'cost', reason: 'Expensive catalyst.' })).body as FlagDto;

    const empty = await clear(route.id, f.id, team.designerId, { comment: '  ' });
    expect(empty.status).toBe(400);
    expect(errorOf(empty.body).fields?.comment).toBeTruthy();
    expect((await clear(route.id, f.id, team.designerId, {})).status).toBe(400);
    expect((await flagsOf(route.id)).openByStep).toEqual({ s2: 1 });

    const cleared = await clear(route.id, f.id, team.designerId, { comment: 'Switched to a copper catalyst; priced at a third.' });
    expect(cleared.status).toBe(200);
    const { flag: done, comment } = cleared.body as { flag: FlagDto; comment: { id: number; stepKey: string; body: string } };
    expect(done).toMatchObject({ isOpen: false, clearedBy: { id: team.designerId, name: 'Baptiste Osei' }, clearCommentId: comment.id });
    expect(comment).toMatchObject({ stepKey: 's2', body: 'Switched to a copper catalyst; priced at a third.' });

    expect((await flagsOf(route.id)).flags).toEqual([]);
    expect((await flagsOf(route.id, '/api/test?state=all')).flags.map((x) => x.id)).toEqual([f.id]);
    const threads = (await callRoute(listComments, { userId: team.leadId, params: { routeId: String(route.id) } })).body as CommentListDto;
    expect(threads.threads.map((t) => t.root.id)).toEqual([comment.id]);

    const again = await clear(route.id, f.id, team.leadId, { comment: 'Twice' });
    expect(again.status).toBe(409);
  });

  it('write neither the comment nor the clearing when the flag update fails after the comment was inserted', async () => {
    const route = await makeOwnedRoute(team);
    const f = (await flag(route.id, team.reviewerId, { stepKey: 's1', category: 'safety', reason: 'Runaway risk unknown.' })).body as FlagDto;
    const { models } = getDb();
    const before = await models.Comment.count({ where: { routeId: route.id } });
    // A database failure on the flag's update, which runs after the comment insert.
    const undo = await failUpdatesOf('step_flags', 'cleared_at');
    try {
      const res = await clear(route.id, f.id, team.leadId, { comment: 'Checked the relief sizing.' });
      expect(res.status).toBe(500);
    } finally {
      await undo();
    }
    expect(await models.Comment.count({ where: { routeId: route.id } })).toBe(before);
    expect((await models.StepFlag.findByPk(f.id))?.clearedAt).toBeNull();
    expect((await clear(route.id, f.id, team.leadId, { comment: 'Checked the relief sizing.' })).status).toBe(200);
  });

  it('answer 404 for another team’s flag or route, and for a flag of another route', async () => {
    const route = await makeOwnedRoute(team);
    const other = await makeOwnedRoute(team);
    const f = (await flag(route.id, team.reviewerId, { stepKey: 's1', category: 'cost', reason: 'x' })).body as FlagDto;
    expect((await clear(other.id, f.id, team.leadId, { comment: 'Wrong route' })).status).toBe(404);
    expect((await clear(route.id, 999_999, team.leadId, { comment: 'No flag' })).status).toBe(404);
    expect((await clear(route.id, f.id, team.outsiderId, { comment: 'Outsider' })).status).toBe(404);
    const foreign = await makeRoute(team.outsiderTeamId, team.outsiderId);
    expect((await flag(foreign.id, team.reviewerId, { stepKey: 's1', category: 'cost', reason: 'x' })).status).toBe(404);
    expect((await callRoute(listFlags, { userId: team.outsiderId, params: { routeId: String(route.id) } })).status).toBe(404);
  });
});
