import fs from 'node:fs';
import { databaseFile } from '../lib/env';
import { loadEnvFiles } from './load-env';
import { migrateAndSeed } from './db-tasks';

loadEnvFiles();
const file = databaseFile();
for (const suffix of ['', '-wal', '-shm']) fs.rmSync(`${file}${suffix}`, { force: true });
console.log(`[db] removed ${file}`);
migrateAndSeed({ seed: true }).catch((error) => {
  console.error(error);
  process.exit(1);
});
