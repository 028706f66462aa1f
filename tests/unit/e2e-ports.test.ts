// The e2e harness picks free ports, so a machine where 3100 or 2626 (the old fixed ports) is taken still runs it.
import { spawnSync } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const ROOT = path.resolve(__dirname, '../..');
const blockers: net.Server[] = [];

function hold(port: number): Promise<void> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve()); // already taken by something else: just as good for this test
    server.listen(port, '127.0.0.1', () => {
      blockers.push(server);
      resolve();
    });
  });
}

function portsSeen(env: Record<string, string | undefined>): [number, number] {
  const script = "import('./tests/e2e/support/e2e-env.ts').then((mod) => { const m = mod.default ?? mod; console.log(m.E2E_PORT + ' ' + m.E2E_SMTP_PORT); })";
  const clean = Object.fromEntries(Object.entries({ ...process.env, ...env }).filter(([, v]) => v !== undefined)) as NodeJS.ProcessEnv;
  const r = spawnSync(path.join(ROOT, 'node_modules/.bin/tsx'), ['-e', script], { cwd: ROOT, env: clean, encoding: 'utf8', timeout: 30_000 });
  expect(r.status, r.stderr).toBe(0);
  const [app, smtp] = r.stdout.trim().split(' ').map(Number);
  return [app!, smtp!];
}

beforeAll(async () => {
  await hold(3100);
  await hold(2626);
});
afterAll(() => Promise.all(blockers.map((s) => new Promise((r) => s.close(() => r(undefined))))));

describe('e2e ports', () => {
  it('are free ones when nothing is set, never the ports already taken', () => {
    const [app, smtp] = portsSeen({ E2E_PORT: undefined, E2E_SMTP_PORT: undefined });
    expect(app).not.toBe(3100);
    expect(smtp).not.toBe(2626);
    expect(app).not.toBe(smtp);
  });

  it('follow E2E_PORT and E2E_SMTP_PORT when set', () => {
    expect(portsSeen({ E2E_PORT: '4311', E2E_SMTP_PORT: '4312' })).toEqual([4311, 4312]);
  });
});
