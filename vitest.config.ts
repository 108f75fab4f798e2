import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    globalSetup: ['tests/globalSetup.ts'],
    // The machine has two cores; more workers only add contention.
    maxWorkers: 2,
    // Generous on purpose: the suite must pass on a busy, shared machine. No
    // test asserts on speed; a timeout here only catches a hang. Speed targets
    // live in bench/.
    testTimeout: 180_000,
    hookTimeout: 180_000,
    teardownTimeout: 60_000,
  },
});
