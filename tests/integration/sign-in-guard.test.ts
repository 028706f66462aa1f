import { NextRequest } from 'next/server';
import { describe, expect, it } from 'vitest';
import { guardCredentialSignIn } from '@/lib/auth/sign-in-guard';

// Stands in for next-auth's credentials callback, which answers a failed sign-in with an error URL.
const nextAuthAnswer = (ok: boolean) => async () =>
  Response.json({ url: ok ? 'http://localhost:3000/routes' : 'http://localhost:3000/api/auth/error?error=CredentialsSignin' }, { status: ok ? 200 : 401 });

function attempt(email: string, ip = '10.0.0.1') {
  return new NextRequest('http://localhost:3000/api/auth/callback/credentials', {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-forwarded-for': ip },
    body: new URLSearchParams({ email, password: 'wrong-password', csrfToken: 't' }),
  });
}

describe('sign-in rate limit', () => {
  it('answers 429 with a wait time after ten failures a minute for one e-mail and IP', async () => {
    for (let i = 0; i < 10; i += 1) expect((await guardCredentialSignIn(attempt('limit@example.test'), nextAuthAnswer(false))).status).toBe(401);
    const blocked = await guardCredentialSignIn(attempt('limit@example.test'), nextAuthAnswer(true));
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
    const body = (await blocked.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe('RATE_LIMITED');
    expect(body.error.message).toMatch(/Wait \d+ s/);
  });

  it('keeps other e-mails and other IPs unaffected', async () => {
    expect((await guardCredentialSignIn(attempt('other@example.test'), nextAuthAnswer(true))).status).toBe(200);
    expect((await guardCredentialSignIn(attempt('limit@example.test', '10.0.0.2'), nextAuthAnswer(true))).status).toBe(200);
  });

  it('does not count successful sign-ins', async () => {
    for (let i = 0; i < 15; i += 1) expect((await guardCredentialSignIn(attempt('fine@example.test'), nextAuthAnswer(true))).status).toBe(200);
  });
});
