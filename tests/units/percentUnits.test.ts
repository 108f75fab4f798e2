import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

describe('percent is stored as a fraction', () => {
  test.each([
    [2, '%', 0.02],
    [0.5, 'percent', 0.005],
    [98, 'pct', 0.98],
  ])('%s %s is %s', (value, unit, expected) => {
    expectClose(toSI(value, 'percent', unit), expected, 1e-15, `${value} ${unit}`);
  });
});
