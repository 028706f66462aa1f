// The committed organic library must be exactly what the build script makes from the committed source copy.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(__dirname, '../../..');

describe('scripts/build-organic-library.ts', () => {
  it('reproduces lib/thermo/data/organic-library.json byte for byte', () => {
    const r = spawnSync(path.join(ROOT, 'node_modules/.bin/tsx'), ['scripts/build-organic-library.ts', '--check'], { cwd: ROOT, encoding: 'utf8', timeout: 120000 });
    expect(r.stdout).toMatch(/up to date/);
    expect(r.status).toBe(0);
  });
});
