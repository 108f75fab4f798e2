import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    globalSetup: ['tests/globalSetup.ts'],
    // The machine has two cores; more workers only add contention.
    maxWorkers: 2,
    testTimeout: 60_000,
  },
});
