// Where the engine's larger data files live at run time. They are read from disk on first use
// (not bundled), relative to the project root, which is the working directory of `next start`,
// the CLI, vitest and the benches. STEPWELL_DATA_DIR points elsewhere for an installed copy.
import { readFileSync } from 'node:fs';
import path from 'node:path';

export function dataFilePath(relative: string): string {
  const root = process.env.STEPWELL_DATA_DIR ?? path.join(process.cwd(), 'lib/thermo/data');
  return path.join(root, relative);
}

export function readDataJson<T>(relative: string): T {
  return JSON.parse(readFileSync(dataFilePath(relative), 'utf8')) as T;
}

export function readDataText(relative: string): string {
  return readFileSync(dataFilePath(relative), 'utf8');
}
