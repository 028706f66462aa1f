import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { startFakeSmtpServer } from '../lib/mail/fake-smtp-server';
import { E2E_DIR, E2E_MAIL_DIR, E2E_PORT, E2E_SMTP_PORT, e2eEnv } from '../tests/e2e/support/e2e-env';
import { migrateAndSeed } from './db-tasks';

// Playwright's web server: a fresh database with the demo seed, the fake SMTP server, and `next start`.
async function main() {
  fs.rmSync(E2E_DIR, { recursive: true, force: true });
  fs.mkdirSync(E2E_MAIL_DIR, { recursive: true });
  Object.assign(process.env, e2eEnv());
  if (!fs.existsSync(path.resolve('.next/BUILD_ID'))) {
    const build = spawnSync(process.execPath, ['node_modules/next/dist/bin/next', 'build'], { stdio: 'inherit', env: process.env });
    if (build.status !== 0) process.exit(build.status ?? 1);
  }
  console.log(`e2e server: app on port ${E2E_PORT}, fake SMTP on port ${E2E_SMTP_PORT} (free ports; set E2E_PORT / E2E_SMTP_PORT to choose)`);
  await migrateAndSeed({ seed: true });
  await startFakeSmtpServer({ port: E2E_SMTP_PORT, dir: E2E_MAIL_DIR });
  const next = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(E2E_PORT), '-H', '127.0.0.1'], {
    stdio: 'inherit',
    env: process.env,
  });
  const stop = () => next.kill('SIGTERM');
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  next.on('exit', (code) => process.exit(code ?? 0));
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
