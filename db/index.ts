import fs from 'node:fs';
import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { databaseFile } from '../lib/env';
import { initModels, type Models } from './models';
import { queueTransactions } from './write-queue';

interface Db {
  sequelize: Sequelize;
  models: Models;
  file: string;
}

const globalForDb = globalThis as unknown as { stepwellDb?: Db };

const BUSY_TIMEOUT_MS = 5000;

// Sequelize opens one sqlite3 connection per transaction and runs no hooks for sqlite, so each
// connection is configured here as it opens: WAL, foreign keys, a busy timeout instead of SQLITE_BUSY.
class ConfiguredDatabase extends sqlite3.Database {
  constructor(file: string, mode?: number, callback?: (err: Error | null) => void) {
    super(file, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, callback);
    this.configure('busyTimeout', BUSY_TIMEOUT_MS);
    this.run('PRAGMA journal_mode = WAL');
    this.run('PRAGMA foreign_keys = ON');
    this.run('PRAGMA synchronous = NORMAL');
  }
}

const dialectModule = { ...sqlite3, Database: ConfiguredDatabase };

function createDb(file: string): Db {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    dialectModule,
    storage: file,
    logging: false,
    // Each transaction gets its own connection; BEGIN IMMEDIATE avoids lock upgrades that fail with SQLITE_BUSY.
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
  queueTransactions(sequelize);
  return { sequelize, models: initModels(sequelize), file };
}

// One instance per process, kept on globalThis so hot reloads in dev don't open new handles.
export function getDb(): Db {
  const file = databaseFile();
  const cached = globalForDb.stepwellDb;
  if (cached && cached.file === file) return cached;
  const db = createDb(file);
  globalForDb.stepwellDb = db;
  return db;
}

export async function closeDb(): Promise<void> {
  const cached = globalForDb.stepwellDb;
  if (!cached) return;
  globalForDb.stepwellDb = undefined;
  await cached.sequelize.close();
}

export type { Models };
