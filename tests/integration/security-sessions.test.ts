import { encode } from 'next-auth/jwt';
import NextAuth, { getServerSession } from 'next-auth';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { GET as me } from '@/app/api/me/route';
import { POST as signOutEverywhere } from '@/app/api/me/sign-out-everywhere/route';
import { authOptions } from '@/lib/auth/options';
import { revokeSession, SESSION_ABSOLUTE_MAX_S } from '@/lib/auth/session-policy';
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

// next-auth's own endpoints with our options, called in-process the way a browser calls them, cookies kept between
// calls. Its App Router adapter reads next/headers, which needs a Next request scope, so this goes through its
// Node-style adapter instead: the same core (CSRF check, callbacks, events, cookies) behind both.
class Browser {
  readonly cookies = new Map<string, string>();

  sessionCookie(): string {
    return `next-auth.session-token=${this.cookies.get('next-auth.session-token') ?? ''}`;
  }

  async call(method: 'GET' | 'POST', action: string, body?: Record<string, string>): Promise<{ status: number; body: unknown }> {
    const setCookies: string[] = [];
    const answer: { status: number; body: unknown } = { status: 200, body: undefined };
    const res = {
      status(code: number) {
        answer.status = code;
        return res;
      },
      getHeader: (name: string) => (name.toLowerCase() === 'set-cookie' ? [...setCookies] : undefined),
      setHeader(name: string, value: string | string[]) {
        if (name.toLowerCase() === 'set-cookie') setCookies.splice(0, setCookies.length, ...(Array.isArray(value) ? value : [value]));
        return res;
      },
      end: () => undefined,
      json: (value: unknown) => void (answer.body = value),
      send: (value: unknown) => void (answer.body = value),
    };
    const req = {
      method,
      query: { nextauth: action.split('/') },
      body,
      cookies: Object.fromEntries(this.cookies),
      headers: { host: 'localhost:3000', cookie: [...this.cookies].map(([k, v]) => `${k}=${encodeURIComponent(v)}`).join('; ') },
    };
    await NextAuth(req as never, res as never, authOptions());
    for (const line of setCookies) {
      const [pair = '', ...attributes] = line.split(';');
      const [name = '', ...rest] = pair.split('=');
      if (attributes.some((a) => /^\s*max-age=0$/i.test(a))) this.cookies.delete(name.trim());
      else this.cookies.set(name.trim(), decodeURIComponent(rest.join('=')));
    }
    return answer;
  }

  async csrf(): Promise<string> {
    return ((await this.call('GET', 'csrf')).body as { csrfToken: string }).csrfToken;
  }

  async signIn(email: string, password: string): Promise<void> {
    const res = await this.call('POST', 'callback/credentials', { email, password, csrfToken: await this.csrf(), json: 'true' });
    expect(res.status, JSON.stringify(res.body)).toBeLessThan(400);
    expect(this.cookies.get('next-auth.session-token'), 'a session cookie after signing in').toBeTruthy();
  }

  async signOut() {
    return this.call('POST', 'signout', { csrfToken: await this.csrf(), callbackUrl: '/sign-in', json: 'true' });
  }
}

describe('sign out', () => {
  // next-auth warns without it; http, so the cookie keeps its plain name.
  beforeAll(() => {
    process.env.NEXTAUTH_URL = 'http://localhost:3000';
  });
  afterAll(() => {
    delete process.env.NEXTAUTH_URL;
  });

  it('ends the session on the server: a copy of the cookie taken before gets 401, other sessions go on', async () => {
    const lead = await makeTeamWithLead('signout');
    const laptop = new Browser();
    const phone = new Browser();
    await laptop.signIn(lead.leadEmail, 'a-strong-password-1');
    await phone.signIn(lead.leadEmail, 'a-strong-password-1');
    const copied = laptop.sessionCookie();
    expect((await meWith(copied)).status).toBe(200);

    const res = await laptop.signOut();
    expect(res).toMatchObject({ status: 200, body: { url: 'http://localhost:3000/sign-in' } });
    expect(laptop.cookies.has('next-auth.session-token'), 'the browser forgets the cookie').toBe(false);

    const afterwards = await meWith(copied);
    expect(afterwards.status).toBe(401);
    expect(afterwards.body).toMatchObject({ error: { code: 'UNAUTHENTICATED', message: expect.any(String) } });
    const page = await nextAuthSession(copied);
    expect(page.body.user).toBeUndefined();
    expect(page.cleared).toBe(true);

    // Only that session: the phone is still signed in, and signing in again works.
    expect((await meWith(phone.sessionCookie())).status).toBe(200);
    await laptop.signIn(lead.leadEmail, 'a-strong-password-1');
    expect((await meWith(laptop.sessionCookie())).status).toBe(200);
  });

  it('keeps the session id through next-auth refreshes, so a refreshed copy is refused too', async () => {
    const lead = await makeTeamWithLead('refresh');
    const browser = new Browser();
    await browser.signIn(lead.leadEmail, 'a-strong-password-1');
    const first = browser.sessionCookie();
    await browser.call('GET', 'session'); // next-auth re-encodes the token (new jti, new expiry)
    const refreshed = browser.sessionCookie();
    expect(refreshed).not.toBe(first);
    await browser.signOut();
    expect((await meWith(first)).status).toBe(401);
    expect((await meWith(refreshed)).status).toBe(401);
  });

  it('stamps a session id at sign-in and sweeps revocations once their tokens would have expired', async () => {
    const lead = await makeTeamWithLead('sweep');
    const jwt = authOptions().callbacks!.jwt!;
    const token = await jwt({ token: {}, user: { id: String(lead.leadId), email: lead.leadEmail }, account: null } as Parameters<typeof jwt>[0]);
    expect(token.sid).toEqual(expect.stringMatching(/^[0-9a-f-]{36}$/));
    const { RevokedSession } = getDb().models;
    const longAgo = Math.floor(Date.now() / 1000) - SESSION_ABSOLUTE_MAX_S - 3600;
    expect(await revokeSession({ sub: String(lead.leadId), sid: 'old-session', authAt: longAgo })).toBe(true);
    expect(await RevokedSession.findByPk('old-session')).toBeNull(); // already past its expiry: swept at once
    expect(await revokeSession({ sub: String(lead.leadId), sid: token.sid, authAt: token.authAt })).toBe(true);
    expect(await revokeSession({ sub: String(lead.leadId), sid: token.sid, authAt: token.authAt })).toBe(true); // twice is fine
    expect((await RevokedSession.findByPk(token.sid as string))?.userId).toBe(lead.leadId);
    await expect(jwt({ token } as unknown as Parameters<typeof jwt>[0])).rejects.toThrow(/session has ended/);
    // A token from before session ids has nothing to revoke.
    expect(await revokeSession({ sub: String(lead.leadId), authAt: token.authAt })).toBe(false);
  });
});
