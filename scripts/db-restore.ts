import path from 'node:path';
import { databaseFile } from '../lib/env';
import { restoreDatabase } from './backup/sqlite-backup';
import { exitUnlessSqlite } from './backup/sqlite-only';
import { loadEnvFiles } from './load-env';

// npm run db:restore FILE [--force]: checks FILE, keeps the current database aside, then restores FILE over it.
async function main() {
  loadEnvFiles();
  exitUnlessSqlite('db:restore');
  const args = process.argv.slice(2);
  const force = args.includes('--force');
  const file = args.find((a) => !a.startsWith('--'));
  if (!file) {
    console.error('Usage: npm run db:restore -- FILE [--force]   (stop the server first; --force only if none runs)');
    process.exit(2);
  }
  const { restored, previous } = await restoreDatabase({ backup: path.resolve(file), target: databaseFile(), force });
  console.log(`[db:restore] ${path.resolve(file)} → ${restored} (integrity_check ok)${previous ? `; the previous database is kept at ${previous}` : ''}`);
}

main().catch((error: unknown) => {
  console.error(`[db:restore] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
