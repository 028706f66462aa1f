import { defineConfig } from '@playwright/test';
import { E2E_BASE_URL } from './e2e/support/e2e-env';

// Debian's Chromium, never a downloaded browser; the flags keep it off the closed network.
export default defineConfig({
  testDir: './e2e',
  outputDir: '../var/test-results',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list'], ['json', { outputFile: '../var/playwright-results.json' }]],
  use: {
    baseURL: E2E_BASE_URL,
    trace: 'retain-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  webServer: {
    command: 'npx tsx scripts/e2e-server.ts',
    cwd: '..',
    url: `${E2E_BASE_URL}/api/health`,
    reuseExistingServer: false,
    timeout: 180_000,
    stdout: 'pipe',
    stderr: 'pipe',
  },
});
