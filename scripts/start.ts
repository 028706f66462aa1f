import { spawn } from 'node:child_process';
import { migrateAndSeed, reportStartupError } from './db-tasks';
import { loadEnvFiles } from './load-env';

// npm start: migrate (no demo seed), then next start.
async function main() {
  loadEnvFiles();
  if (!process.env.NEXTAUTH_SECRET) {
    console.error('NEXTAUTH_SECRET is not set. Generate one with `openssl rand -base64 32` (see .env.example).');
    process.exit(1);
  }
  await migrateAndSeed({ seed: process.env.SEED_DEMO === '1' });
  const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', ...process.argv.slice(2)], {
    stdio: 'inherit',
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' },
  });
  const forward = (signal: NodeJS.Signals) => child.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  child.on('exit', (code) => process.exit(code ?? 0));
}

main().catch((error) => {
  reportStartupError(error);
  process.exit(1);
});
