import fs from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { databaseTarget, type DatabaseTarget } from './database-target';
import { initModels, type Models } from './models';
import { queueTransactions } from './write-queue';

interface Db {
  sequelize: Sequelize;
  models: Models;
  target: DatabaseTarget;
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

function createSqlite(file: string): Sequelize {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    dialectModule,
    storage: file,
    logging: false,
    // Each transaction gets its own connection; BEGIN IMMEDIATE avoids lock upgrades that fail with SQLITE_BUSY.
    // SQLite transactions are serializable whatever is asked.
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
  queueTransactions(sequelize);
  return sequelize;
}

// READ COMMITTED, chosen explicitly. A route save is one conditional UPDATE (… WHERE version = ?), which PostgreSQL
// re-checks against the committed row after waiting on its lock, so a stale writer updates nothing and gets its 409.
// Every other write that depends on a read takes the row with SELECT … FOR UPDATE first (lib/services/row-lock.ts),
// so two writers run one after the other, as SQLite's IMMEDIATE transactions do.
function createPostgres(url: string): Sequelize {
  return new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 10_000 },
    dialectOptions: { connectionTimeoutMillis: 5000 },
  });
}

function createDb(target: DatabaseTarget): Db {
  const sequelize = target.dialect === 'sqlite' ? createSqlite(target.file) : createPostgres(target.url);
  return { sequelize, models: initModels(sequelize), target };
}

// One instance per process, kept on globalThis so hot reloads in dev don't open new handles.
export function getDb(): Db {
  const target = databaseTarget();
  const cached = globalForDb.stepwellDb;
  if (cached && cached.target.key === target.key) return cached;
  const db = createDb(target);
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
