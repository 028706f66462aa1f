import path from 'node:path';
import { defineConfig } from 'vitest/config';

const root = path.resolve(__dirname, '..');

export default defineConfig({
  root,
  resolve: { alias: { '@': root } },
  test: {
    include: ['tests/unit/**/*.test.ts', 'tests/integration/**/*.test.ts', 'tests/reference/**/*.test.ts'],
    environment: 'node',
    setupFiles: ['tests/setup-server-only.ts'],
    testTimeout: 20000,
    hookTimeout: 30000,
  },
});
