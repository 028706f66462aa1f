// Writes that check a row and then change it, started all at once. On SQLite the write queue runs them one by one;
// on PostgreSQL (npm run test:postgres) they really overlap, and the row locks must make the outcome the same.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { toErrorResponse } from '@/lib/api/error-response';
import { AppError } from '@/lib/api/errors';
import { recordDecision } from '@/lib/services/decisions/record-decision';
import { clearFlag } from '@/lib/services/flags/clear-flag';
import { createFlag } from '@/lib/services/flags/create-flag';
import { setRouteArchived } from '@/lib/services/routes/set-route-archived';
import { createTeamSpecies } from '@/lib/services/species/create-team-species';
import { updateTeamSpecies } from '@/lib/services/species/update-team-species';
import { changeMemberRole } from '@/lib/services/teams/change-member-role';
import { removeMember } from '@/lib/services/teams/remove-member';
import { signUp } from '@/lib/services/users/sign-up';
import { transitionRoute } from '@/lib/services/workflow/transition-route';
import { addMember, makeRoleSet, makeRoute, makeTeamWithLead } from './support/fixtures';
import { startMailbox } from './support/review-team';
import { speciesInput } from './support/species-fixtures';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let smtp: { close: () => Promise<void> };
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  smtp = await startMailbox();
  w = await makeRoleSet();
});
afterAll(async () => {
  await smtp.close();
  await teardownTestDb(dir);
});

/** Starts every call at once and sorts the outcomes; a loser's error is answered as the API would answer it. */
async function race<T>(calls: Array<() => Promise<T>>) {
  const settled = await Promise.allSettled(calls.map((call) => call()));
  const won = settled.flatMap((s) => (s.status === 'fulfilled' ? [s.value] : []));
  const lost = settled.flatMap((s) => (s.status === 'rejected' ? [s.reason as unknown] : []));
  return { won, lost, lostStatuses: lost.map((e) => toErrorResponse(e).status) };
}

const toReview = (routeId: number, version: number) => () =>
  transitionRoute({ teamId: w.teamId, userId: w.designerId, role: 'designer', routeId, input: { to: 'in_review', note: '', reviewerIds: [w.reviewerId], version } });

describe('concurrent writes keep the same rules on both databases', () => {
  it('four transitions from one version: one moves the route, three get 409', async () => {
    const route = await makeRoute(w.teamId, w.designerId);
    const { won, lostStatuses } = await race(Array.from({ length: 4 }, () => toReview(route.id, route.version)));
    expect(won).toHaveLength(1);
    expect(lostStatuses).toEqual([409, 409, 409]);
    const row = await getDb().models.Route.findByPk(route.id);
    expect(row!.version).toBe(route.version + 1);
    expect(await getDb().models.RouteTransition.count({ where: { routeId: route.id } })).toBe(1);
  });

  it('archiving while transitions run: every write that answered 200 raised the version once', async () => {
    const route = await makeRoute(w.teamId, w.designerId);
    const archive = () => setRouteArchived({ teamId: w.teamId, userId: w.leadId, routeId: route.id, archived: true });
    const { won, lostStatuses } = await race<unknown>([toReview(route.id, route.version), archive, toReview(route.id, route.version)]);
    expect(lostStatuses.every((s) => s === 409)).toBe(true);
    const row = await getDb().models.Route.findByPk(route.id);
    expect(row!.version).toBe(route.version + won.length);
    expect(row!.archivedAt).not.toBeNull();
  });

  it('four edits of a team species from one version: one lands, three get 409, none is lost silently', async () => {
    const input = speciesInput();
    const created = await createTeamSpecies({ teamId: w.teamId, userId: w.designerId, input });
    const edits = ['first', 'second', 'third', 'fourth'].map((word) => () =>
      updateTeamSpecies({ teamId: w.teamId, userId: w.designerId, id: created.id, version: created.version, input: { ...input, name: `edited ${word}` } }),
    );
    const { won, lostStatuses } = await race(edits);
    expect(won).toHaveLength(1);
    expect(lostStatuses).toEqual([409, 409, 409]);
    const row = await getDb().models.TeamSpecies.findByPk(created.id);
    expect(row!.version).toBe(created.version + 1);
    expect(row!.name).toBe(won[0]!.species.name);
  });

  it('two leads demoting each other at once leave the team one lead', async () => {
    for (let round = 0; round < 3; round += 1) {
      const team = await makeTeamWithLead('two-leads');
      const otherLead = await addMember(team.teamId, 'lead');
      const { won, lostStatuses } = await race([
        () => changeMemberRole({ teamId: team.teamId, actorId: team.leadId, userId: otherLead, role: 'designer' }),
        () => changeMemberRole({ teamId: team.teamId, actorId: otherLead, userId: team.leadId, role: 'designer' }),
      ]);
      expect(won).toHaveLength(1);
      expect(lostStatuses).toEqual([409]);
      expect(await getDb().models.Membership.count({ where: { teamId: team.teamId, role: 'lead' } })).toBe(1);
    }
  });

  it('two leads removing each other at once leave the team one lead', async () => {
    for (let round = 0; round < 3; round += 1) {
      const team = await makeTeamWithLead('two-leads-out');
      const otherLead = await addMember(team.teamId, 'lead');
      const { won, lostStatuses } = await race([
        () => removeMember({ teamId: team.teamId, actorId: team.leadId, userId: otherLead }),
        () => removeMember({ teamId: team.teamId, actorId: otherLead, userId: team.leadId }),
      ]);
      expect(won).toHaveLength(1);
      expect(lostStatuses).toEqual([409]);
      expect(await getDb().models.Membership.count({ where: { teamId: team.teamId, role: 'lead' } })).toBe(1);
    }
  });

  it('three decisions that shelve the other route, at once: one is recorded, two get 409', async () => {
    const a = await makeRoute(w.teamId, w.designerId);
    const b = await makeRoute(w.teamId, w.designerId);
    const decide = () => () =>
      recordDecision({ teamId: w.teamId, userId: w.leadId, role: 'lead', input: { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Fewer uphill steps.', shelveOthers: true } });
    const before = await getDb().models.Decision.count({ where: { teamId: w.teamId } });
    const { won, lostStatuses } = await race([decide(), decide(), decide()]);
    expect(won).toHaveLength(1);
    expect(lostStatuses).toEqual([409, 409]);
    expect(await getDb().models.Decision.count({ where: { teamId: w.teamId } })).toBe(before + 1);
    expect(await getDb().models.RouteTransition.count({ where: { routeId: b.id } })).toBe(1);
  });

  it('a flag cleared twice at once is cleared once, with one comment', async () => {
    const route = await makeRoute(w.teamId, w.designerId);
    const flag = await createFlag({ teamId: w.teamId, routeId: route.id, userId: w.reviewerId, input: { stepKey: 's1', category: 'safety', reason: 'Hot hydrogen.' } });
    const comments = await getDb().models.Comment.count({ where: { routeId: route.id } });
    const clear = (text: string) => () => clearFlag({ teamId: w.teamId, routeId: route.id, flagId: flag.id, userId: w.designerId, input: { comment: text } });
    const { won, lostStatuses } = await race([clear('Checked: below the limit.'), clear('Checked again.')]);
    expect(won).toHaveLength(1);
    expect(lostStatuses).toEqual([409]);
    expect(await getDb().models.Comment.count({ where: { routeId: route.id } })).toBe(comments + 1);
  });

  it('three sign-ups with one address at once: one account, the others get the e-mail field error', async () => {
    const email = 'simultaneous@example.test';
    const { won, lost } = await race(Array.from({ length: 3 }, (_, i) => () => signUp({ name: `Same ${i}`, email, password: 'a-strong-password-1', teamName: `Same ${i}` })));
    expect(won).toHaveLength(1);
    expect(lost).toHaveLength(2);
    for (const error of lost) expect(error instanceof AppError && error.code === 'VALIDATION' && error.fields?.email).toBeTruthy();
    expect(await getDb().models.User.count({ where: { email } })).toBe(1);
  });

  it('three creates of one species at once: one row, the others answer 409 (never 500)', async () => {
    const input = speciesInput();
    const { won, lostStatuses } = await race(Array.from({ length: 3 }, () => () => createTeamSpecies({ teamId: w.teamId, userId: w.designerId, input })));
    expect(won).toHaveLength(1);
    expect(lostStatuses).toEqual([409, 409]);
    expect(await getDb().models.TeamSpecies.count({ where: { teamId: w.teamId, formula: input.formula } })).toBe(1);
  });
});
