import fs from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';

// node-sqlite3 ships no types for its Backup object.
interface SqliteBackup {
  step(pages: number, callback: (error: Error | null) => void): void;
  finish(callback?: (error: Error | null) => void): void;
  readonly completed: boolean;
  readonly failed: boolean;
  readonly pageCount: number;
}
type BackupFn = (file: string, destName: string, sourceName: string, filenameIsDest: boolean, callback: (error: Error | null) => void) => SqliteBackup;

function open(file: string, mode = sqlite3.OPEN_READWRITE): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, mode, (error) => (error ? reject(error) : resolve(db)));
    db.configure('busyTimeout', 5000);
  });
}

function close(db: sqlite3.Database): Promise<void> {
  return new Promise((resolve, reject) => db.close((error) => (error ? reject(error) : resolve())));
}

function all<T>(db: sqlite3.Database, sql: string): Promise<T[]> {
  return new Promise((resolve, reject) => db.all(sql, (error, rows) => (error ? reject(error) : resolve(rows as T[]))));
}

// SQLite's online backup: one step(-1) copies every page under one read transaction, so the copy is one consistent moment
// even while the app keeps writing (WAL lets the writers go on).
async function runBackup(db: sqlite3.Database, file: string, filenameIsDest: boolean): Promise<number> {
  const backupFn = (db as unknown as { backup: BackupFn }).backup.bind(db);
  const backup = await new Promise<SqliteBackup>((resolve, reject) => {
    const b = backupFn(file, 'main', 'main', filenameIsDest, (error) => (error ? reject(error) : resolve(b)));
  });
  try {
    while (!backup.completed) {
      await new Promise<void>((resolve, reject) => backup.step(-1, (error) => (error ? reject(error) : resolve())));
      if (backup.failed) throw new Error('SQLite backup failed');
    }
    return backup.pageCount;
  } finally {
    await new Promise<void>((resolve) => backup.finish(() => resolve()));
  }
}

/** PRAGMA integrity_check of a file: ['ok'] when sound, otherwise the problems SQLite lists. */
export async function integrityCheck(file: string): Promise<string[]> {
  if (!fs.existsSync(file)) throw new Error(`No such file: ${file}`);
  const db = await open(file, sqlite3.OPEN_READONLY);
  try {
    const rows = await all<{ integrity_check: string }>(db, 'PRAGMA integrity_check');
    return rows.map((r) => r.integrity_check);
  } finally {
    await close(db);
  }
}

/** Copies a live database to `target` (written beside it, then renamed, so a half copy never has the final name). */
export async function backupDatabase({ source, target }: { source: string; target: string }): Promise<{ file: string; pages: number }> {
  if (!fs.existsSync(source)) throw new Error(`No database at ${source}`);
  if (fs.existsSync(target)) throw new Error(`${target} exists already; choose another name`);
  fs.mkdirSync(path.dirname(target), { recursive: true });
  const partial = `${target}.partial`;
  fs.rmSync(partial, { force: true });
  const db = await open(source);
  let pages: number;
  try {
    pages = await runBackup(db, partial, true);
  } finally {
    await close(db);
  }
  const problems = await integrityCheck(partial);
  if (problems.join() !== 'ok') {
    fs.rmSync(partial, { force: true });
    throw new Error(`The copy failed its integrity check: ${problems.slice(0, 5).join('; ')}`);
  }
  fs.renameSync(partial, target);
  return { file: target, pages };
}

/** A database with a -shm or -wal file beside it is open in some process (or that process died without closing it). */
export function looksInUse(file: string): boolean {
  return fs.existsSync(`${file}-shm`) || fs.existsSync(`${file}-wal`);
}

export interface RestoreResult {
  restored: string;
  /** the database as it was just before the restore, kept in case the restore was a mistake */
  previous: string | null;
}

// Checks the backup first, keeps the current database aside, then copies the backup's pages in with the backup API.
export async function restoreDatabase({ backup, target, force = false }: { backup: string; target: string; force?: boolean }): Promise<RestoreResult> {
  const problems = await integrityCheck(backup);
  if (problems.join() !== 'ok') throw new Error(`${backup} failed PRAGMA integrity_check: ${problems.slice(0, 5).join('; ')}. Nothing was restored.`);
  if (looksInUse(target) && !force) {
    throw new Error(
      `${target} looks in use (its -wal/-shm files exist): stop the server first. ` +
        'If no server runs (it crashed), pass --force; restoring under a running server would swap the data beneath it.',
    );
  }
  fs.mkdirSync(path.dirname(target), { recursive: true });
  let previous: string | null = null;
  if (fs.existsSync(target)) {
    previous = `${target}.before-restore-${new Date().toISOString().replace(/[:.]/g, '-')}`;
    await backupDatabase({ source: target, target: previous });
  }
  const db = await open(target, sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE);
  try {
    await runBackup(db, backup, false);
  } finally {
    await close(db);
  }
  const after = await integrityCheck(target);
  if (after.join() !== 'ok') throw new Error(`The restored database failed its integrity check: ${after.slice(0, 5).join('; ')}`);
  return { restored: target, previous };
}
