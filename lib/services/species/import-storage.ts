import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import path from 'node:path';
import { fileStore, withPrefix } from '../../storage/file-store';

// Original species-import files, in the species-imports/ part of the file store (lib/storage).
// Stored keys are relative to that part ("team-3/….csv"), as they were when the folder was the only store.
const imports = () => withPrefix(fileStore(), 'species-imports');

/** The only form put() gives keys; a key from elsewhere (a team file) is checked against it before it is stored. */
export const IMPORT_KEY_PATTERN = /^team-\d+\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\.csv$/;

export function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** A new key in the team's own part of the import store. */
export function newImportKey(teamId: number): string {
  return path.posix.join(`team-${teamId}`, `${randomUUID()}.csv`);
}

export const importFiles = {
  async put(teamId: number, bytes: Buffer): Promise<string> {
    const storageKey = newImportKey(teamId);
    await imports().put(storageKey, bytes);
    return storageKey;
  },
  get: (storageKey: string) => imports().get(storageKey),
  remove: (storageKey: string) => imports().remove(storageKey),
};
