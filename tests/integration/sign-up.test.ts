import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { POST as signup } from '@/app/api/signup/route';
import { verifyPassword } from '@/lib/auth/password';
import { authenticateUser } from '@/lib/services/users/authenticate-user';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
beforeAll(async () => ({ dir } = await setupTestDb()));
afterAll(async () => teardownTestDb(dir));

const valid = { name: 'Rosalind Achterberg', email: 'Rosalind@Example.test', password: 'correct-horse-9', teamName: 'Scale-up group' };

describe('sign-up', () => {
  it('creates the user, a team and a lead membership, with a bcrypt hash', async () => {
    const res = await callRoute(signup, { method: 'POST', body: valid });
    expect(res.status).toBe(201);
    const { User, Membership, Team } = getDb().models;
    const user = await User.findOne({ where: { email: 'rosalind@example.test' } });
    expect(user).not.toBeNull();
    expect(user!.passwordHash).toMatch(/^\$2[aby]\$10\$/);
    expect(await verifyPassword(valid.password, user!.passwordHash)).toBe(true);
    const membership = await Membership.findOne({ where: { userId: user!.id } });
    expect(membership?.role).toBe('lead');
    expect((await Team.findByPk(membership!.teamId))?.name).toBe('Scale-up group');
  });

  it('refuses an e-mail already taken with a field error', async () => {
    const res = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'rosalind@example.test' } });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields?.email).toMatch(/already exists/);
  });

  it('refuses a password shorter than 10 characters with a field error', async () => {
    const res = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'short@example.test', password: 'short' } });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields?.password).toMatch(/at least 10/);
  });

  it('refuses a password over 72 bytes (bcrypt would ignore the rest), counting bytes, not characters', async () => {
    // 55 characters but 74 bytes in UTF-8.
    const password = 'Grüße-aus-Köln-'.repeat(3) + 'äöüäöüäöüä';
    expect([password.length, new TextEncoder().encode(password).length]).toEqual([55, 74]);
    const res = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'bytes@example.test', password } });
    expect(res.status).toBe(400);
    expect(errorOf(res.body)).toMatchObject({ code: 'VALIDATION', fields: { password: expect.stringMatching(/at most 72 bytes/) } });
    expect(await getDb().models.User.count({ where: { email: 'bytes@example.test' } })).toBe(0);
  });

  it('refuses a password containing the e-mail address or its name part, and a common one', async () => {
    const withName = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'hanne.lind@example.test', password: 'Hanne.Lind-2026' } });
    expect(withName.status).toBe(400);
    expect(errorOf(withName.body).fields?.password).toMatch(/e-mail address/);
    const common = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'common@example.test', password: 'Password2026!' } });
    expect(common.status).toBe(400);
    expect(errorOf(common.body).fields?.password).toMatch(/most common/);
  });

  it('refuses a malformed e-mail and unknown fields', async () => {
    const bad = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'not-an-email' } });
    expect(errorOf(bad.body).fields?.email).toBeTruthy();
    const extra = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'x@example.test', role: 'lead' } });
    expect(extra.status).toBe(400);
  });

  it('writes nothing when any part fails (transaction)', async () => {
    const before = await getDb().models.Team.count();
    await callRoute(signup, { method: 'POST', body: { ...valid, email: 'rosalind@example.test', teamName: 'Should not exist' } });
    expect(await getDb().models.Team.count()).toBe(before);
  });

  it('answers 413 to a JSON body over 1 MB and 400 to invalid JSON', async () => {
    const huge = await callRoute(signup, { method: 'POST', rawBody: JSON.stringify({ ...valid, name: 'x'.repeat(1_100_000) }), headers: { 'content-type': 'application/json' } });
    expect(huge.status).toBe(413);
    expect(errorOf(huge.body).code).toBe('PAYLOAD_TOO_LARGE');
    const broken = await callRoute(signup, { method: 'POST', rawBody: '{"name":', headers: { 'content-type': 'application/json' } });
    expect(broken.status).toBe(400);
  });

  it('refuses a cross-site origin on a write', async () => {
    const res = await callRoute(signup, { method: 'POST', body: { ...valid, email: 'cross@example.test' }, headers: { origin: 'https://evil.example', host: 'localhost:3000' } });
    expect(res.status).toBe(403);
  });
});

describe('sign-in credentials check', () => {
  it('accepts the right password and rejects a wrong one or an unknown user', async () => {
    expect(await authenticateUser({ email: 'rosalind@example.test', password: valid.password })).toMatchObject({ email: 'rosalind@example.test' });
    expect(await authenticateUser({ email: 'rosalind@example.test', password: 'wrong-password-1' })).toBeNull();
    expect(await authenticateUser({ email: 'nobody@example.test', password: valid.password })).toBeNull();
  });
});
