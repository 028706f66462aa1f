import { beforeAll, describe, expect, it } from 'vitest';
import { PATCH as patchPreferences } from '@/app/api/me/preferences/route';
import { GET as listNotifications } from '@/app/api/notifications/route';
import { PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import { POST as transition } from '@/app/api/routes/[routeId]/transitions/route';
import type { NotificationDto, NotificationPageDto } from '@/lib/schemas/notification';
import { APPROVAL_CAUTION } from '@/lib/services/notifications/notify-workflow';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import type { TransitionOutcome } from '@/lib/services/workflow/transition-dto';
import { SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { callRoute } from './support/http';
import { mailTo, makeOwnedRoute, type ReviewTeam, withReviewWorld } from './support/review-team';

let team: ReviewTeam;
withReviewWorld((t) => (team = t));

const move = (route: { id: number }, userId: number, body: Record<string, unknown>) =>
  callRoute(transition, { method: 'POST', userId, params: { routeId: String(route.id) }, body });
async function moved(route: { id: number }, userId: number, body: Record<string, unknown>): Promise<TransitionOutcome> {
  const res = await move(route, userId, body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as TransitionOutcome;
}
async function inApp(userId: number, routeId: number): Promise<NotificationDto[]> {
  const res = await callRoute(listNotifications, { userId, path: '/api/notifications?limit=50' });
  expect(res.status).toBe(200);
  return (res.body as NotificationPageDto).items.filter((n) => n.routeId === routeId);
}
const mailsAbout = (address: string, routeName: string) => mailTo(address).filter((m) => m.text.includes(routeName));
const mute = (userId: number, mutes: Record<string, boolean>) => callRoute(patchPreferences, { method: 'PATCH', userId, body: { notificationMutes: mutes } });
const link = (routeId: number) => `http://localhost:3000/routes/${routeId}`;

describe('moves through the review workflow', () => {
  let route: RouteDocumentDto;
  let version = 0;

  beforeAll(async () => {
    route = await makeOwnedRoute(team, team.designerId);
    version = route.version;
  });

  it('sending for review asks the named reviewer, in the app and by a mail with a link to the route', async () => {
    const sent = await moved(route, team.designerId, { to: 'in_review', version, note: 'Ready for a look at s1.', reviewerIds: [team.reviewerId] });
    version = sent.route.version;

    const notes = await inApp(team.reviewerId, route.id);
    // Asked reviewers get the request only, not a second status-change notice for the same move.
    expect(notes.map((n) => n.kind)).toEqual(['review_request']);
    expect(notes[0]).toMatchObject({ title: `Baptiste Osei asked you to review ${route.name}`, text: 'Ready for a look at s1.', link: `/routes/${route.id}`, actor: { id: team.designerId }, isRead: false });

    const mails = mailsAbout(team.email.reviewer, route.name);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.subject).toBe(`[Stepwell] Baptiste Osei asked you to review ${route.name}`);
    expect(mails[0]!.text).toContain(`Open ${route.name}: ${link(route.id)}`);
    expect(mails[0]!.html).toContain(`href="${link(route.id)}"`);
    // The designer made the move on their own route: nothing for them; nothing for the lead, who was not named.
    expect(await inApp(team.designerId, route.id)).toEqual([]);
    expect(await inApp(team.leadId, route.id)).toEqual([]);
    expect(mailsAbout(team.email.lead, route.name)).toEqual([]);
  });

  it('approval tells the owner by mail with the caution that the screen says nothing of rates, runaway or toxicity; a muted kind stays in the app only', async () => {
    expect((await mute(team.reviewerId, { status_change: true })).status).toBe(200);
    try {
      const approved = await moved(route, team.leadId, { to: 'approved', version, note: 'Screen looks sound.' });
      version = approved.route.version;

      const [ownerNote] = await inApp(team.designerId, route.id);
      expect(ownerNote).toMatchObject({ kind: 'status_change', title: `Ottilie Marchetti moved ${route.name} from in review to approved`, text: 'Screen looks sound.' });
      const ownerMails = mailsAbout(team.email.designer, route.name);
      expect(ownerMails).toHaveLength(1);
      expect(ownerMails[0]!.subject).toBe(`[Stepwell] Ottilie Marchetti moved ${route.name} from in review to approved`);
      expect(ownerMails[0]!.text).toContain(APPROVAL_CAUTION);
      expect(ownerMails[0]!.text).toContain(link(route.id));
      expect(APPROVAL_CAUTION).toMatch(/rates.*runaway.*toxicity/);

      // The reviewer named at submission hears of it too, but muted status changes: in the app, no mail.
      expect((await inApp(team.reviewerId, route.id)).map((n) => n.kind)).toEqual(['status_change', 'review_request']);
      expect(mailsAbout(team.email.reviewer, route.name).filter((m) => m.subject.includes('approved'))).toEqual([]);
      expect(mailsAbout(team.email.reviewer, route.name)).toHaveLength(1);
    } finally {
      await mute(team.reviewerId, { status_change: false });
    }
  });

  it('editing the approved route sends it back to draft and tells the owner and the reviewer', async () => {
    const res = await callRoute(saveRoute, {
      method: 'PUT', userId: team.leadId, params: { routeId: String(route.id) },
      body: { version, name: route.name, target: route.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS.map((s) => ({ ...s, notes: 'Cooler s2.' })), links: SAMPLE_LINKS },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect((res.body as { transition: TransitionOutcome | null }).transition?.transition).toMatchObject({ from: 'approved', to: 'draft' });

    for (const [userId, address] of [[team.designerId, team.email.designer], [team.reviewerId, team.email.reviewer]] as const) {
      const [latest] = await inApp(userId, route.id);
      expect(latest).toMatchObject({ kind: 'status_change', title: `Ottilie Marchetti moved ${route.name} from approved to draft` });
      expect(latest!.text).toMatch(/^Edited after approval/);
      const [mail] = mailsAbout(address, route.name);
      expect(mail!.subject).toBe(`[Stepwell] Ottilie Marchetti moved ${route.name} from approved to draft`);
      expect(mail!.text).not.toContain(APPROVAL_CAUTION);
    }
    expect(await inApp(team.leadId, route.id)).toEqual([]);
  });

  it('an ordinary save of a draft moves nothing and tells no one', async () => {
    const before = (await inApp(team.designerId, route.id)).length;
    const current = (await callRoute(saveRoute, {
      method: 'PUT', userId: team.leadId, params: { routeId: String(route.id) },
      body: { version: version + 1, name: route.name, target: route.target, targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS },
    }));
    expect(current.status, JSON.stringify(current.body)).toBe(200);
    expect((current.body as { transition: unknown }).transition).toBeNull();
    expect(await inApp(team.designerId, route.id)).toHaveLength(before);
  });
});

describe('when a move fails or the mail does', () => {
  it('a refused or stale move notifies no one', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    expect((await move(route, team.designerId, { to: 'in_review', version: route.version + 5, reviewerIds: [team.reviewerId] })).status).toBe(409);
    expect((await move(route, team.reviewerId, { to: 'approved', version: route.version })).status).toBe(409);
    expect(await inApp(team.reviewerId, route.id)).toEqual([]);
    expect(mailsAbout(team.email.reviewer, route.name)).toEqual([]);
  });

  it('a mail server that refuses connections does not fail the move; the in-app notification stands', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    const working = process.env.SMTP_URL;
    process.env.SMTP_URL = 'smtp://127.0.0.1:1'; // nothing listens here
    try {
      const sent = await moved(route, team.designerId, { to: 'in_review', version: route.version, note: '', reviewerIds: [team.reviewerId] });
      expect(sent.route.status).toBe('in_review');
    } finally {
      process.env.SMTP_URL = working;
    }
    expect((await inApp(team.reviewerId, route.id)).map((n) => n.kind)).toEqual(['review_request']);
    expect(mailsAbout(team.email.reviewer, route.name)).toEqual([]);
  });
});
