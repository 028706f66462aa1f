import { describe, expect, it } from 'vitest';
import { GET as me } from '@/app/api/me/route';
import { PATCH as patchPreferences } from '@/app/api/me/preferences/route';
import { callRoute, errorOf } from './support/http';
import { type ReviewTeam, withReviewWorld } from './support/review-team';

let team: ReviewTeam;
withReviewWorld((t) => (team = t));

const profileOf = async (userId: number) => (await callRoute(me, { userId })).body as { cautionCollapsed: boolean; preferences: Record<string, string> };
const patch = (userId: number, body: unknown) => callRoute(patchPreferences, { method: 'PATCH', userId, body });

describe('the safety caution fold', () => {
  it('starts open, is remembered per person once folded, and opens again on request', async () => {
    expect((await profileOf(team.designerId)).cautionCollapsed).toBe(false);

    const folded = await patch(team.designerId, { cautionCollapsed: true });
    expect(folded.status).toBe(200);
    expect(folded.body).toMatchObject({ cautionCollapsed: true, energyUnit: 'kJ' });
    expect((await profileOf(team.designerId)).cautionCollapsed).toBe(true);
    // Another person's choice is their own.
    expect((await profileOf(team.reviewerId)).cautionCollapsed).toBe(false);

    expect((await patch(team.designerId, { cautionCollapsed: false })).status).toBe(200);
    expect((await profileOf(team.designerId)).cautionCollapsed).toBe(false);
  });

  it('leaves the units alone, and refuses a value that is not true or false', async () => {
    await patch(team.leadId, { energyUnit: 'kcal' });
    await patch(team.leadId, { cautionCollapsed: true });
    expect((await profileOf(team.leadId)).preferences.energyUnit).toBe('kcal');

    const bad = await patch(team.leadId, { cautionCollapsed: 'yes' });
    expect(bad.status).toBe(400);
    expect(errorOf(bad.body).code).toBe('VALIDATION');
    expect((await profileOf(team.leadId)).cautionCollapsed).toBe(true);
  });
});
