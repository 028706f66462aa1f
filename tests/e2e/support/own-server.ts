// A production server of our own (the existing build) on its own port and database, for specs and benches that
// must kill it or fill it: `next start` on 127.0.0.1, the demo seed, no mail server (mail fails fast and is logged).
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../../..');

export interface OwnServer {
  url: string;
  dbFile: string;
  child: ChildProcess;
  /** SIGKILL: no shutdown code runs, as in a power cut or an OOM kill. */
  kill(): Promise<void>;
  stop(): Promise<void>;
}

export function ownServerEnv(port: number, dbFile: string): Record<string, string> {
  const url = `http://127.0.0.1:${port}`;
  return {
    NODE_ENV: 'production',
    DATABASE_PATH: dbFile,
    MAIL_DIR: path.join(path.dirname(dbFile), 'mail'),
    SMTP_URL: 'smtp://127.0.0.1:1',
    NEXTAUTH_SECRET: 'own-server-only-secret-not-for-production-42',
    NEXTAUTH_URL: url,
    APP_URL: url,
    NEXT_TELEMETRY_DISABLED: '1',
  };
}

/** Migrates and seeds the demo team into a new database file (unless `seed` is false and the file exists). */
export function prepareDatabase(dbFile: string, { seed = true } = {}): void {
  fs.mkdirSync(path.dirname(dbFile), { recursive: true });
  if (!seed) return;
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/db-seed.ts'], { cwd: ROOT, env: { ...process.env, DATABASE_PATH: dbFile }, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`seeding ${dbFile} failed: ${result.stderr}`);
}

async function waitForHealth(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`the server at ${url} exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the server at ${url} did not come up within ${timeoutMs} ms`);
}

/** `env` adds to or overrides the server's environment (DATABASE_URL for PostgreSQL, say). */
export async function startOwnServer({ port, dbFile, timeoutMs = 60_000, env = {} }: { port: number; dbFile: string; timeoutMs?: number; env?: Record<string, string> }): Promise<OwnServer> {
  if (!fs.existsSync(path.join(ROOT, '.next/BUILD_ID'))) throw new Error('no production build (.next/BUILD_ID); run `npm run build` first');
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: ROOT, env: { ...process.env, ...ownServerEnv(port, dbFile), ...env }, stdio: ['ignore', 'ignore', 'pipe'],
  });
  child.stderr?.on('data', (chunk: Buffer) => process.env.OWN_SERVER_LOG && process.stderr.write(chunk));
  const exited = () => new Promise<void>((resolve) => (child.exitCode !== null || child.signalCode !== null ? resolve() : child.once('exit', () => resolve())));
  try {
    await waitForHealth(url, child, timeoutMs);
  } catch (error) {
    child.kill('SIGKILL');
    throw error;
  }
  return {
    url, dbFile, child,
    kill: async () => {
      child.kill('SIGKILL');
      await exited();
    },
    stop: async () => {
      child.kill('SIGTERM');
      await exited();
    },
  };
}
