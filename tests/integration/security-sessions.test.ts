import { encode } from 'next-auth/jwt';
import { getServerSession } from 'next-auth';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as me } from '@/app/api/me/route';
import { POST as signOutEverywhere } from '@/app/api/me/sign-out-everywhere/route';
import { authOptions } from '@/lib/auth/options';
import { SESSION_ABSOLUTE_MAX_S } from '@/lib/auth/session-policy';
import { makeTeamWithLead } from './support/fixtures';
import { callRoute } from './support/http';
import { setupTestDb, teardownTestDb, TEST_SECRET } from './support/test-db';

let dir = '';

beforeAll(async () => {
  ({ dir } = await setupTestDb());
});
afterAll(async () => {
  await teardownTestDb(dir);
});

async function cookieFor(token: Record<string, unknown>, maxAge?: number) {
  return `next-auth.session-token=${await encode({ token, secret: TEST_SECRET, maxAge })}`;
}

async function meWith(cookie: string) {
  return callRoute(me, { headers: { cookie } });
}

// getServerSession, the path server components take (it runs the jwt callback), with a response that records Set-Cookie.
async function nextAuthSession(cookie: string) {
  const value = cookie.split('=').slice(1).join('=');
  const setCookies: string[] = [];
  const res = {
    getHeader: (name: string) => (name.toLowerCase() === 'set-cookie' ? setCookies : undefined),
    setHeader: (name: string, v: string | string[]) => {
      if (name.toLowerCase() === 'set-cookie') setCookies.splice(0, setCookies.length, ...(Array.isArray(v) ? v : [v]));
    },
  };
  const req = { headers: { host: 'localhost:3000', cookie }, cookies: { 'next-auth.session-token': value } };
  const session = await getServerSession(req as never, res as never, authOptions());
  const cleared = setCookies.some((c) => /^next-auth\.session-token=;/.test(c));
  return { body: (session ?? {}) as { user?: { id?: string } }, cleared };
}

describe('session expiry', () => {
  it('sets an idle lifetime from SESSION_MAX_AGE_S', () => {
    const options = authOptions();
    expect(options.session?.maxAge).toBe(60 * 60 * 12);
    expect(options.jwt?.maxAge).toBe(60 * 60 * 12);
  });

  it('refuses a token past its expiry', async () => {
    const lead = await makeTeamWithLead('expiry');
    // next-auth allows 15 s of clock skew.
    const stale = await cookieFor({ sub: String(lead.leadId) }, -60);
    expect((await meWith(stale)).status).toBe(401);
    const fresh = await cookieFor({ sub: String(lead.leadId) });
    expect((await meWith(fresh)).status).toBe(200);
  });

  it('ends a session older than the absolute limit even while it is kept in use', async () => {
    const lead = await makeTeamWithLead('absolute');
    const now = Math.floor(Date.now() / 1000);
    const old = await cookieFor({ sub: String(lead.leadId), epoch: 0, authAt: now - SESSION_ABSOLUTE_MAX_S - 60 });
    expect((await meWith(old)).status).toBe(401);
    expect((await nextAuthSession(old)).body.user).toBeUndefined();
    const recent = await cookieFor({ sub: String(lead.leadId), epoch: 0, authAt: now - 60 });
    expect((await meWith(recent)).status).toBe(200);
  });
});

describe('sign out everywhere', () => {
  it('ends every earlier session of the caller, for API calls and for pages, and leaves others alone', async () => {
    const lead = await makeTeamWithLead('everywhere');
    const other = await makeTeamWithLead('bystander');
    const laptop = await cookieFor({ sub: String(lead.leadId), epoch: 0, authAt: Math.floor(Date.now() / 1000) });
    const phone = await cookieFor({ sub: String(lead.leadId) });
    const bystander = await cookieFor({ sub: String(other.leadId) });
    expect((await meWith(phone)).status).toBe(200);
    expect((await nextAuthSession(laptop)).body.user?.id).toBe(String(lead.leadId));

    const res = await callRoute(signOutEverywhere, { method: 'POST', headers: { cookie: laptop } });
    expect(res.status).toBe(200);
    expect((await getDb().models.User.findByPk(lead.leadId))!.sessionEpoch).toBe(1);

    expect((await meWith(laptop)).status).toBe(401);
    expect((await meWith(phone)).status).toBe(401);
    const page = await nextAuthSession(laptop);
    expect(page.body.user).toBeUndefined();
    // next-auth clears the dead cookie.
    expect(page.cleared).toBe(true);
    expect((await meWith(bystander)).status).toBe(200);

    // A sign-in after the call carries the new epoch and works.
    const again = await cookieFor({ sub: String(lead.leadId), epoch: 1, authAt: Math.floor(Date.now() / 1000) });
    expect((await meWith(again)).status).toBe(200);
    expect((await nextAuthSession(again)).body.user?.id).toBe(String(lead.leadId));
  });

  it('needs a session', async () => {
    const res = await callRoute(signOutEverywhere, { method: 'POST' });
    expect(res.status).toBe(401);
  });

  it('stamps the epoch and sign-in time into a new token', async () => {
    const lead = await makeTeamWithLead('stamp');
    await getDb().models.User.update({ sessionEpoch: 4 }, { where: { id: lead.leadId } });
    const jwt = authOptions().callbacks!.jwt!;
    const token = await jwt({ token: {}, user: { id: String(lead.leadId), email: lead.leadEmail }, account: null } as Parameters<typeof jwt>[0]);
    expect(token).toMatchObject({ sub: String(lead.leadId), epoch: 4, authAt: expect.any(Number) });
    await expect(jwt({ token: { sub: String(lead.leadId), epoch: 3 } } as unknown as Parameters<typeof jwt>[0])).rejects.toThrow(/session has ended/);
  });
});
