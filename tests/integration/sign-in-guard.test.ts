import { NextRequest } from 'next/server';
import { afterEach, describe, expect, it } from 'vitest';
import { guardCredentialSignIn } from '@/lib/auth/sign-in-guard';
import { peerStampFor } from '@/lib/security/peer-address';

// Stands in for next-auth's credentials callback, which answers a failed sign-in with an error URL.
const nextAuthAnswer = (ok: boolean) => async () =>
  Response.json({ url: ok ? 'http://localhost:3000/routes' : 'http://localhost:3000/api/auth/error?error=CredentialsSignin' }, { status: ok ? 200 : 401 });

// `peer` is the socket address (as Node's request hook stamps it); `forwardedFor` is whatever the client writes.
function attempt(email: string, { peer = '10.0.0.1', forwardedFor }: { peer?: string; forwardedFor?: string } = {}) {
  const headers = new Headers({ 'content-type': 'application/x-www-form-urlencoded' });
  headers.set(...peerStampFor(peer));
  if (forwardedFor) headers.set('x-forwarded-for', forwardedFor);
  return new NextRequest('http://localhost:3000/api/auth/callback/credentials', {
    method: 'POST',
    headers,
    body: new URLSearchParams({ email, password: 'wrong-password', csrfToken: 't' }),
  });
}

const fail = async (email: string, from?: Parameters<typeof attempt>[1]) => (await guardCredentialSignIn(attempt(email, from), nextAuthAnswer(false))).status;
const succeed = async (email: string, from?: Parameters<typeof attempt>[1]) => (await guardCredentialSignIn(attempt(email, from), nextAuthAnswer(true))).status;

afterEach(() => {
  delete process.env.TRUSTED_PROXY_HOPS;
});

describe('sign-in rate limit', () => {
  it('answers 429 with a wait time after ten failures a minute for one e-mail and address', async () => {
    for (let i = 0; i < 10; i += 1) expect(await fail('limit@example.test')).toBe(401);
    const blocked = await guardCredentialSignIn(attempt('limit@example.test'), nextAuthAnswer(true));
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);
    const body = (await blocked.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe('RATE_LIMITED');
    expect(body.error.message).toMatch(/Wait \d+ s/);
  });

  it('keeps other e-mails and other addresses unaffected', async () => {
    expect(await succeed('other@example.test')).toBe(200);
    expect(await succeed('limit@example.test', { peer: '10.0.0.2' })).toBe(200);
  });

  it('does not count successful sign-ins', async () => {
    for (let i = 0; i < 15; i += 1) expect(await succeed('fine@example.test')).toBe(200);
  });
});

describe('sign-in rate limit against a forged or shared address', () => {
  it('cannot be escaped by writing a different X-Forwarded-For on each attempt', async () => {
    for (let i = 0; i < 10; i += 1) expect(await fail('forged@example.test', { peer: '10.1.0.1', forwardedFor: `203.0.113.${i}` })).toBe(401);
    expect(await fail('forged@example.test', { peer: '10.1.0.1', forwardedFor: '203.0.113.200' })).toBe(429);
  });

  it("does not lock the owner out because a stranger at another address used up the account's failures", async () => {
    for (let i = 0; i < 10; i += 1) expect(await fail('owner@example.test', { peer: '10.2.0.66' })).toBe(401);
    expect(await fail('owner@example.test', { peer: '10.2.0.66' })).toBe(429);
    expect(await succeed('owner@example.test', { peer: '10.2.0.7' })).toBe(200);
  });

  it('limits one address trying many accounts (password spraying): 30 failures in 15 minutes', async () => {
    for (let i = 0; i < 30; i += 1) expect(await fail(`spray-${i}@example.test`, { peer: '10.3.0.1' })).toBe(401);
    expect(await fail('spray-last@example.test', { peer: '10.3.0.1' })).toBe(429);
    expect(await fail('spray-last@example.test', { peer: '10.3.0.2' })).toBe(401);
  });

  it('does not count successes from one address against it', async () => {
    for (let i = 0; i < 40; i += 1) expect(await succeed(`office-${i}@example.test`, { peer: '10.4.0.1' })).toBe(200);
  });

  it('caps failures on one account from any number of addresses at 100 an hour', async () => {
    for (let a = 0; a < 10; a += 1) for (let i = 0; i < 10; i += 1) expect(await fail('target@example.test', { peer: `10.5.${a}.1` })).toBe(401);
    expect(await fail('target@example.test', { peer: '10.5.99.1' })).toBe(429);
    expect(await fail('bystander@example.test', { peer: '10.5.99.1' })).toBe(401);
  });

  it('behind one trusted proxy keys on the address it appended, not on what the client wrote before it', async () => {
    process.env.TRUSTED_PROXY_HOPS = '1';
    for (let i = 0; i < 10; i += 1) expect(await fail('proxied@example.test', { peer: '10.9.0.1', forwardedFor: `203.0.113.${i}, 198.51.100.1` })).toBe(401);
    expect(await fail('proxied@example.test', { peer: '10.9.0.1', forwardedFor: '203.0.113.77, 198.51.100.1' })).toBe(429);
    // The same proxy, another client: a bucket of its own.
    expect(await succeed('proxied@example.test', { peer: '10.9.0.1', forwardedFor: '198.51.100.2' })).toBe(200);
  });
});
