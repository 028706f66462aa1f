import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { migrateDownAll, migrateUp } from '@/db/migrate';
import { MIGRATIONS } from '@/db/migrations';
import { runSeeders } from '@/db/seeders';
import { DEMO_ROUTES } from '@/db/seeders/demo-routes';
import { DEMO_USERS } from '@/db/seeders/demo-team';
import { tableNames } from './support/schema';
import { onPostgres, setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
beforeAll(async () => ({ dir } = await setupTestDb()));
afterAll(async () => teardownTestDb(dir));

const tables = tableNames;

describe('migrations', () => {
  it('apply from empty and a second run applies nothing', async () => {
    expect(await tables()).toEqual(expect.arrayContaining(['users', 'teams', 'memberships', 'invitations', 'audit_events', 'user_preferences']));
    expect(await migrateUp(getDb().sequelize)).toEqual([]);
  });

  it('record every migration once', async () => {
    const [rows] = await getDb().sequelize.query('SELECT name FROM schema_migrations');
    expect((rows as { name: string }[]).map((r) => r.name)).toEqual(MIGRATIONS.map((m) => m.name));
  });

  it('go down and up again cleanly', async () => {
    await migrateDownAll(getDb().sequelize);
    expect(await tables()).not.toContain('users');
    expect(await migrateUp(getDb().sequelize)).toEqual(MIGRATIONS.map((m) => m.name));
  });

  it.skipIf(onPostgres)('use WAL, foreign keys and a busy timeout (SQLite)', async () => {
    const { sequelize } = getDb();
    const pragma = async (name: string) =>
      Object.values((await sequelize.query<Record<string, unknown>>(`PRAGMA ${name}`, { type: QueryTypes.SELECT }))[0] ?? {})[0];
    expect(await pragma('journal_mode')).toBe('wal');
    expect(await pragma('foreign_keys')).toBe(1);
    expect(Number(await pragma('busy_timeout'))).toBeGreaterThanOrEqual(1000);
  });

  it.runIf(onPostgres)('run on PostgreSQL at READ COMMITTED, as chosen in db/index.ts (PostgreSQL)', async () => {
    const [row] = await getDb().sequelize.transaction(async (transaction) =>
      getDb().sequelize.query<{ transaction_isolation: string }>('SHOW transaction_isolation', { type: QueryTypes.SELECT, transaction }),
    );
    expect(row?.transaction_isolation).toBe('read committed');
    expect(getDb().target.dialect).toBe('postgres');
  });

  it('seed the demo team once, with one user per role and the four demo routes', async () => {
    expect(await runSeeders(getDb())).toEqual(['demo-team', 'demo-routes']);
    expect(await runSeeders(getDb())).toEqual([]);
    const roles = await getDb().models.Membership.findAll();
    expect(roles.map((m) => m.role).sort()).toEqual(DEMO_USERS.map((u) => u.role).sort());
    // Two methanol alternatives, and two routes on estimated values (tests/integration/demo-routes.test.ts).
    expect(DEMO_ROUTES).toHaveLength(4);
    expect((await getDb().models.Route.findAll()).map((r) => r.name).sort()).toEqual(DEMO_ROUTES.map((r) => r.name).sort());
  });
});
