import path from 'node:path';
import { defineConfig } from 'vitest/config';

const root = path.resolve(__dirname, '../..');

// Run after a build, against PostgreSQL (TEST_POSTGRES_URL): scripts/test-postgres.ts, which .ci/run calls.
export default defineConfig({
  root,
  resolve: { alias: { '@': root } },
  test: {
    include: ['tests/two-instance/**/*.test.ts'],
    environment: 'node',
    testTimeout: 240_000,
    hookTimeout: 180_000,
  },
});
