import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from './support/free-port';

// npm run test:postgres: the integration suite again on a throwaway PostgreSQL cluster, then the two-instance
// test (needs the build npm test made). Starts the cluster on a free loopback port, always stops it, prints totals.
const CLUSTER_SCRIPT = 'scripts/postgres/throwaway-cluster.sh';
const env = { ...process.env, NEXT_TELEMETRY_DISABLED: '1' };

function vitest(label: string, config: string, args: string[], json: string, url: string): boolean {
  console.log(`\n=== ${label} ===`);
  const started = Date.now();
  fs.rmSync(json, { force: true });
  const result = spawnSync('npx', ['vitest', 'run', '--config', config, ...args, '--reporter=default', '--reporter=json', `--outputFile=${json}`], {
    stdio: 'inherit', env: { ...env, TEST_POSTGRES_URL: url },
  });
  const ok = result.status === 0;
  console.log(`=== ${label}: ${ok ? 'ok' : 'FAILED'} (${((Date.now() - started) / 1000).toFixed(1)} s) ===`);
  return ok;
}

function counts(json: string): { passed: number; failed: number } | null {
  try {
    const r = JSON.parse(fs.readFileSync(json, 'utf8')) as { numPassedTests: number; numFailedTests: number };
    return { passed: r.numPassedTests, failed: r.numFailedTests };
  } catch {
    return null;
  }
}

async function main(): Promise<number> {
  fs.mkdirSync('var', { recursive: true });
  const summaryFile = path.resolve('var/test-summary-postgres.txt');
  const finish = (passed: number, failed: number, ok: boolean) => {
    fs.writeFileSync(summaryFile, `${passed} passed, ${failed} failed\n`);
    console.log(`${passed} passed, ${failed} failed (PostgreSQL)`);
    return ok ? 0 : 1;
  };
  // The cluster runs as the postgres user when we are root, so its folder's parent must be traversable: /tmp is.
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'stepwell-pg-'));
  fs.chmodSync(dir, 0o755);
  const port = await freePort();
  const start = spawnSync('bash', [CLUSTER_SCRIPT, 'start', dir, String(port)], { encoding: 'utf8', env });
  if (start.status !== 0) {
    console.error(`[test:postgres] could not start a throwaway cluster:\n${start.stderr}`);
    spawnSync('bash', [CLUSTER_SCRIPT, 'stop', dir]);
    return finish(0, 1, false);
  }
  const url = start.stdout.trim().split('\n').pop()!;
  const stop = () => spawnSync('bash', [CLUSTER_SCRIPT, 'stop', dir], { stdio: 'inherit' });
  // pg_ctl detaches the server, so a killed run must stop it here or it outlives CI.
  for (const [signal, code] of [['SIGINT', 130], ['SIGTERM', 143], ['SIGHUP', 129]] as const) {
    process.once(signal, () => {
      stop();
      process.exit(code);
    });
  }
  console.log(`[test:postgres] throwaway cluster on 127.0.0.1:${port}`);
  const runs: Array<{ ok: boolean; json: string }> = [];
  try {
    const integration = path.resolve('var/vitest-postgres.json');
    runs.push({ ok: vitest('integration on PostgreSQL', 'tests/vitest.config.ts', ['tests/integration'], integration, url), json: integration });
    const twoInstances = path.resolve('var/vitest-two-instance.json');
    if (!fs.existsSync('.next/BUILD_ID')) {
      console.error('[test:postgres] no production build (.next/BUILD_ID): run `npm run build` (npm test does) before the two-instance test');
      runs.push({ ok: false, json: twoInstances });
    } else {
      runs.push({ ok: vitest('two instances on PostgreSQL', 'tests/two-instance/vitest.config.ts', [], twoInstances, url), json: twoInstances });
    }
  } finally {
    stop();
  }
  let passed = 0;
  let failed = 0;
  for (const run of runs) {
    const c = counts(run.json);
    passed += c?.passed ?? 0;
    failed += c?.failed ?? 0;
    if (!run.ok && !c?.failed) failed += 1; // a run that failed without reporting a failed test (a crash, a missing build)
  }
  return finish(passed, failed, runs.every((r) => r.ok));
}

main().then((code) => process.exit(code), (error: unknown) => {
  console.error(error);
  process.exit(1);
});
