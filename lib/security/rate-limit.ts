import { AppError } from '../api/errors';
import { rateLimitStore, type RateLimitStore, type RateWindow } from './rate-limit-store';

export interface RateLimitResult {
  allowed: boolean;
  retryAfterSeconds: number;
  /** the window the hit landed in, for refund() */
  window: RateWindow;
}

export interface RateLimiter {
  readonly name: string;
  /** Counts one attempt on key; allowed while its window holds at most `limit` attempts. */
  take(key: string): Promise<RateLimitResult>;
  /** Takes back an attempt counted by take() (only while its window is open). */
  refund(key: string, window: RateWindow): Promise<void>;
  reset(key: string): Promise<void>;
}

// Fixed window per key. The store (memory for one instance, the database for several) is asked on every call,
// so it follows STATE_STORE and the database of the moment; clock is injectable for tests.
export function createRateLimiter({
  name,
  limit,
  windowMs,
  store = rateLimitStore,
  clock = Date.now,
}: {
  name: string;
  limit: number;
  windowMs: number;
  store?: () => RateLimitStore;
  clock?: () => number;
}): RateLimiter {
  // Limiters share one store, so each keeps its own part of the key space.
  const storeKey = (key: string) => `${name}:${key}`;
  return {
    name,
    async take(key) {
      const now = clock();
      const window = await store().hit(storeKey(key), windowMs, now);
      if (window.count <= limit) return { allowed: true, retryAfterSeconds: 0, window };
      return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil((window.windowStart + windowMs - now) / 1000)), window };
    },
    refund: (key, window) => store().refund(storeKey(key), window),
    reset: (key) => store().reset(storeKey(key)),
  };
}

export function namedLimiter(name: string, opts: { limit: number; windowMs: number }): RateLimiter {
  return createRateLimiter({ name, ...opts });
}

// Failed sign-ins. Keyed on account and address, so a stranger's guesses never lock the owner out of another address;
// per address across accounts, against one password tried on many accounts (spraying); and a far higher ceiling per
// account from anywhere, so many addresses together still guess slowly.
export const signInLimiter = () => namedLimiter('sign-in', { limit: 10, windowMs: 60_000 });
export const signInByAddressLimiter = () => namedLimiter('sign-in-address', { limit: 30, windowMs: 15 * 60_000 });
export const signInByAccountLimiter = () => namedLimiter('sign-in-account', { limit: 100, windowMs: 60 * 60_000 });
export const signUpLimiter = () => namedLimiter('sign-up', { limit: 20, windowMs: 60 * 60_000 });
export const inviteLimiter = () => namedLimiter('invite', { limit: 50, windowMs: 60 * 60_000 });
// Per address (so one inbox is not flooded) and per IP (so addresses cannot be cycled); both apply whether or not the address exists.
export const resetByEmailLimiter = () => namedLimiter('reset-email', { limit: 5, windowMs: 60 * 60_000 });
export const resetByIpLimiter = () => namedLimiter('reset-ip', { limit: 30, windowMs: 60 * 60_000 });

/** The hits enforceLimits counted, so a caller can take them back when the attempt turns out not to count (a success). */
export interface CountedHits {
  refund(): Promise<void>;
}

/**
 * Counts a hit on every (limiter, key) pair and lets the request through only when all allow; otherwise
 * refunds every hit (a denied request counts nowhere) and throws a 429 with the longest wait.
 * Hit first, check after: each hit is atomic, so concurrent requests on any instance can never pass more than
 * the limit (checking first and counting after would let them all pass one check). The cost is that a
 * concurrent request may be denied while another's refund is still in flight, never that one slips through.
 */
export async function enforceLimits(pairs: ReadonlyArray<readonly [RateLimiter, string]>, message: (waitS: number) => string): Promise<CountedHits> {
  const taken = await Promise.all(pairs.map(async ([limiter, key]) => ({ limiter, key, result: await limiter.take(key) })));
  const refund = async () => {
    await Promise.all(taken.map((t) => t.limiter.refund(t.key, t.result.window)));
  };
  const waits = taken.filter((t) => !t.result.allowed).map((t) => t.result.retryAfterSeconds);
  if (!waits.length) return { refund };
  await refund();
  const wait = Math.max(...waits);
  throw new AppError('RATE_LIMITED', message(wait), { headers: { 'Retry-After': String(wait) } });
}
