import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as me } from '@/app/api/me/route';
import { POST as requestReset } from '@/app/api/password-reset/route';
import { POST as resetWithToken } from '@/app/api/password-reset/[token]/route';
import { peerStampFor } from '@/lib/security/peer-address';
import { settlePasswordResetRequests } from '@/lib/services/password-reset/request-password-reset';
import { hashResetToken } from '@/lib/services/password-reset/reset-token';
import { resetTokenStatus } from '@/lib/services/password-reset/reset-password';
import { authenticateUser } from '@/lib/services/users/authenticate-user';
import { mailTo, startMailbox } from './support/review-team';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute, errorOf, sessionCookie } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let smtp: { close: () => Promise<void> };
let ipCounter = 0;
const freshIp = () => `10.9.0.${(ipCounter += 1)}`;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  smtp = await startMailbox();
});
afterAll(async () => {
  await settlePasswordResetRequests();
  await smtp.close();
  await teardownTestDb(dir);
});

async function waitForMail(address: string, count: number) {
  for (let i = 0; i < 100; i += 1) {
    const mails = mailTo(address);
    if (mails.length >= count) return mails;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`no mail #${count} for ${address}`);
}

// `ip` is the socket address as Node's request hook stamps it; `forwardedFor` is whatever the client writes.
function ask(email: string, ip = freshIp(), forwardedFor?: string) {
  const headers = { ...Object.fromEntries([peerStampFor(ip)]), ...(forwardedFor ? { 'x-forwarded-for': forwardedFor } : {}) };
  return callRoute(requestReset, { method: 'POST', body: { email }, headers });
}

function tokenOf(mail: { text: string }): string {
  const link = mail.text.match(/https?:\/\/\S+\/reset-password\/([A-Za-z0-9_-]+)/);
  expect(link, 'the mail carries a reset link').not.toBeNull();
  return link![1]!;
}

describe('password reset', () => {
  it('mails a single-use link; the new password works, the old does not, and old sessions end', async () => {
    const lead = await makeTeamWithLead('reset');
    const oldCookie = await sessionCookie(lead.leadId);
    const before = await callRoute(me, { headers: { cookie: oldCookie } });
    expect(before.status).toBe(200);

    const res = await ask(lead.leadEmail);
    expect(res.status).toBe(202);
    const [mail] = await waitForMail(lead.leadEmail, 1);
    expect(mail!.subject).toBe('Reset your Stepwell password');
    expect(mail!.text).toContain('expires in 1 hour');
    const token = tokenOf(mail!);
    // Only the hash is stored.
    const row = await getDb().models.PasswordResetToken.findOne({ where: { userId: lead.leadId } });
    expect(row!.tokenHash).toBe(hashResetToken(token));
    expect(row!.tokenHash).not.toContain(token);

    const tooShort = await callRoute(resetWithToken, { method: 'POST', params: { token }, body: { password: 'short' } });
    expect(tooShort.status).toBe(400);
    expect(errorOf(tooShort.body).fields).toHaveProperty('password');
    expect(await resetTokenStatus({ token })).toBe('valid');

    // Over 72 bytes (bcrypt would ignore the rest), and the account's own e-mail name part: refused, link unspent.
    const tooLong = await callRoute(resetWithToken, { method: 'POST', params: { token }, body: { password: 'ß'.repeat(30) + 'z'.repeat(13) } });
    expect(tooLong.status).toBe(400);
    expect(errorOf(tooLong.body).fields?.password).toMatch(/at most 72 bytes/);
    const ownName = await callRoute(resetWithToken, { method: 'POST', params: { token }, body: { password: `my-${lead.leadEmail.split('@')[0]}-pass` } });
    expect(ownName.status).toBe(400);
    expect(errorOf(ownName.body)).toMatchObject({ code: 'VALIDATION', fields: { password: expect.stringMatching(/e-mail address/) } });
    expect(await resetTokenStatus({ token })).toBe('valid');

    const done = await callRoute(resetWithToken, { method: 'POST', params: { token }, body: { password: 'a-brand-new-password' } });
    expect(done.status).toBe(200);
    expect(await authenticateUser({ email: lead.leadEmail, password: 'a-brand-new-password' })).toMatchObject({ id: lead.leadId });
    expect(await authenticateUser({ email: lead.leadEmail, password: 'a-strong-password-1' })).toBeNull();

    // The session cookie made before the reset no longer works.
    const after = await callRoute(me, { headers: { cookie: oldCookie } });
    expect(after.status).toBe(401);
    // A sign-in after the reset works.
    expect((await callRoute(me, { userId: lead.leadId })).status).toBe(200);

    const again = await callRoute(resetWithToken, { method: 'POST', params: { token }, body: { password: 'yet-another-password' } });
    expect(again.status).toBe(410);
    expect(errorOf(again.body).message).toMatch(/already been used/);
    expect(await authenticateUser({ email: lead.leadEmail, password: 'yet-another-password' })).toBeNull();
  });

  it('refuses an expired link and an unknown one', async () => {
    const lead = await makeTeamWithLead('late-reset');
    await ask(lead.leadEmail);
    const token = tokenOf((await waitForMail(lead.leadEmail, 1))[0]!);
    await getDb().models.PasswordResetToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: lead.leadId } });
    expect(await resetTokenStatus({ token })).toBe('expired');
    const late = await callRoute(resetWithToken, { method: 'POST', params: { token }, body: { password: 'a-brand-new-password' } });
    expect(late.status).toBe(410);
    expect(errorOf(late.body).message).toMatch(/expired/);
    expect(await authenticateUser({ email: lead.leadEmail, password: 'a-strong-password-1' })).toMatchObject({ id: lead.leadId });

    const unknown = await callRoute(resetWithToken, { method: 'POST', params: { token: 'not-a-real-token' }, body: { password: 'a-brand-new-password' } });
    expect(unknown.status).toBe(404);
    expect(errorOf(unknown.body).code).toBe('NOT_FOUND');
  });

  it('a newer request replaces the earlier link', async () => {
    const lead = await makeTeamWithLead('twice');
    await ask(lead.leadEmail);
    const first = tokenOf((await waitForMail(lead.leadEmail, 1))[0]!);
    await ask(lead.leadEmail);
    const mails = await waitForMail(lead.leadEmail, 2);
    const second = tokenOf(mails[0]!);
    expect(second).not.toBe(first);
    expect(await resetTokenStatus({ token: first })).toBe('unknown');
    expect(await resetTokenStatus({ token: second })).toBe('valid');
  });

  it('answers an unknown address exactly like a known one and sends nothing', async () => {
    const lead = await makeTeamWithLead('known');
    const unknown = await ask('nobody-here@example.test');
    const known = await ask(lead.leadEmail);
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await settlePasswordResetRequests();
    await waitForMail(lead.leadEmail, 1);
    expect(mailTo('nobody-here@example.test')).toHaveLength(0);
    const tokens = await getDb().models.PasswordResetToken.count({ where: { userId: lead.leadId } });
    expect(tokens).toBe(1);
  });

  it('rejects a malformed address with 400 and the standard shape', async () => {
    const res = await ask('not-an-address');
    expect(res.status).toBe(400);
    expect(errorOf(res.body)).toMatchObject({ code: 'VALIDATION', fields: { email: expect.any(String) } });
  });

  it('limits requests per address with a 429 and the wait, whether or not the address exists', async () => {
    for (const email of ['flood-unknown@example.test', (await makeTeamWithLead('flood')).leadEmail]) {
      for (let i = 0; i < 5; i += 1) expect((await ask(email)).status).toBe(202);
      const blocked = await ask(email);
      expect(blocked.status).toBe(429);
      expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
      expect(errorOf(blocked.body)).toMatchObject({ code: 'RATE_LIMITED', message: expect.stringMatching(/Wait \d+ s/) });
    }
  });

  it('limits requests per IP across addresses', async () => {
    const ip = freshIp();
    for (let i = 0; i < 30; i += 1) expect((await ask(`cycle-${i}@example.test`, ip)).status).toBe(202);
    expect((await ask('cycle-last@example.test', ip)).status).toBe(429);
  });

  it('limits per IP whatever X-Forwarded-For the client writes', async () => {
    const ip = freshIp();
    for (let i = 0; i < 30; i += 1) expect((await ask(`forged-${i}@example.test`, ip, `203.0.113.${i}`)).status).toBe(202);
    expect((await ask('forged-last@example.test', ip, '203.0.113.250')).status).toBe(429);
  });
});
