import path from 'node:path';
import { databaseFile } from '../lib/env';
import { backupDatabase } from './backup/sqlite-backup';
import { exitUnlessSqlite } from './backup/sqlite-only';
import { loadEnvFiles } from './load-env';

// npm run db:backup [FILE]: a consistent copy of the live database (safe while the server runs).
async function main() {
  loadEnvFiles();
  exitUnlessSqlite('db:backup');
  const source = databaseFile();
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  const target = path.resolve(process.argv[2] ?? path.join(path.dirname(source), 'backups', `stepwell-${stamp}.sqlite`));
  const { file, pages } = await backupDatabase({ source, target });
  console.log(`[db:backup] ${source} → ${file} (${pages} pages, integrity_check ok)`);
}

main().catch((error: unknown) => {
  console.error(`[db:backup] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
