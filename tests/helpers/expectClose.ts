// The one closeness check the tests share: names the failing row in its message.
import { expect } from 'vitest';

/**
 * Asserts |actual - expected| <= rel * |expected| (rel is used as an absolute
 * tolerance when expected is 0). NaN never passes. `label` names the row or
 * case so a failure points at it.
 */
export function expectClose(actual: number, expected: number, rel: number, label = 'value'): void {
  const tolerance = expected === 0 ? rel : rel * Math.abs(expected);
  const difference = Math.abs(actual - expected);
  const relative = expected === 0 ? difference : difference / Math.abs(expected);
  const ok = Number.isFinite(actual) && difference <= tolerance;
  expect(
    ok,
    `${label}: expected ${expected} within relative ${rel}, got ${actual} (relative difference ${relative.toPrecision(3)})`,
  ).toBe(true);
}
