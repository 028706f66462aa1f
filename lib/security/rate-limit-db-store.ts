import 'server-only';
import { QueryTypes, type Sequelize } from 'sequelize';
import { getDb } from '../../db';
import type { RateLimitStore, RateWindow } from './rate-limit-store';

// One statement, so concurrent hits from any number of instances serialise on the row and no increment is lost
// (SQLite 3.35+ and PostgreSQL both have ON CONFLICT … DO UPDATE … RETURNING). The SET expressions all read the
// row as it was, so one CASE decides "this window has ended" for count, window_start and expires_at alike.
// The leading comment makes Sequelize's sqlite dialect use all() instead of run(), so RETURNING gives the row.
// No transaction: a single statement needs none, and db/write-queue.ts would queue it behind every write.
const HIT_SQL = `/* rate limit hit */
INSERT INTO rate_limit_windows (key, count, window_start, expires_at) VALUES (:key, 1, :now, :expiresAt)
ON CONFLICT (key) DO UPDATE SET
  count = CASE WHEN rate_limit_windows.expires_at <= :now THEN 1 ELSE rate_limit_windows.count + 1 END,
  window_start = CASE WHEN rate_limit_windows.expires_at <= :now THEN :now ELSE rate_limit_windows.window_start END,
  expires_at = CASE WHEN rate_limit_windows.expires_at <= :now THEN :expiresAt ELSE rate_limit_windows.expires_at END
RETURNING count, window_start`;

/**
 * Several instances behind a load balancer: windows in the rate_limit_windows table; ended ones are swept every
 * `sweepEvery` hits. `sequelize` defaults to this process's database (tests pass a second connection as another instance).
 */
export function createDatabaseStore({ sweepEvery = 100, sequelize = () => getDb().sequelize }: { sweepEvery?: number; sequelize?: () => Sequelize } = {}): RateLimitStore {
  let hits = 0;

  async function sweep(now: number) {
    try {
      await sequelize().query('DELETE FROM rate_limit_windows WHERE expires_at <= :now', { replacements: { now } });
    } catch (error) {
      // The hit has counted already; a failed sweep only leaves ended rows for the next one.
      console.error('[stepwell] rate-limit sweep failed:', error);
    }
  }

  return {
    async hit(key, windowMs, now) {
      // pg returns BIGINT as a string; SQLite as a number.
      const rows = await sequelize().query<{ count: number | string; window_start: number | string }>(HIT_SQL, {
        type: QueryTypes.SELECT,
        replacements: { key, now, expiresAt: now + windowMs },
      });
      const row = rows[0];
      if (!row) throw new Error('rate-limit hit returned no row');
      hits += 1;
      if (hits % sweepEvery === 0) await sweep(now);
      return { count: Number(row.count), windowStart: Number(row.window_start) } satisfies RateWindow;
    },
    async refund(key, window) {
      await sequelize().query('UPDATE rate_limit_windows SET count = count - 1 WHERE key = :key AND window_start = :windowStart AND count > 0', {
        replacements: { key, windowStart: window.windowStart },
      });
    },
    async reset(key) {
      await sequelize().query('DELETE FROM rate_limit_windows WHERE key = :key', { replacements: { key } });
    },
  };
}
