import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(__dirname, '../..');

function trackedFiles(): string[] | null {
  const run = spawnSync('git', ['ls-files', '-z'], { cwd: ROOT, encoding: 'utf8' });
  return run.status === 0 ? run.stdout.split('\0').filter(Boolean) : null;
}

// The client bundle is checked after the build, in tests/e2e/security.spec.ts.
const files = trackedFiles();
const localEnv = path.join(ROOT, '.env.local');
const localSecret = fs.existsSync(localEnv) ? fs.readFileSync(localEnv, 'utf8').match(/^NEXTAUTH_SECRET=(.+)$/m)?.[1]?.trim() : undefined;

describe('secrets stay out of the repository', () => {
  it.skipIf(!files)('tracks no .env file except the example (skipped outside a git checkout)', () => {
    expect(files!.filter((f) => /(^|\/)\.env(\..*)?$/.test(f) && !f.endsWith('.env.example'))).toEqual([]);
    const ignored = fs.readFileSync(path.join(ROOT, '.gitignore'), 'utf8');
    expect(ignored).toMatch(/^\.env\*?\.local$/m);
  });

  it('the example leaves every secret empty', () => {
    const example = fs.readFileSync(path.join(ROOT, '.env.example'), 'utf8');
    expect(example).toMatch(/^NEXTAUTH_SECRET=$/m);
    expect(example).not.toMatch(/^SMTP_URL=\w+:\/\/[^/\s]*:[^@\s]+@/m);
  });

  it.skipIf(!files || !localSecret)('no tracked file holds the local NEXTAUTH_SECRET (skipped without .env.local)', () => {
    const secret = localSecret!;
    const holding = files!.filter((f) => {
      const full = path.join(ROOT, f);
      return fs.existsSync(full) && fs.statSync(full).size < 5_000_000 && fs.readFileSync(full, 'latin1').includes(secret);
    });
    expect(holding).toEqual([]);
  });
});
