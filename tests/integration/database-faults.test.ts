// A connection that drops during a request answers 503 in the error shape, and the next request recovers.
import pg from 'pg';
import { ConnectionRefusedError, DatabaseError, UniqueConstraintError } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as listRoutes } from '@/app/api/routes/route';
import { isDatabaseUnavailable } from '@/lib/api/database-unavailable';
import { makeRoleSet } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { onPostgres, setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const pgError = (code: string, message: string) => new DatabaseError(Object.assign(new Error(message), { code, sql: 'SELECT 1', parameters: [] }) as never);

describe('telling a lost database from a bad request', () => {
  it('counts refused connections, terminated backends and a busy SQLite as unavailable', () => {
    expect(isDatabaseUnavailable(new ConnectionRefusedError(Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' })))).toBe(true);
    expect(isDatabaseUnavailable(pgError('57P01', 'terminating connection due to administrator command'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('08006', 'connection failure'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('SQLITE_BUSY', 'SQLITE_BUSY: database is locked'))).toBe(true);
  });

  it('does not count ordinary database errors', () => {
    expect(isDatabaseUnavailable(pgError('42601', 'syntax error at or near "PRAGMA"'))).toBe(false);
    expect(isDatabaseUnavailable(new UniqueConstraintError({ message: 'duplicate key' }))).toBe(false);
    expect(isDatabaseUnavailable(new Error('Connection terminated'))).toBe(false);
  });
});

describe.runIf(onPostgres)('a dropped PostgreSQL connection (PostgreSQL)', () => {
  it('answers 503 with the error shape while the request is in flight, then serves the next request', async () => {
    const admin = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await admin.connect();
    try {
      // Hold the routes table so the list request waits inside the database, then cut its connection.
      await admin.query('BEGIN');
      await admin.query('LOCK TABLE routes IN ACCESS EXCLUSIVE MODE');
      const pending = callRoute(listRoutes, { userId: w.designerId, path: '/api/routes' });
      let terminated = 0;
      for (let i = 0; i < 100 && terminated === 0; i += 1) {
        await new Promise((r) => setTimeout(r, 50));
        const waiting = await admin.query<{ pid: number }>(
          "SELECT pid FROM pg_stat_activity WHERE datname = current_database() AND pid <> pg_backend_pid() AND wait_event_type = 'Lock'",
        );
        for (const { pid } of waiting.rows) terminated += (await admin.query('SELECT pg_terminate_backend($1)', [pid])).rowCount ?? 0;
      }
      expect(terminated).toBeGreaterThan(0);
      const res = await pending;
      expect(res.status).toBe(503);
      expect(errorOf(res.body).code).toBe('UNAVAILABLE');
      expect(res.headers.get('retry-after')).toBe('2');
      expect(JSON.stringify(res.body)).not.toMatch(/at .*\.js|stack/i);
    } finally {
      await admin.query('ROLLBACK');
      await admin.end();
    }
    const next = await callRoute(listRoutes, { userId: w.designerId, path: '/api/routes' });
    expect(next.status).toBe(200);
  });
});
