import { defineConfig } from 'vitest/config';

// The pure shared/ tests alone: no database, no global setup.
export default defineConfig({
  test: {
    include: ['tests/shared/**/*.test.ts'],
    environment: 'node',
  },
});
