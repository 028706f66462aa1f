import { spawn } from 'node:child_process';
import { migrateAndSeed, reportStartupError } from './db-tasks';
import { ensureDevSecret } from './ensure-secret';
import { loadEnvFiles } from './load-env';

// npm run dev: secret, migrations, demo seed, the fake SMTP server, then next dev.
async function main() {
  loadEnvFiles();
  ensureDevSecret();
  await migrateAndSeed({ seed: true });
  const env = { ...process.env, NEXT_TELEMETRY_DISABLED: '1' };
  const children = [
    spawn(process.execPath, ['--import', 'tsx', 'scripts/fake-smtp.ts'], { stdio: 'inherit', env }),
    spawn(process.execPath, ['node_modules/next/dist/bin/next', 'dev', ...process.argv.slice(2)], { stdio: 'inherit', env }),
  ];
  const stop = () => children.forEach((c) => c.kill('SIGTERM'));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  children[1]?.on('exit', (code) => {
    stop();
    process.exit(code ?? 0);
  });
}

main().catch((error) => {
  reportStartupError(error);
  process.exit(1);
});
