import { defineConfig } from 'vitest/config';

// Browser tests: chromium against the built app served by the API (see scripts/test.mjs).
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60000,
    hookTimeout: 60000,
  },
});
