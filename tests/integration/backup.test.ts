import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '@/db';
import { backupDatabase, integrityCheck, looksInUse, restoreDatabase } from '@/scripts/backup/sqlite-backup';
import { makeRoute, makeTeamWithLead } from './support/fixtures';
import { onPostgres, setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let file = '';
const TABLES = ['users', 'teams', 'memberships', 'routes', 'steps', 'step_links', 'route_revisions'];

beforeAll(async () => {
  ({ dir, file } = await setupTestDb());
});
afterAll(async () => teardownTestDb(dir));

// Reads tables straight from a file, outside Sequelize, so the comparison does not depend on the app's models.
async function dump(dbFile: string): Promise<Record<string, unknown[]>> {
  const db = await new Promise<sqlite3.Database>((resolve, reject) => {
    const d = new sqlite3.Database(dbFile, sqlite3.OPEN_READONLY, (e) => (e ? reject(e) : resolve(d)));
  });
  const out: Record<string, unknown[]> = {};
  for (const table of TABLES) {
    out[table] = await new Promise<unknown[]>((resolve, reject) => db.all(`SELECT * FROM ${table} ORDER BY rowid`, (e, rows) => (e ? reject(e) : resolve(rows))));
  }
  await new Promise<void>((resolve) => db.close(() => resolve()));
  return out;
}

// SQLite's online backup; a PostgreSQL site backs up with pg_dump (README, "Running for a whole site").
describe.skipIf(onPostgres)('database backup and restore (SQLite)', () => {
  it('copies consistently while routes are being written, and restores the copy exactly', async () => {
    const team = await makeTeamWithLead('backup');
    const before = [];
    for (let i = 0; i < 3; i += 1) before.push(await makeRoute(team.teamId, team.leadId));

    // Keep saving routes (each a route, its steps, links and a revision in one transaction) while the backup runs.
    let writing = true;
    let written = 0;
    const writer = (async () => {
      while (writing) {
        await makeRoute(team.teamId, team.leadId);
        written += 1;
      }
    })();
    await new Promise((resolve) => setTimeout(resolve, 150));
    const target = path.join(dir, 'backups', 'copy.sqlite');
    // Saves acknowledged before the backup starts must be in the copy; ones that finish while it runs may or may not be.
    const writtenBeforeBackup = written;
    const result = await backupDatabase({ source: file, target });
    const writtenAtBackup = written;
    await new Promise((resolve) => setTimeout(resolve, 150));
    writing = false;
    await writer;
    expect(written, 'the writer kept going after the backup').toBeGreaterThan(writtenAtBackup);
    expect(result.pages).toBeGreaterThan(0);
    expect(fs.existsSync(`${target}.partial`)).toBe(false);
    expect(await integrityCheck(target)).toEqual(['ok']);

    const copy = await dump(target);
    const routeIds = (copy.routes as { id: number }[]).map((r) => r.id);
    for (const route of before) expect(routeIds).toContain(route.id);
    expect(routeIds.length).toBeGreaterThanOrEqual(before.length + writtenBeforeBackup);
    // One moment in time: a route is created (one revision) and then saved with its two steps (a second revision), each in
    // one transaction; the copy may fall between the two, but never inside either.
    for (const id of routeIds) {
      const steps = (copy.steps as { route_id: number }[]).filter((s) => s.route_id === id).length;
      const revisions = (copy.route_revisions as { route_id: number }[]).filter((r) => r.route_id === id).length;
      expect([[0, 1], [2, 2]]).toContainEqual([steps, revisions]);
    }
    const live = await getDb().models.Route.count();
    expect(live, 'the live database moved on after the copy').toBeGreaterThan(routeIds.length);

    // While the app holds the database open, restore refuses without --force and changes nothing.
    expect(looksInUse(file)).toBe(true);
    await expect(restoreDatabase({ backup: target, target: file })).rejects.toThrow(/looks in use/);
    expect(await getDb().models.Route.count()).toBe(live);

    await closeDb();
    expect(looksInUse(file)).toBe(false);
    const { previous } = await restoreDatabase({ backup: target, target: file });
    expect(await integrityCheck(file)).toEqual(['ok']);
    expect(await dump(file)).toEqual(copy);
    // The database as it was before the restore is kept, with the later routes in it.
    expect(previous).not.toBeNull();
    expect((await dump(previous!)).routes).toHaveLength(live);

    // The app reads the restored data.
    expect(await getDb().models.Route.count()).toBe(routeIds.length);
  });

  it('refuses to restore a file that is not a sound database, leaving the target as it was', async () => {
    const garbage = path.join(dir, 'garbage.sqlite');
    fs.writeFileSync(garbage, Buffer.alloc(8192, 7));
    const count = await getDb().models.Route.count();
    await closeDb();
    await expect(restoreDatabase({ backup: garbage, target: file })).rejects.toThrow();
    expect(await getDb().models.Route.count()).toBe(count);
  });

  it('npm run db:backup writes a checked copy of DATABASE_PATH', () => {
    const target = path.join(dir, 'cli', 'cli-copy.sqlite');
    const run = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/db-backup.ts', target], {
      cwd: path.resolve(__dirname, '../..'),
      env: { ...process.env, DATABASE_PATH: file },
      encoding: 'utf8',
    });
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toContain('integrity_check ok');
    expect(fs.existsSync(target)).toBe(true);
    const again = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/db-backup.ts', target], {
      cwd: path.resolve(__dirname, '../..'),
      env: { ...process.env, DATABASE_PATH: file },
      encoding: 'utf8',
    });
    expect(again.status).toBe(1);
    expect(again.stderr).toMatch(/exists already/);
  });
});
