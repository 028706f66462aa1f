import { AppError } from '../api/errors';

export interface RateLimitResult {
  allowed: boolean;
  retryAfterSeconds: number;
}

export interface RateLimiter {
  check(key: string): RateLimitResult;
  hit(key: string): void;
  reset(key: string): void;
}

// Fixed window per key, in memory: fine for one instance; several instances need a shared store.
export function createRateLimiter({ limit, windowMs }: { limit: number; windowMs: number }): RateLimiter {
  const windows = new Map<string, { start: number; count: number }>();

  function current(key: string, now: number) {
    const entry = windows.get(key);
    if (!entry || now - entry.start >= windowMs) return undefined;
    return entry;
  }

  return {
    check(key) {
      const now = Date.now();
      const entry = current(key, now);
      if (!entry || entry.count < limit) return { allowed: true, retryAfterSeconds: 0 };
      return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil((entry.start + windowMs - now) / 1000)) };
    },
    hit(key) {
      const now = Date.now();
      const entry = current(key, now);
      if (entry) entry.count += 1;
      else windows.set(key, { start: now, count: 1 });
      if (windows.size > 10_000) pruneExpired(windows, now, windowMs);
    },
    reset(key) {
      windows.delete(key);
    },
  };
}

function pruneExpired(windows: Map<string, { start: number }>, now: number, windowMs: number) {
  for (const [key, entry] of windows) if (now - entry.start >= windowMs) windows.delete(key);
}

const globalLimiters = globalThis as unknown as { stepwellLimiters?: Map<string, RateLimiter> };

export function namedLimiter(name: string, opts: { limit: number; windowMs: number }): RateLimiter {
  globalLimiters.stepwellLimiters ??= new Map();
  let limiter = globalLimiters.stepwellLimiters.get(name);
  if (!limiter) {
    limiter = createRateLimiter(opts);
    globalLimiters.stepwellLimiters.set(name, limiter);
  }
  return limiter;
}

export const signInLimiter = () => namedLimiter('sign-in', { limit: 10, windowMs: 60_000 });
export const signUpLimiter = () => namedLimiter('sign-up', { limit: 20, windowMs: 60 * 60_000 });
export const inviteLimiter = () => namedLimiter('invite', { limit: 50, windowMs: 60 * 60_000 });
// Per address (so one inbox is not flooded) and per IP (so addresses cannot be cycled); both apply whether or not the address exists.
export const resetByEmailLimiter = () => namedLimiter('reset-email', { limit: 5, windowMs: 60 * 60_000 });
export const resetByIpLimiter = () => namedLimiter('reset-ip', { limit: 30, windowMs: 60 * 60_000 });

/** Checks every (limiter, key) pair and counts a hit on each only when all allow; throws a 429 with the longest wait otherwise. */
export function enforceLimits(pairs: ReadonlyArray<readonly [RateLimiter, string]>, message: (waitS: number) => string): void {
  const waits = pairs.map(([limiter, key]) => limiter.check(key)).filter((v) => !v.allowed).map((v) => v.retryAfterSeconds);
  if (waits.length) {
    const wait = Math.max(...waits);
    throw new AppError('RATE_LIMITED', message(wait), { headers: { 'Retry-After': String(wait) } });
  }
  for (const [limiter, key] of pairs) limiter.hit(key);
}

export function clientIp(req: Request): string {
  const forwarded = req.headers.get('x-forwarded-for');
  return forwarded?.split(',')[0]?.trim() || req.headers.get('x-real-ip') || 'local';
}
