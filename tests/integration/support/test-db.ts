import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { closeDb, getDb } from '@/db';
import { migrateUp } from '@/db/migrate';

export const TEST_SECRET = 'integration-test-secret-0123456789';

/** Set by the PostgreSQL run of the suite: the server's maintenance database, where each test file creates its own. */
const PG_BASE_URL = process.env.TEST_POSTGRES_URL;
export const onPostgres = Boolean(PG_BASE_URL);

async function adminQuery(sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: PG_BASE_URL });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

// A fresh database per test file, migrated with the real migrations: a SQLite file, or on the
// PostgreSQL run a new database on the throwaway server (dropped again at teardown).
export async function setupTestDb(): Promise<{ dir: string; file: string }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'stepwell-test-'));
  const file = path.join(dir, 'test.sqlite');
  process.env.DATABASE_PATH = file;
  process.env.NEXTAUTH_SECRET = TEST_SECRET;
  process.env.MAIL_DIR = path.join(dir, 'mail');
  process.env.STORAGE_DIR = path.join(dir, 'files');
  process.env.APP_URL = 'http://localhost:3000';
  if (PG_BASE_URL) {
    const name = `stepwell_t_${randomBytes(6).toString('hex')}`;
    await adminQuery(`CREATE DATABASE ${name}`);
    const url = new URL(PG_BASE_URL);
    url.pathname = `/${name}`;
    process.env.DATABASE_URL = url.toString();
    fs.writeFileSync(path.join(dir, 'pg-database'), name);
  } else {
    delete process.env.DATABASE_URL;
  }
  await migrateUp(getDb().sequelize);
  return { dir, file };
}

export async function teardownTestDb(dir: string): Promise<void> {
  await closeDb();
  const marker = path.join(dir, 'pg-database');
  if (PG_BASE_URL && fs.existsSync(marker)) await adminQuery(`DROP DATABASE IF EXISTS ${fs.readFileSync(marker, 'utf8')} WITH (FORCE)`);
  fs.rmSync(dir, { recursive: true, force: true });
}
