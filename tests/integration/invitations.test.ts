import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { POST as accept } from '@/app/api/invitations/[token]/accept/route';
import { GET as view } from '@/app/api/invitations/[token]/route';
import { DELETE as removeMember, PATCH as changeRole } from '@/app/api/teams/[teamId]/members/[userId]/route';
import { POST as invite } from '@/app/api/teams/[teamId]/invitations/route';
import { startFakeSmtpServer } from '@/lib/mail/fake-smtp-server';
import { findInvitationLink, readMailbox } from '@/lib/mail/mailbox';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let smtp: { port: number; close: () => Promise<void> };
let team: Awaited<ReturnType<typeof makeTeamWithLead>>;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  smtp = await startFakeSmtpServer({ port: 0, dir: process.env.MAIL_DIR! });
  process.env.SMTP_URL = `smtp://127.0.0.1:${smtp.port}`;
  team = await makeTeamWithLead('invites');
});
afterAll(async () => {
  await smtp.close();
  await teardownTestDb(dir);
});

async function inviteAndReadToken(email: string, role = 'reviewer') {
  const res = await callRoute(invite, { method: 'POST', userId: team.leadId, params: { teamId: String(team.teamId) }, body: { email, role } });
  expect(res.status).toBe(201);
  expect(res.body).toMatchObject({ mailSent: true });
  const mail = readMailbox(process.env.MAIL_DIR!).find((m) => m.to.includes(email));
  expect(mail, 'the fake SMTP server received the invitation').toBeDefined();
  const link = findInvitationLink(mail!);
  expect(link).toMatch(/^http:\/\/localhost:3000\/invite\//);
  return { token: decodeURIComponent(link!.split('/invite/')[1]!), mail: mail! };
}

describe('invitation flow', () => {
  it('mails a single-use link that signs the invitee up and makes them a member', async () => {
    const { token, mail } = await inviteAndReadToken('new.reviewer@example.test');
    expect(mail.subject).toContain('Join');
    expect(mail.text).toContain('expires in 7 days');

    const shown = await callRoute(view, { params: { token } });
    expect(shown.body).toMatchObject({ status: 'pending', email: 'new.reviewer@example.test', role: 'reviewer', hasAccount: false });

    const missing = await callRoute(accept, { method: 'POST', params: { token }, body: {} });
    expect(missing.status).toBe(400);
    expect(errorOf(missing.body).fields).toMatchObject({ name: expect.any(String), password: expect.any(String) });

    const joined = await callRoute(accept, { method: 'POST', params: { token }, body: { name: 'Nell Reviewer', password: 'a-long-password' } });
    expect(joined.status).toBe(200);
    expect(joined.body).toMatchObject({ created: true, role: 'reviewer', teamId: team.teamId });
    const user = await getDb().models.User.findOne({ where: { email: 'new.reviewer@example.test' } });
    const membership = await getDb().models.Membership.findOne({ where: { userId: user!.id, teamId: team.teamId } });
    expect(membership?.role).toBe('reviewer');

    const reused = await callRoute(accept, { method: 'POST', params: { token }, body: { name: 'Again', password: 'a-long-password' } });
    expect(reused.status).toBe(410);
    expect(errorOf(reused.body).message).toMatch(/already been used/);
  });

  it('refuses a new password over 72 bytes or containing the invited address, and leaves the link usable', async () => {
    const { token } = await inviteAndReadToken('ottilie.marchetti@example.test');
    const long = await callRoute(accept, { method: 'POST', params: { token }, body: { name: 'Ottilie', password: 'ø'.repeat(20) + 'x'.repeat(33) } });
    expect(long.status).toBe(400);
    expect(errorOf(long.body).fields?.password).toMatch(/72 bytes/);
    const named = await callRoute(accept, { method: 'POST', params: { token }, body: { name: 'Ottilie', password: 'ottilie.marchetti!' } });
    expect(named.status).toBe(400);
    expect(errorOf(named.body)).toMatchObject({ code: 'VALIDATION', fields: { password: expect.stringMatching(/e-mail address/) } });
    expect(await getDb().models.User.count({ where: { email: 'ottilie.marchetti@example.test' } })).toBe(0);
    const joined = await callRoute(accept, { method: 'POST', params: { token }, body: { name: 'Ottilie', password: 'tarragon-and-lime-7' } });
    expect(joined.status).toBe(200);
  });

  it('refuses an expired token with a clear message', async () => {
    const { token } = await inviteAndReadToken('late@example.test');
    await getDb().models.Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: 'late@example.test' } });
    expect((await callRoute(view, { params: { token } })).body).toMatchObject({ status: 'expired' });
    const res = await callRoute(accept, { method: 'POST', params: { token }, body: { name: 'Late', password: 'a-long-password' } });
    expect(res.status).toBe(410);
    expect(errorOf(res.body).message).toMatch(/expired/);
  });

  it('answers 404 to an unknown token', async () => {
    const res = await callRoute(view, { params: { token: 'no-such-token' } });
    expect(res.status).toBe(404);
  });

  it('asks an existing account to sign in, and accepts it once signed in', async () => {
    const other = await makeTeamWithLead('elsewhere');
    const { token } = await inviteAndReadToken(other.leadEmail, 'designer');
    const anonymous = await callRoute(accept, { method: 'POST', params: { token }, body: {} });
    expect(anonymous.status).toBe(401);
    const signedIn = await callRoute(accept, { method: 'POST', params: { token }, body: {}, userId: other.leadId });
    expect(signedIn.status).toBe(200);
    expect(signedIn.body).toMatchObject({ created: false, role: 'designer' });
  });

  it('refuses to invite an existing member', async () => {
    const res = await callRoute(invite, { method: 'POST', userId: team.leadId, params: { teamId: String(team.teamId) }, body: { email: team.leadEmail, role: 'designer' } });
    expect(res.status).toBe(409);
  });
});

describe('member management', () => {
  it('lets a lead change a role, and never demote or remove the last lead', async () => {
    const params = { teamId: String(team.teamId), userId: String(team.leadId) };
    const demote = await callRoute(changeRole, { method: 'PATCH', userId: team.leadId, params, body: { role: 'designer' } });
    expect(demote.status).toBe(409);
    expect(errorOf(demote.body).message).toMatch(/last lead/);
    const remove = await callRoute(removeMember, { method: 'DELETE', userId: team.leadId, params });
    expect(remove.status).toBe(409);

    const reviewer = await getDb().models.User.findOne({ where: { email: 'new.reviewer@example.test' } });
    const promote = await callRoute(changeRole, { method: 'PATCH', userId: team.leadId, params: { ...params, userId: String(reviewer!.id) }, body: { role: 'lead' } });
    expect(promote.status).toBe(200);
    const nowOk = await callRoute(changeRole, { method: 'PATCH', userId: team.leadId, params, body: { role: 'designer' } });
    expect(nowOk.status).toBe(200);
  });

  it('rejects an unknown role value', async () => {
    const lead = await getDb().models.Membership.findOne({ where: { teamId: team.teamId, role: 'lead' } });
    const res = await callRoute(changeRole, { method: 'PATCH', userId: lead!.userId, params: { teamId: String(team.teamId), userId: String(team.leadId) }, body: { role: 'admin' } });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields?.role).toBeTruthy();
  });
});
