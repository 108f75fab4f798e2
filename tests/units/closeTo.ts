import { expect } from 'vitest';

// Local stand-in for the shared expectClose helper (not yet in tests/helpers
// when these tests were written): relative tolerance, and the failing row named.
export function expectClose(actual: number, expected: number, rel: number, label = ''): void {
  const scale = Math.max(Math.abs(expected), Number.MIN_VALUE);
  const error = Math.abs(actual - expected) / scale;
  expect(error <= rel, `${label}: ${actual} is not within ${rel} (relative) of ${expected}`).toBe(true);
}
