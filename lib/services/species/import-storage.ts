import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { databaseFile } from '../../env';

/** Where original import files live. The default is a folder beside the database; another store can replace it. */
export interface ImportFileStore {
  put(teamId: number, bytes: Buffer): Promise<string>;
  get(storageKey: string): Promise<Buffer>;
  remove(storageKey: string): Promise<void>;
}

export function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

export function folderStore(root: string): ImportFileStore {
  const resolve = (storageKey: string) => {
    const full = path.resolve(root, storageKey);
    // Keys are ours, but a key must never reach outside the root.
    if (!full.startsWith(path.resolve(root) + path.sep)) throw new Error(`storage key outside the store: ${storageKey}`);
    return full;
  };
  return {
    async put(teamId, bytes) {
      const storageKey = path.posix.join(`team-${teamId}`, `${randomUUID()}.csv`);
      const full = resolve(storageKey);
      await fs.mkdir(path.dirname(full), { recursive: true });
      await fs.writeFile(full, bytes, { flag: 'wx' });
      return storageKey;
    },
    get: (storageKey) => fs.readFile(resolve(storageKey)),
    remove: (storageKey) => fs.rm(resolve(storageKey), { force: true }),
  };
}

let override: ImportFileStore | null = null;

/** The store in use: var/species-imports beside the database (so each test database gets its own). */
export function importFileStore(): ImportFileStore {
  return override ?? folderStore(path.join(path.dirname(databaseFile()), 'species-imports'));
}

/** Swaps the store, e.g. for an object store; null restores the folder. */
export function setImportFileStore(store: ImportFileStore | null): void {
  override = store;
}
