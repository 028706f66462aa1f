import path from 'node:path';

// Shared by the e2e server script and the specs, so both read the same mail folder.
export const E2E_PORT = 3100;
export const E2E_BASE_URL = `http://127.0.0.1:${E2E_PORT}`;
export const E2E_SMTP_PORT = 2626;
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
