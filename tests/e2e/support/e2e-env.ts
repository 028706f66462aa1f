import { execFileSync } from 'node:child_process';
import path from 'node:path';

// Asks the OS for a free loopback port. Synchronous, because Playwright reads its config synchronously.
function freePortNow(): number {
  const script = "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{process.stdout.write(String(s.address().port));s.close();});";
  return Number(execFileSync(process.execPath, ['-e', script], { encoding: 'utf8' }));
}

// The first process to load this module picks free ports and puts them in the environment, so the web server,
// Playwright's workers and any child process it starts inherit the same ones. E2E_PORT / E2E_SMTP_PORT may be set by hand.
function port(name: 'E2E_PORT' | 'E2E_SMTP_PORT'): number {
  const value = Number((process.env[name] ??= String(freePortNow())));
  if (!Number.isInteger(value) || value <= 0 || value > 65535) throw new Error(`${name} must be a port number, not ${process.env[name]}`);
  return value;
}

// Shared by the e2e server script and the specs, so both read the same mail folder.
export const E2E_PORT = port('E2E_PORT');
export const E2E_BASE_URL = `http://127.0.0.1:${E2E_PORT}`;
export const E2E_SMTP_PORT = port('E2E_SMTP_PORT');
export const E2E_DIR = path.resolve(__dirname, '../../../var/e2e');
export const E2E_MAIL_DIR = path.join(E2E_DIR, 'mail');

export function e2eEnv(): Record<string, string> {
  return {
    NODE_ENV: 'production',
    DATABASE_PATH: path.join(E2E_DIR, 'stepwell.sqlite'),
    MAIL_DIR: E2E_MAIL_DIR,
    SHOW_DEV_MAILBOX: '1',
    SMTP_URL: `smtp://127.0.0.1:${E2E_SMTP_PORT}`,
    NEXTAUTH_SECRET: 'e2e-only-secret-not-for-production-0123',
    NEXTAUTH_URL: E2E_BASE_URL,
    APP_URL: E2E_BASE_URL,
    NEXT_TELEMETRY_DISABLED: '1',
  };
}
