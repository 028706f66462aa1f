import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as signUp } from '@/app/api/signup/route';
import { POST as invite } from '@/app/api/teams/[teamId]/invitations/route';
import { peerStampFor } from '@/lib/security/peer-address';
import { makeTeamWithLead } from './support/fixtures';
import { startMailbox } from './support/review-team';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let smtp: { close: () => Promise<void> };

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  smtp = await startMailbox();
});
afterAll(async () => {
  await smtp.close();
  await teardownTestDb(dir);
});

function expectRateLimited(res: { status: number; body: unknown; headers: Headers }) {
  expect(res.status).toBe(429);
  const wait = Number(res.headers.get('retry-after'));
  expect(wait).toBeGreaterThan(0);
  expect(errorOf(res.body)).toMatchObject({ code: 'RATE_LIMITED', message: expect.stringContaining(`Wait ${wait} s`) });
}

let n = 0;
const account = () => ({ name: 'Baptiste Osei', email: `limit-${(n += 1)}@example.test`, password: 'a-strong-password-1', teamName: 'Process Development' });

// `peer` is the socket address as Node's request hook stamps it; X-Forwarded-For is whatever the client writes.
const from = (peer: string, forwardedFor?: string) => ({ ...Object.fromEntries([peerStampFor(peer)]), ...(forwardedFor ? { 'x-forwarded-for': forwardedFor } : {}) });

describe('sign-up rate limit', () => {
  it('allows 20 sign-ups an hour from one address, then answers 429 with the wait', async () => {
    for (let i = 0; i < 20; i += 1) expect((await callRoute(signUp, { method: 'POST', body: account(), headers: from('10.20.0.1') })).status).toBe(201);
    expectRateLimited(await callRoute(signUp, { method: 'POST', body: account(), headers: from('10.20.0.1') }));
    expect((await callRoute(signUp, { method: 'POST', body: account(), headers: from('10.20.0.2') })).status).toBe(201);
  });

  it('is not escaped by writing a new X-Forwarded-For on each request', async () => {
    for (let i = 0; i < 20; i += 1) expect((await callRoute(signUp, { method: 'POST', body: account(), headers: from('10.21.0.1', `203.0.113.${i}`) })).status).toBe(201);
    expectRateLimited(await callRoute(signUp, { method: 'POST', body: account(), headers: from('10.21.0.1', '203.0.113.250') }));
  });
});

describe('invitation rate limit', () => {
  it('allows 50 invitations an hour per team, then answers 429 with the wait; other teams are unaffected', async () => {
    const team = await makeTeamWithLead('flood');
    const other = await makeTeamWithLead('calm');
    const send = (t: typeof team, i: number) =>
      callRoute(invite, { method: 'POST', userId: t.leadId, params: { teamId: String(t.teamId) }, body: { email: `invitee-${t.teamId}-${i}@example.test`, role: 'reviewer' } });
    for (let i = 0; i < 50; i += 1) expect((await send(team, i)).status).toBe(201);
    expectRateLimited(await send(team, 50));
    expect((await send(other, 0)).status).toBe(201);
  });
});
