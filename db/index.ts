import fs from 'node:fs';
import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { databaseFile } from '../lib/env';
import { initModels, type Models } from './models';

interface Db {
  sequelize: Sequelize;
  models: Models;
  file: string;
}

const globalForDb = globalThis as unknown as { stepwellDb?: Db };

const BUSY_TIMEOUT_MS = 5000;

function runPragma(connection: unknown, sql: string): Promise<void> {
  const conn = connection as sqlite3.Database;
  return new Promise((resolve, reject) => conn.run(sql, (err) => (err ? reject(err) : resolve())));
}

function createDb(file: string): Db {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    dialectModule: sqlite3,
    storage: file,
    logging: false,
    // Each transaction gets its own connection; BEGIN IMMEDIATE avoids lock upgrades that fail with SQLITE_BUSY.
    transactionType: Transaction.TYPES.IMMEDIATE,
    hooks: {
      afterConnect: async (connection: unknown) => {
        (connection as sqlite3.Database).configure('busyTimeout', BUSY_TIMEOUT_MS);
        await runPragma(connection, 'PRAGMA journal_mode = WAL');
        await runPragma(connection, 'PRAGMA foreign_keys = ON');
        await runPragma(connection, 'PRAGMA synchronous = NORMAL');
      },
    },
  });
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
