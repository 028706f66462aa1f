import fs from 'node:fs';
import { databaseFile } from '../lib/env';
import { exitUnlessSqlite } from './backup/sqlite-only';
import { loadEnvFiles } from './load-env';
import { migrateAndSeed } from './db-tasks';

loadEnvFiles();
// Deleting the file is SQLite's reset; a PostgreSQL database is dropped and recreated with its own tools.
exitUnlessSqlite('db:reset');
const file = databaseFile();
for (const suffix of ['', '-wal', '-shm']) fs.rmSync(`${file}${suffix}`, { force: true });
console.log(`[db] removed ${file}`);
migrateAndSeed({ seed: true }).catch((error) => {
  console.error(error);
  process.exit(1);
});
