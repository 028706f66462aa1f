// The in-memory rate-limit store, the limiter on top of it and enforceLimits, with a plain number clock.
import { afterEach, describe, expect, it } from 'vitest';
import { AppError } from '@/lib/api/errors';
import { createRateLimiter, enforceLimits } from '@/lib/security/rate-limit';
import { createMemoryStore, rateLimitStore, stateStoreKind } from '@/lib/security/rate-limit-store';

const MINUTE = 60_000;

describe('memory store', () => {
  it('counts hits in one window and starts a new one when windowMs has passed', async () => {
    const store = createMemoryStore();
    expect(await store.hit('k', MINUTE, 1000)).toEqual({ count: 1, windowStart: 1000 });
    expect(await store.hit('k', MINUTE, 2000)).toEqual({ count: 2, windowStart: 1000 });
    expect(await store.hit('k', MINUTE, 1000 + MINUTE - 1)).toEqual({ count: 3, windowStart: 1000 });
    expect(await store.hit('k', MINUTE, 1000 + MINUTE)).toEqual({ count: 1, windowStart: 1000 + MINUTE });
    expect(await store.hit('other', MINUTE, 2000)).toEqual({ count: 1, windowStart: 2000 });
  });

  it('refunds a hit only in the window it was counted in', async () => {
    const store = createMemoryStore();
    await store.hit('k', MINUTE, 0);
    const second = await store.hit('k', MINUTE, 10);
    await store.refund('k', second);
    expect(await store.hit('k', MINUTE, 20)).toEqual({ count: 2, windowStart: 0 });
    // The window has ended and a new one opened: a refund for the old one leaves the new count alone.
    const fresh = await store.hit('k', MINUTE, MINUTE);
    await store.refund('k', second);
    expect(fresh.count).toBe(1);
    expect(await store.hit('k', MINUTE, MINUTE + 1)).toEqual({ count: 2, windowStart: MINUTE });
  });

  it('forgets a key on reset', async () => {
    const store = createMemoryStore();
    for (let i = 0; i < 4; i += 1) await store.hit('k', MINUTE, i);
    await store.reset('k');
    expect(await store.hit('k', MINUTE, 5)).toEqual({ count: 1, windowStart: 5 });
  });

  it('prunes ended windows once it holds more than maxKeys keys, keeping open ones', async () => {
    const store = createMemoryStore({ maxKeys: 3 });
    await store.hit('a', 100, 0);
    await store.hit('b', 100, 0);
    await store.hit('long', 10_000, 0);
    expect(store.size).toBe(3);
    await store.hit('d', 100, 500);
    expect(store.size).toBe(2); // a and b ended at 100 and are gone; long and d stay
    expect(await store.hit('long', 10_000, 600)).toEqual({ count: 2, windowStart: 0 });
  });
});

describe('rate limiter', () => {
  it('allows `limit` attempts a window, then denies with the seconds until the window ends', async () => {
    let now = 1_000_000;
    const store = createMemoryStore();
    const limiter = createRateLimiter({ name: 't', limit: 3, windowMs: MINUTE, store: () => store, clock: () => now });
    for (let i = 0; i < 3; i += 1) expect((await limiter.take('k')).allowed).toBe(true);
    now += 10_500;
    const denied = await limiter.take('k');
    expect(denied).toMatchObject({ allowed: false, retryAfterSeconds: 50 }); // 49.5 s left, rounded up
    now = 1_000_000 + MINUTE - 100;
    expect((await limiter.take('k')).retryAfterSeconds).toBe(1); // never 0 while denied
    now = 1_000_000 + MINUTE;
    expect(await limiter.take('k')).toMatchObject({ allowed: true, retryAfterSeconds: 0 });
  });

  it('shares counts between limiters of one name on one store, and keeps names apart', async () => {
    const store = createMemoryStore();
    const make = (name: string) => createRateLimiter({ name, limit: 2, windowMs: MINUTE, store: () => store, clock: () => 0 });
    const [first, second, other] = [make('shared'), make('shared'), make('other')];
    expect((await first.take('k')).allowed).toBe(true);
    expect((await second.take('k')).allowed).toBe(true);
    expect((await first.take('k')).allowed).toBe(false);
    expect((await other.take('k')).allowed).toBe(true);
  });
});

describe('enforceLimits', () => {
  const setup = () => {
    const store = createMemoryStore();
    const opts = { windowMs: MINUTE, store: () => store, clock: () => 0 };
    return { store, wide: createRateLimiter({ name: 'wide', limit: 5, ...opts }), narrow: createRateLimiter({ name: 'narrow', limit: 1, ...opts }) };
  };

  it('throws a 429 AppError with Retry-After when any pair is over, and a denied request counts on no pair', async () => {
    const { store, wide, narrow } = setup();
    await enforceLimits([[wide, 'k'], [narrow, 'k']], (w) => `Wait ${w} s`);
    const error = await enforceLimits([[wide, 'k'], [narrow, 'k']], (w) => `Wait ${w} s`).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect(error).toMatchObject({ code: 'RATE_LIMITED', status: 429, message: 'Wait 60 s', headers: { 'Retry-After': '60' } });
    // Both hits of the denied request were taken back: the next hit on each is the second.
    expect((await store.hit('wide:k', MINUTE, 0)).count).toBe(2);
    expect((await store.hit('narrow:k', MINUTE, 0)).count).toBe(2);
  });

  it('reports the longest wait of the pairs that are over', async () => {
    const store = createMemoryStore();
    let now = 0;
    const early = createRateLimiter({ name: 'early', limit: 1, windowMs: MINUTE, store: () => store, clock: () => now });
    const late = createRateLimiter({ name: 'late', limit: 1, windowMs: MINUTE, store: () => store, clock: () => now });
    await enforceLimits([[early, 'k']], String);
    now = 30_000;
    await enforceLimits([[late, 'k']], String);
    const error = await enforceLimits([[early, 'k'], [late, 'k']], String).catch((e: unknown) => e);
    expect(error).toMatchObject({ message: '60', headers: { 'Retry-After': '60' } }); // late: 60 s left; early: 30 s
  });

  it('lets exactly `limit` of many concurrent requests through', async () => {
    const { wide } = setup();
    const outcomes = await Promise.allSettled(Array.from({ length: 40 }, () => enforceLimits([[wide, 'k']], String)));
    expect(outcomes.filter((o) => o.status === 'fulfilled')).toHaveLength(5);
  });
});

describe('store selection', () => {
  const saved = { STATE_STORE: process.env.STATE_STORE, DATABASE_URL: process.env.DATABASE_URL };
  afterEach(() => {
    for (const [name, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  });

  it('follows the database unless STATE_STORE says otherwise', () => {
    delete process.env.STATE_STORE;
    delete process.env.DATABASE_URL;
    expect(stateStoreKind()).toBe('memory');
    process.env.DATABASE_URL = 'postgres://u:p@db.example.test:5432/stepwell';
    expect(stateStoreKind()).toBe('database');
    process.env.STATE_STORE = 'memory';
    expect(stateStoreKind()).toBe('memory');
    delete process.env.DATABASE_URL;
    process.env.STATE_STORE = 'database';
    expect(stateStoreKind()).toBe('database');
  });

  it('keeps one store per kind for the process', () => {
    process.env.STATE_STORE = 'memory';
    const memory = rateLimitStore();
    expect(rateLimitStore()).toBe(memory);
    process.env.STATE_STORE = 'database';
    const database = rateLimitStore();
    expect(database).not.toBe(memory);
    expect(rateLimitStore()).toBe(database);
    process.env.STATE_STORE = 'memory';
    expect(rateLimitStore()).toBe(memory);
  });
});
