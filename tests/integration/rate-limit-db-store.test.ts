// The database rate-limit store on a migrated database (SQLite, or PostgreSQL on that run): windows, expiry,
// refunds, the sweep, no lost increments under concurrency, and two app instances sharing one count.
import pg from 'pg';
import { QueryTypes, Sequelize } from 'sequelize';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { createRateLimiter, enforceLimits, signUpLimiter } from '@/lib/security/rate-limit';
import { createDatabaseStore } from '@/lib/security/rate-limit-db-store';
import { stateStoreKind } from '@/lib/security/rate-limit-store';
import { onPostgres, setupTestDb, teardownTestDb } from './support/test-db';

const MINUTE = 60_000;
const T0 = 1_800_000_000_000; // an arbitrary epoch-ms start, beyond 32 bits as real times are

let dir = '';
let file = '';
// A second connection pool to the same database, standing in for another app instance.
let other: Sequelize;

beforeAll(async () => {
  ({ dir, file } = await setupTestDb());
  if (onPostgres) {
    other = new Sequelize(process.env.DATABASE_URL!, { dialect: 'postgres', dialectModule: pg, logging: false, pool: { max: 10 } });
  } else {
    other = new Sequelize({ dialect: 'sqlite', dialectModule: sqlite3, storage: file, logging: false });
    await other.query('PRAGMA busy_timeout = 5000'); // its one shared connection waits for the other writer instead of failing
  }
});
afterAll(async () => {
  await other.close();
  await teardownTestDb(dir);
});

const rows = () =>
  getDb().sequelize.query<{ key: string; count: number }>('SELECT key, count FROM rate_limit_windows ORDER BY key', { type: QueryTypes.SELECT });
const countOf = async (key: string) => (await rows()).find((r) => r.key === key)?.count;

describe('database rate-limit store', () => {
  it('counts hits in one window, in a row of rate_limit_windows', async () => {
    const store = createDatabaseStore();
    expect(await store.hit('count', MINUTE, T0)).toEqual({ count: 1, windowStart: T0 });
    expect(await store.hit('count', MINUTE, T0 + 5)).toEqual({ count: 2, windowStart: T0 });
    expect(await store.hit('count', MINUTE, T0 + MINUTE - 1)).toEqual({ count: 3, windowStart: T0 });
    expect(Number(await countOf('count'))).toBe(3);
  });

  it('starts a fresh window at 1 once windowMs has passed', async () => {
    const store = createDatabaseStore();
    await store.hit('expiry', MINUTE, T0);
    await store.hit('expiry', MINUTE, T0 + 1);
    expect(await store.hit('expiry', MINUTE, T0 + MINUTE)).toEqual({ count: 1, windowStart: T0 + MINUTE });
    expect(await store.hit('expiry', MINUTE, T0 + MINUTE + 1)).toEqual({ count: 2, windowStart: T0 + MINUTE });
  });

  it('refunds only within the same window, and forgets a key on reset', async () => {
    const store = createDatabaseStore();
    await store.hit('refund', MINUTE, T0);
    const second = await store.hit('refund', MINUTE, T0 + 1);
    await store.refund('refund', second);
    expect((await store.hit('refund', MINUTE, T0 + 2)).count).toBe(2);
    await store.hit('refund', MINUTE, T0 + MINUTE); // a new window
    await store.refund('refund', second);
    expect((await store.hit('refund', MINUTE, T0 + MINUTE + 1)).count).toBe(2);
    await store.reset('refund');
    expect(await countOf('refund')).toBeUndefined();
    expect(await store.hit('refund', MINUTE, T0 + MINUTE + 2)).toEqual({ count: 1, windowStart: T0 + MINUTE + 2 });
  });

  it('sweeps ended windows every sweepEvery hits and keeps open ones', async () => {
    const store = createDatabaseStore({ sweepEvery: 3 });
    await store.hit('sweep-short', 100, T0);
    await store.hit('sweep-long', 10 * MINUTE, T0);
    expect(await countOf('sweep-short')).toBeDefined();
    await store.hit('sweep-new', MINUTE, T0 + 1000); // the third hit: the sweep runs
    const keys = (await rows()).map((r) => r.key);
    expect(keys).not.toContain('sweep-short');
    expect(keys).toEqual(expect.arrayContaining(['sweep-long', 'sweep-new']));
  });

  it('loses no increment: 50 concurrent hits on one key get the counts 1..50, once each', async () => {
    const store = createDatabaseStore();
    const counts = (await Promise.all(Array.from({ length: 50 }, () => store.hit('crowd', MINUTE, T0)))).map((w) => w.count);
    expect(counts.sort((a, b) => a - b)).toEqual(Array.from({ length: 50 }, (_, i) => i + 1));
  });

  it('loses no increment across two instances with their own connections', async () => {
    const here = createDatabaseStore();
    const there = createDatabaseStore({ sequelize: () => other });
    const hits = Array.from({ length: 50 }, (_, i) => (i % 2 ? here : there).hit('two-crowd', MINUTE, T0));
    const counts = (await Promise.all(hits)).map((w) => w.count);
    expect(counts.sort((a, b) => a - b)).toEqual(Array.from({ length: 50 }, (_, i) => i + 1));
  });

  it('shares one limit between limiters of two instances', async () => {
    const stores = [createDatabaseStore(), createDatabaseStore({ sequelize: () => other })];
    const [a, b] = stores.map((store) => createRateLimiter({ name: 'shared', limit: 5, windowMs: MINUTE, store: () => store, clock: () => T0 }));
    for (let i = 0; i < 5; i += 1) expect((await (i % 2 ? a! : b!).take('ip')).allowed).toBe(true);
    expect(await a!.take('ip')).toMatchObject({ allowed: false, retryAfterSeconds: 60 });
    expect(await b!.take('ip')).toMatchObject({ allowed: false, retryAfterSeconds: 60 });
    // enforceLimits refunds its denied hit; the two bare take()s above stay counted.
    await expect(enforceLimits([[a!, 'ip']], String)).rejects.toMatchObject({ code: 'RATE_LIMITED' });
    expect(Number(await countOf('shared:ip'))).toBe(7);
  });

  it('lets exactly the limit through when 40 requests race on two instances', async () => {
    const stores = [createDatabaseStore(), createDatabaseStore({ sequelize: () => other })];
    const limiters = stores.map((store) => createRateLimiter({ name: 'race', limit: 10, windowMs: MINUTE, store: () => store, clock: () => T0 }));
    const outcomes = await Promise.allSettled(Array.from({ length: 40 }, (_, i) => enforceLimits([[limiters[i % 2]!, 'k']], String)));
    expect(outcomes.filter((o) => o.status === 'fulfilled')).toHaveLength(10);
    expect(Number(await countOf('race:k'))).toBe(10); // every denied hit was refunded
  });

  it('is the default store on PostgreSQL and memory on SQLite; with STATE_STORE=database the named limiters write here', async () => {
    expect(stateStoreKind()).toBe(onPostgres ? 'database' : 'memory');
    process.env.STATE_STORE = 'database';
    try {
      expect((await signUpLimiter().take('10.30.0.1')).allowed).toBe(true);
      expect(Number(await countOf('sign-up:10.30.0.1'))).toBe(1);
    } finally {
      delete process.env.STATE_STORE;
    }
  });
});
