// npm run data:sync: refreshes lib/thermo/data/source/ from the published-data folder beside the
// project (../shared/data by default, or DATA_SYNC_FROM). Nothing at run or test time reads that
// folder; the copies committed here are what the engine and the build scripts use.
import { cpSync, existsSync, mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '..');
const FROM = path.resolve(process.env.DATA_SYNC_FROM ?? path.join(ROOT, '../shared/data'));
const TO = path.join(ROOT, 'lib/thermo/data/source');
// The collections the engine uses: NBS 1982 + NASA Glenn, the sourced organic library, and the
// group-contribution tables for estimation.
const COLLECTIONS = ['thermo', 'organics', 'estimation'] as const;

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? filesUnder(full) : [full];
  });
}

function main(): void {
  if (!existsSync(FROM)) {
    console.error(`data:sync: ${FROM} does not exist; the committed copies in ${path.relative(ROOT, TO)} stay as they are.`);
    process.exit(2);
  }
  for (const name of COLLECTIONS) {
    const source = path.join(FROM, name);
    if (!existsSync(source)) {
      console.error(`data:sync: ${source} is missing; skipped.`);
      continue;
    }
    const target = path.join(TO, name);
    rmSync(target, { recursive: true, force: true });
    mkdirSync(target, { recursive: true });
    cpSync(source, target, { recursive: true });
    console.log(`data:sync: ${name}: ${filesUnder(target).length} files copied to ${path.relative(ROOT, target)}`);
  }
  console.log('data:sync: now run `npx tsx scripts/build-species-library.ts` and `npm run data:organics`, then commit the changes.');
}

main();
