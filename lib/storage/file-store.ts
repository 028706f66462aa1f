import 'server-only';
import fs from 'node:fs/promises';
import path from 'node:path';
import { databaseTarget } from '../../db/database-target';
import { env } from '../env';

/**
 * Where uploaded files live. Keys are relative paths with `/` separators ("species-imports/team-3/….csv"), so a
 * store over an object bucket can map them to object names one to one.
 */
export interface FileStore {
  /** Writes bytes under a new key; fails rather than overwrite an existing key. */
  put(key: string, bytes: Buffer): Promise<void>;
  get(key: string): Promise<Buffer>;
  /** Removing a missing key is not an error. */
  remove(key: string): Promise<void>;
}

export function folderStore(root: string): FileStore {
  const base = path.resolve(root);
  const resolve = (key: string) => {
    const full = path.resolve(base, key);
    // Keys are ours, but a key must never reach outside the root.
    if (!full.startsWith(base + path.sep)) throw new Error(`storage key outside the store: ${key}`);
    return full;
  };
  return {
    async put(key, bytes) {
      const full = resolve(key);
      await fs.mkdir(path.dirname(full), { recursive: true });
      await fs.writeFile(full, bytes, { flag: 'wx' });
    },
    // async, so a bad key rejects like any other failure instead of throwing at the call
    get: async (key) => fs.readFile(resolve(key)),
    remove: async (key) => fs.rm(resolve(key), { force: true }),
  };
}

/** A view of a store with every key under one prefix, so each kind of file keeps its own part of the store. */
export function withPrefix(store: FileStore, prefix: string): FileStore {
  // Checked here, not only at the root: "../x" would otherwise leave this part for another part of the same store.
  const full = (key: string) => {
    if (key.startsWith('/') || key.split(/[\\/]/).includes('..')) throw new Error(`storage key outside the store: ${key}`);
    return path.posix.join(prefix, key);
  };
  return {
    put: async (key, bytes) => store.put(full(key), bytes),
    get: async (key) => store.get(full(key)),
    remove: async (key) => store.remove(full(key)),
  };
}

/**
 * STORAGE_DIR, else the SQLite file's folder (one machine), else ./var/files with PostgreSQL.
 * Several instances must share it: point STORAGE_DIR at a mount they all see, or install an object store.
 */
export function storageRoot(): string {
  const configured = env().STORAGE_DIR;
  if (configured) return path.resolve(/*turbopackIgnore: true*/ process.cwd(), configured);
  const target = databaseTarget();
  if (target.dialect === 'sqlite') return path.dirname(target.file);
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), 'var', 'files');
}

let override: FileStore | null = null;

export function fileStore(): FileStore {
  return override ?? folderStore(storageRoot());
}

/** Swaps the store (an object store, or a failing one in tests); null restores the folder. */
export function setFileStore(store: FileStore | null): void {
  override = store;
}
