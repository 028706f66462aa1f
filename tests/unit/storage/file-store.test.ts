// The folder file store, prefixed views of it, and where the default root lies for each database.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { fileStore, folderStore, setFileStore, storageRoot, withPrefix, type FileStore } from '@/lib/storage/file-store';

const root = fs.mkdtempSync(path.join(os.tmpdir(), 'stepwell-files-'));
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

describe('folderStore', () => {
  const store = folderStore(root);

  it('writes, reads back and removes a file under its key', async () => {
    await store.put('a/b/one.csv', Buffer.from('x,y\n1,2\n'));
    expect(fs.readFileSync(path.join(root, 'a', 'b', 'one.csv'), 'utf8')).toBe('x,y\n1,2\n');
    expect((await store.get('a/b/one.csv')).toString()).toBe('x,y\n1,2\n');
    await store.remove('a/b/one.csv');
    expect(fs.existsSync(path.join(root, 'a', 'b', 'one.csv'))).toBe(false);
    await expect(store.remove('a/b/one.csv')).resolves.toBeUndefined();
  });

  it('never overwrites a key that exists', async () => {
    await store.put('keep.csv', Buffer.from('first'));
    await expect(store.put('keep.csv', Buffer.from('second'))).rejects.toMatchObject({ code: 'EEXIST' });
    expect((await store.get('keep.csv')).toString()).toBe('first');
  });

  it('refuses keys that reach outside its root', async () => {
    await expect(store.put('../escape.csv', Buffer.from('no'))).rejects.toThrow(/outside the store/);
    await expect(store.get('/etc/passwd')).rejects.toThrow(/outside the store/);
    expect(fs.existsSync(path.join(path.dirname(root), 'escape.csv'))).toBe(false);
  });

  it('rejects a missing key on read', async () => {
    await expect(store.get('nothing-here.csv')).rejects.toMatchObject({ code: 'ENOENT' });
  });
});

describe('withPrefix', () => {
  it('keeps each kind of file in its own part of the store', async () => {
    const store = folderStore(root);
    const imports = withPrefix(store, 'species-imports');
    await imports.put('team-1/x.csv', Buffer.from('csv'));
    expect((await store.get('species-imports/team-1/x.csv')).toString()).toBe('csv');
    await expect(withPrefix(store, 'species-imports').put('../../out.csv', Buffer.from('no'))).rejects.toThrow(/outside the store/);
    // A key that stays inside the store but leaves its part (e.g. for the database file beside it) is refused too.
    await store.put('beside.csv', Buffer.from('other part'));
    await expect(imports.get('../beside.csv')).rejects.toThrow(/outside the store/);
    await expect(imports.get('team-1/../../beside.csv')).rejects.toThrow(/outside the store/);
    await expect(imports.remove('/beside.csv')).rejects.toThrow(/outside the store/);
    expect(fs.existsSync(path.join(root, 'beside.csv'))).toBe(true);
  });
});

describe('storageRoot and fileStore', () => {
  const saved = { STORAGE_DIR: process.env.STORAGE_DIR, DATABASE_URL: process.env.DATABASE_URL, DATABASE_PATH: process.env.DATABASE_PATH };
  afterEach(() => {
    for (const [name, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
    setFileStore(null);
  });

  it('uses STORAGE_DIR when set, else the SQLite file folder, else ./var/files on PostgreSQL', () => {
    process.env.STORAGE_DIR = path.join(root, 'configured');
    process.env.DATABASE_URL = 'postgres://u:p@127.0.0.1:5432/stepwell';
    expect(storageRoot()).toBe(path.join(root, 'configured'));
    delete process.env.STORAGE_DIR;
    expect(storageRoot()).toBe(path.resolve('var', 'files'));
    delete process.env.DATABASE_URL;
    process.env.DATABASE_PATH = path.join(root, 'db', 'site.sqlite');
    expect(storageRoot()).toBe(path.join(root, 'db'));
  });

  it('answers the installed store until it is cleared', async () => {
    const seen: string[] = [];
    const recording: FileStore = {
      put: async (key) => void seen.push(`put ${key}`),
      get: async (key) => Buffer.from(key),
      remove: async (key) => void seen.push(`remove ${key}`),
    };
    setFileStore(recording);
    await fileStore().put('k.csv', Buffer.from(''));
    expect(seen).toEqual(['put k.csv']);
    setFileStore(null);
    process.env.STORAGE_DIR = root;
    expect((await fileStore().get('keep.csv')).toString()).toBe('first');
  });
});
