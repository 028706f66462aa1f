import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Writes a generated data file, or with --check only compares it with the committed one (exit 1 when stale),
 * so a unit test can keep the committed file in step with its build script. Returns true when it wrote.
 */
export function writeOrCheck(root: string, out: string, text: string): boolean {
  const name = path.relative(root, out);
  if (process.argv.includes('--check')) {
    const same = readFileSync(out, 'utf8') === text;
    console.log(same ? `${name} is up to date` : `${name} is stale; rebuild it`);
    process.exitCode = same ? 0 : 1;
    return false;
  }
  writeFileSync(out, text);
  return true;
}
