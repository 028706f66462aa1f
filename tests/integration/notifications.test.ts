import { describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as me } from '@/app/api/me/route';
import { PATCH as patchPreferences } from '@/app/api/me/preferences/route';
import { POST as markRead } from '@/app/api/notifications/read/route';
import { GET as listNotifications } from '@/app/api/notifications/route';
import { POST as postComment } from '@/app/api/routes/[routeId]/comments/route';
import type { NotificationPageDto } from '@/lib/schemas/notification';
import { APPROVAL_CAUTION, notifyReviewRequest, notifyStatusChange } from '@/lib/services/notifications/notify-workflow';
import { callRoute, errorOf } from './support/http';
import { mailTo, makeOwnedRoute, type ReviewTeam, withReviewWorld } from './support/review-team';

let team: ReviewTeam;
withReviewWorld((t) => (team = t));

const handle = (email: string) => email.split('@')[0]!;
const comment = (routeId: number, userId: number, body: Record<string, unknown>) => callRoute(postComment, { method: 'POST', userId, params: { routeId: String(routeId) }, body });
const inbox = async (userId: number, path = '/api/notifications') => {
  const res = await callRoute(listNotifications, { userId, path });
  expect(res.status).toBe(200);
  return res.body as NotificationPageDto;
};
const forRoute = async (userId: number, routeId: number) => (await inbox(userId, '/api/notifications?limit=50')).items.filter((n) => n.routeId === routeId);
const mailsAbout = (address: string, routeName: string) => mailTo(address).filter((m) => m.text.includes(routeName));

describe('a new comment', () => {
  it('notifies the route owner and each mentioned member, in app and by mail with a link to the step; never the actor', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    const res = await comment(route.id, team.reviewerId, { body: `@${handle(team.email.lead)} is <b>1100 K</b> safe here? @${handle(team.email.reviewer)}`, stepKey: 's1' });
    expect(res.status).toBe(201);
    const link = `http://localhost:3000/routes/${route.id}?step=s1`;

    const [owner] = await forRoute(team.designerId, route.id);
    expect(owner).toMatchObject({ kind: 'comment_on_owned_route', stepKey: 's1', actor: { id: team.reviewerId, name: 'Hanne Vasquez-Lind' }, link: `/routes/${route.id}?step=s1`, isRead: false });
    expect(owner!.title).toBe(`Hanne Vasquez-Lind commented on ${route.name} · Step 1 (steam reforming of methane)`);
    const [mentioned] = await forRoute(team.leadId, route.id);
    expect(mentioned).toMatchObject({ kind: 'mention', title: `Hanne Vasquez-Lind mentioned you on ${route.name} · Step 1 (steam reforming of methane)` });
    expect(await forRoute(team.reviewerId, route.id)).toEqual([]);

    const ownerMail = mailsAbout(team.email.designer, route.name);
    expect(ownerMail).toHaveLength(1);
    expect(ownerMail[0]!.subject).toBe(`[Stepwell] Hanne Vasquez-Lind commented on ${route.name} · Step 1 (steam reforming of methane)`);
    expect(ownerMail[0]!.text).toContain(`Route: ${route.name}, Step 1 (steam reforming of methane)`);
    expect(ownerMail[0]!.text).toContain(`Open Step 1 (steam reforming of methane) of ${route.name}: ${link}`);
    expect(ownerMail[0]!.html).toContain(`href="${link}"`);
    // The comment's own markup arrives escaped, never as HTML.
    expect(ownerMail[0]!.html).toContain('&lt;b&gt;1100 K&lt;/b&gt;');
    expect(ownerMail[0]!.html).not.toContain('<b>1100 K</b>');

    const leadMail = mailsAbout(team.email.lead, route.name);
    expect(leadMail.map((m) => m.subject)).toEqual([`[Stepwell] Hanne Vasquez-Lind mentioned you on ${route.name} · Step 1 (steam reforming of methane)`]);
    expect(leadMail[0]!.to).toEqual([team.email.lead]);
    expect(mailsAbout(team.email.reviewer, route.name)).toEqual([]);
    // People read the step's label, never its key (which only goes into the link).
    expect(ownerMail[0]!.text.replace(link, '')).not.toMatch(/\bs1\b/);
  });

  it('reads a title stored with a step key ("step s2") with that step\'s label, or "a removed step"', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    await comment(route.id, team.reviewerId, { body: 'Older wording.', stepKey: 's2' });
    const { Notification } = getDb().models;
    await Notification.update({ title: `Hanne Vasquez-Lind commented on ${route.name} · step s2` }, { where: { routeId: route.id, stepKey: 's2' } });
    expect((await forRoute(team.designerId, route.id))[0]!.title).toBe(`Hanne Vasquez-Lind commented on ${route.name} · Step 2 (methanol from carbon monoxide)`);
    await Notification.update({ title: `Hanne Vasquez-Lind commented on ${route.name} · step gone`, stepKey: 'gone' }, { where: { routeId: route.id, stepKey: 's2' } });
    expect((await forRoute(team.designerId, route.id))[0]!.title).toBe(`Hanne Vasquez-Lind commented on ${route.name} · a removed step`);
  });

  it('gives a mentioned owner one notification, not two, and mails nobody for a handle outside the team', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    await comment(route.id, team.leadId, { body: `@${handle(team.email.designer)} and @${handle(team.email.outsider)}: please look.` });
    const owner = await forRoute(team.designerId, route.id);
    expect(owner.map((n) => n.kind)).toEqual(['mention']);
    expect(owner[0]!.link).toBe(`/routes/${route.id}`);
    expect(mailsAbout(team.email.designer, route.name)).toHaveLength(1);
    expect(mailsAbout(team.email.outsider, route.name)).toEqual([]);
    expect(await forRoute(team.outsiderId, route.id)).toEqual([]);
  });

  it('notifies nobody when the owner comments on their own route', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    await comment(route.id, team.designerId, { body: `Note to self, @${handle(team.email.designer)}.`, stepKey: 's2' });
    expect(await forRoute(team.designerId, route.id)).toEqual([]);
    expect(mailsAbout(team.email.designer, route.name)).toEqual([]);
  });

  it('still succeeds and keeps the in-app notification when the mail server is down', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    const working = process.env.SMTP_URL;
    process.env.SMTP_URL = 'smtp://127.0.0.1:1';
    try {
      expect((await comment(route.id, team.reviewerId, { body: 'Mail will fail.', stepKey: 's1' })).status).toBe(201);
    } finally {
      process.env.SMTP_URL = working;
    }
    expect((await forRoute(team.designerId, route.id)).map((n) => n.kind)).toEqual(['comment_on_owned_route']);
    expect(mailsAbout(team.email.designer, route.name)).toEqual([]);
  });
});

describe('mutes', () => {
  it('stop the e-mail of a muted kind while the in-app notification still appears, set through the preferences endpoint', async () => {
    const mute = await callRoute(patchPreferences, { method: 'PATCH', userId: team.designerId, body: { notificationMutes: { comment_on_owned_route: true } } });
    expect(mute.status).toBe(200);
    expect(mute.body).toMatchObject({ energyUnit: 'kJ', notificationMutes: { comment_on_owned_route: true, mention: false, review_request: false, status_change: false } });
    expect(((await callRoute(me, { userId: team.designerId })).body as { notificationMutes: Record<string, boolean> }).notificationMutes.comment_on_owned_route).toBe(true);

    try {
      const route = await makeOwnedRoute(team, team.designerId);
      await comment(route.id, team.reviewerId, { body: 'Muted for the owner.', stepKey: 's1' });
      expect((await forRoute(team.designerId, route.id)).map((n) => n.kind)).toEqual(['comment_on_owned_route']);
      expect(mailsAbout(team.email.designer, route.name)).toEqual([]);

      // A different kind still mails.
      await comment(route.id, team.reviewerId, { body: `@${handle(team.email.designer)} this one is a mention.`, stepKey: 's2' });
      expect(mailsAbout(team.email.designer, route.name).map((m) => m.subject)).toEqual([`[Stepwell] Hanne Vasquez-Lind mentioned you on ${route.name} · Step 2 (methanol from carbon monoxide)`]);
    } finally {
      await callRoute(patchPreferences, { method: 'PATCH', userId: team.designerId, body: { notificationMutes: { comment_on_owned_route: false } } });
    }
  });

  it('reject unknown kinds, non-boolean values and an empty patch; units alone still save', async () => {
    for (const body of [{ notificationMutes: { weekly_digest: true } }, { notificationMutes: { mention: 'yes' } }, {}]) {
      const res = await callRoute(patchPreferences, { method: 'PATCH', userId: team.reviewerId, body });
      expect(res.status, JSON.stringify(body)).toBe(400);
    }
    const units = await callRoute(patchPreferences, { method: 'PATCH', userId: team.reviewerId, body: { energyUnit: 'kcal' } });
    expect(units.body).toMatchObject({ energyUnit: 'kcal', temperatureUnit: 'K', notificationMutes: { mention: false } });
  });
});

describe('workflow notifications', () => {
  it('notifyReviewRequest reaches each named reviewer in the team, not the actor or outsiders, with the note', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    const result = await notifyReviewRequest({ teamId: team.teamId, routeId: route.id, actorId: team.designerId, reviewerIds: [team.reviewerId, team.designerId, team.outsiderId, team.reviewerId], note: 'Ready for a look at s1 & s2 <please>.' });
    expect(result).toEqual({ notified: [team.reviewerId], mailed: [team.email.reviewer] });
    const [n] = await forRoute(team.reviewerId, route.id);
    expect(n).toMatchObject({ kind: 'review_request', title: `Baptiste Osei asked you to review ${route.name}`, text: 'Ready for a look at s1 & s2 <please>.', link: `/routes/${route.id}`, stepKey: null });
    const [mail] = mailsAbout(team.email.reviewer, route.name);
    expect(mail!.subject).toBe(`[Stepwell] Baptiste Osei asked you to review ${route.name}`);
    expect(mail!.text).toContain('> Ready for a look at s1 & s2 <please>.');
    expect(mail!.text).toContain(`http://localhost:3000/routes/${route.id}`);
    expect(mail!.html).toContain('Ready for a look at s1 &amp; s2 &lt;please&gt;.');
    expect(await forRoute(team.outsiderId, route.id)).toEqual([]);
  });

  it('notifyStatusChange reaches the owner and named reviewers minus the actor, and an approval carries the safety caution', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    const result = await notifyStatusChange({ teamId: team.teamId, routeId: route.id, actorId: team.leadId, from: 'in_review', to: 'approved', note: 'Good to go.', reviewerIds: [team.reviewerId, team.leadId] });
    expect(result.notified.sort()).toEqual([team.designerId, team.reviewerId].sort());
    for (const [userId, address] of [[team.designerId, team.email.designer], [team.reviewerId, team.email.reviewer]] as const) {
      const [n] = await forRoute(userId, route.id);
      expect(n).toMatchObject({ kind: 'status_change', title: `Ottilie Marchetti moved ${route.name} from in review to approved`, text: 'Good to go.' });
      const [mail] = mailsAbout(address, route.name);
      expect(mail!.subject).toBe(`[Stepwell] Ottilie Marchetti moved ${route.name} from in review to approved`);
      expect(mail!.text).toContain(APPROVAL_CAUTION);
    }
    expect(await forRoute(team.leadId, route.id)).toEqual([]);

    const back = await notifyStatusChange({ teamId: team.teamId, routeId: route.id, actorId: team.reviewerId, from: 'in_review', to: 'changes_requested', note: 'Check s2.' });
    expect(back.notified).toEqual([team.designerId]);
    const latest = mailsAbout(team.email.designer, route.name)[0]!;
    expect(latest.subject).toContain('from in review to changes requested');
    expect(latest.text).not.toContain(APPROVAL_CAUTION);
  });

  it('honours a status_change mute: in-app only', async () => {
    await getDb().models.UserPreference.update({ muteStatusChange: true }, { where: { userId: team.designerId } });
    try {
      const route = await makeOwnedRoute(team, team.designerId);
      const result = await notifyStatusChange({ teamId: team.teamId, routeId: route.id, actorId: team.leadId, from: 'draft', to: 'shelved', note: null });
      expect(result).toEqual({ notified: [team.designerId], mailed: [] });
      expect(mailsAbout(team.email.designer, route.name)).toEqual([]);
    } finally {
      await getDb().models.UserPreference.update({ muteStatusChange: false }, { where: { userId: team.designerId } });
    }
  });

  it('refuse a route of another team', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    await expect(notifyReviewRequest({ teamId: team.outsiderTeamId, routeId: route.id, actorId: team.outsiderId, reviewerIds: [team.reviewerId] })).rejects.toMatchObject({ code: 'NOT_FOUND' });
  });
});

describe('the notification list', () => {
  it('shows only the caller’s own, newest first, in capped pages with an unread count', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    for (let i = 1; i <= 3; i += 1) await comment(route.id, team.reviewerId, { body: `Point ${i}`, stepKey: 's1' });
    const all = await inbox(team.designerId, '/api/notifications?limit=50');
    const mine = all.items.filter((n) => n.routeId === route.id);
    expect(mine.map((n) => n.text)).toEqual(['Point 3', 'Point 2', 'Point 1']);
    expect(all.unreadCount).toBe(all.items.filter((n) => !n.isRead).length);

    const first = await inbox(team.designerId, '/api/notifications?limit=2');
    expect(first.items).toHaveLength(2);
    expect(first.nextBefore).toBe(first.items[1]!.id);
    const second = await inbox(team.designerId, `/api/notifications?limit=2&before=${first.nextBefore}`);
    expect(second.items[0]!.id).toBeLessThan(first.items[1]!.id);

    expect((await callRoute(listNotifications, { userId: team.designerId, path: '/api/notifications?limit=51' })).status).toBe(400);
    expect((await callRoute(listNotifications, { path: '/api/notifications' })).status).toBe(401);
    const outsider = await inbox(team.outsiderId);
    expect(outsider.items.filter((n) => n.routeId === route.id)).toEqual([]);
  });

  it('marks read by ids (own only: someone else’s id answers 404) or all at once', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    await comment(route.id, team.reviewerId, { body: 'One', stepKey: 's1' });
    await comment(route.id, team.reviewerId, { body: `Two @${handle(team.email.lead)}`, stepKey: 's1' });
    const [ownerNote] = await forRoute(team.designerId, route.id);
    const [leadNote] = await forRoute(team.leadId, route.id);

    const stolen = await callRoute(markRead, { method: 'POST', userId: team.designerId, body: { ids: [ownerNote!.id, leadNote!.id] } });
    expect(stolen.status).toBe(404);
    expect((await forRoute(team.leadId, route.id))[0]!.isRead).toBe(false);
    expect((await forRoute(team.designerId, route.id))[0]!.isRead).toBe(false);

    const before = (await inbox(team.designerId)).unreadCount;
    const one = await callRoute(markRead, { method: 'POST', userId: team.designerId, body: { ids: [ownerNote!.id] } });
    expect(one.body).toEqual({ updated: 1, unreadCount: before - 1 });
    expect((await inbox(team.designerId, '/api/notifications?unread=1')).items.map((n) => n.id)).not.toContain(ownerNote!.id);

    for (const body of [{}, { ids: [] }, { all: false }, { ids: [1], all: true }, { ids: ['x'] }]) {
      const res = await callRoute(markRead, { method: 'POST', userId: team.designerId, body });
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(errorOf(res.body).code).toBe('VALIDATION');
    }
    const everything = await callRoute(markRead, { method: 'POST', userId: team.designerId, body: { all: true } });
    expect(everything.body).toMatchObject({ unreadCount: 0 });
    expect((await forRoute(team.leadId, route.id))[0]!.isRead).toBe(false);
  });

  it('hides notifications from a team the user has left', async () => {
    const route = await makeOwnedRoute(team, team.designerId);
    const { addMember } = await import('./support/fixtures');
    const leaverId = await addMember(team.teamId, 'reviewer');
    const leaver = await getDb().models.User.findByPk(leaverId);
    await comment(route.id, team.leadId, { body: `@${handle(leaver!.email)} please check`, stepKey: 's1' });
    expect(await forRoute(leaverId, route.id)).toHaveLength(1);
    await getDb().models.Membership.destroy({ where: { teamId: team.teamId, userId: leaverId } });
    expect(await forRoute(leaverId, route.id)).toEqual([]);
  });
});
