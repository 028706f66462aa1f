import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { closeDb, getDb } from '@/db';
import { migrateUp } from '@/db/migrate';

export const TEST_SECRET = 'integration-test-secret-0123456789';

// A fresh SQLite file per test file, migrated with the real migrations.
export async function setupTestDb(): Promise<{ dir: string; file: string }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'stepwell-test-'));
  const file = path.join(dir, 'test.sqlite');
  process.env.DATABASE_PATH = file;
  process.env.NEXTAUTH_SECRET = TEST_SECRET;
  process.env.MAIL_DIR = path.join(dir, 'mail');
  process.env.APP_URL = 'http://localhost:3000';
  await migrateUp(getDb().sequelize);
  return { dir, file };
}

export async function teardownTestDb(dir: string): Promise<void> {
  await closeDb();
  fs.rmSync(dir, { recursive: true, force: true });
}
