import { databaseTarget } from '../../db/database-target';
import { env } from '../env';
import { createDatabaseStore } from './rate-limit-db-store';

/** One key's fixed window: how many hits it holds and when it opened (epoch ms). */
export interface RateWindow {
  count: number;
  windowStart: number;
}

// Where rate-limit windows live. Time comes from the caller, so every store is tested with a plain number clock.
export interface RateLimitStore {
  /** Adds one hit to key atomically and returns its window; a window that has ended starts again at 1. */
  hit(key: string, windowMs: number, now: number): Promise<RateWindow>;
  /** Takes back one hit, only while that same window is open (so a denied request counts nowhere). */
  refund(key: string, window: RateWindow): Promise<void>;
  reset(key: string): Promise<void>;
}

// One instance: a Map; ended windows are pruned once it holds more than maxKeys keys.
export function createMemoryStore({ maxKeys = 10_000 }: { maxKeys?: number } = {}): RateLimitStore & { readonly size: number } {
  const windows = new Map<string, { start: number; count: number; expiresAt: number }>();

  function prune(now: number) {
    for (const [key, entry] of windows) if (entry.expiresAt <= now) windows.delete(key);
  }

  return {
    async hit(key, windowMs, now) {
      let entry = windows.get(key);
      if (!entry || entry.expiresAt <= now) {
        entry = { start: now, count: 0, expiresAt: now + windowMs };
        windows.set(key, entry);
        if (windows.size > maxKeys) prune(now);
      }
      entry.count += 1;
      return { count: entry.count, windowStart: entry.start };
    },
    async refund(key, window) {
      const entry = windows.get(key);
      if (entry && entry.start === window.windowStart && entry.count > 0) entry.count -= 1;
    },
    async reset(key) {
      windows.delete(key);
    },
    /** keys held, ended windows included until pruned */
    get size() {
      return windows.size;
    },
  };
}

export type StateStoreKind = 'memory' | 'database';

/** STATE_STORE if set; otherwise the database when it is PostgreSQL (several instances), memory on SQLite (one). */
export function stateStoreKind(): StateStoreKind {
  return env().STATE_STORE ?? (databaseTarget().dialect === 'postgres' ? 'database' : 'memory');
}

const globalStores = globalThis as unknown as { stepwellRateLimitStores?: Map<StateStoreKind, RateLimitStore> };

// One store of each kind per process, kept on globalThis so dev hot reloads keep the counts. The database store
// asks getDb() on every call, so it follows a changed DATABASE_URL; the kind is read per call, so tests may switch it.
export function rateLimitStore(): RateLimitStore {
  const kind = stateStoreKind();
  globalStores.stepwellRateLimitStores ??= new Map();
  let store = globalStores.stepwellRateLimitStores.get(kind);
  if (!store) {
    store = kind === 'database' ? createDatabaseStore() : createMemoryStore();
    globalStores.stepwellRateLimitStores.set(kind, store);
  }
  return store;
}
