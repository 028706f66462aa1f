import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { E2E_PORT, E2E_SMTP_PORT } from '../tests/e2e/support/e2e-env';

// npm test: lint, typecheck, vitest, build, Playwright. Runs every stage, then prints the totals.
const VITEST_JSON = path.resolve('var/vitest-results.json');
const PLAYWRIGHT_JSON = path.resolve('var/playwright-results.json');
// Read at each spawn, after e2e-env has put the chosen ports into process.env.
const env = () => ({ ...process.env, NEXT_TELEMETRY_DISABLED: '1' });

function run(label: string, command: string, args: string[]): boolean {
  console.log(`\n=== ${label} ===`);
  const started = Date.now();
  const result = spawnSync(command, args, { stdio: 'inherit', env: env() });
  const ok = result.status === 0;
  console.log(`=== ${label}: ${ok ? 'ok' : 'FAILED'} (${((Date.now() - started) / 1000).toFixed(1)} s) ===`);
  return ok;
}

function readJson<T>(file: string): T | null {
  try {
    return JSON.parse(fs.readFileSync(file, 'utf8')) as T;
  } catch {
    return null;
  }
}

fs.mkdirSync('var', { recursive: true });
for (const file of [VITEST_JSON, PLAYWRIGHT_JSON]) fs.rmSync(file, { force: true });

const npx = 'npx';
const stages: Record<string, boolean> = {};
stages.lint = run('lint', 'npm', ['run', '-s', 'lint']);
stages.typecheck = run('typecheck', 'npm', ['run', '-s', 'typecheck']);
stages.vitest = run('vitest', npx, ['vitest', 'run', '--config', 'tests/vitest.config.ts', '--reporter=default', '--reporter=json', `--outputFile=${VITEST_JSON}`]);
stages.build = run('build', npx, ['next', 'build']);
console.log(`e2e ports (free ones, picked now): app ${E2E_PORT}, fake SMTP ${E2E_SMTP_PORT}`);
stages.e2e = stages.build ? run('e2e', npx, ['playwright', 'test', '--config', 'tests/playwright.config.ts']) : false;

const vitest = readJson<{ numPassedTests: number; numFailedTests: number }>(VITEST_JSON);
const playwright = readJson<{ stats: { expected: number; unexpected: number; flaky: number } }>(PLAYWRIGHT_JSON);
const passed = (vitest?.numPassedTests ?? 0) + (playwright?.stats.expected ?? 0) + (playwright?.stats.flaky ?? 0);
let failed = (vitest?.numFailedTests ?? 0) + (playwright?.stats.unexpected ?? 0);
// A stage that failed without reporting tests (lint, types, build, a crash) still counts as a failure.
for (const [name, ok] of Object.entries(stages)) {
  if (ok) continue;
  const reported = (name === 'vitest' && (vitest?.numFailedTests ?? 0) > 0) || (name === 'e2e' && (playwright?.stats.unexpected ?? 0) > 0);
  if (!reported) failed += 1;
}

console.log(`\nstages: ${Object.entries(stages).map(([n, ok]) => `${n} ${ok ? 'ok' : 'FAILED'}`).join(', ')}`);
fs.writeFileSync('var/test-summary.txt', `${passed} passed, ${failed} failed\n`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(Object.values(stages).every(Boolean) ? 0 : 1);
