import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Definitions: T/K = t/degC + 273.15; T/K = (t/degF + 459.67) x 5/9;
// T/K = T/degR x 5/9 (NIST SP 811 B.8 and 4.2.1.1).
describe('temperature units convert to K', () => {
  const cases: [value: number, unit: string, expected_K: number][] = [
    [373.15, 'K', 373.15],
    [100, 'degC', 373.15],
    [100, '°C', 373.15],
    [100, 'C', 373.15],
    [100, 'deg C', 373.15],
    [32, 'degF', 273.15],
    [212, 'degF', 373.15],
    [212, '°F', 373.15],
    [-40, 'F', 233.15],
    [-40, 'degC', 233.15],
    [491.67, 'degR', 273.15],
    [0, 'R', 0],
    [750, 'degF', 672.0388888888889],
  ];
  test.each(cases)('%s %s is %s K', (value, unit, expected) => {
    expectClose(toSI(value, 'temperature', unit), expected, 1e-14, `${value} ${unit}`);
  });
});

describe('temperature difference units convert to K with no offset', () => {
  const cases: [value: number, unit: string, expected_K: number][] = [
    [10, 'K', 10],
    [10, 'degC', 10],
    [10, 'delta degC', 10],
    [9, 'degF', 5],
    [9, 'Δ°F', 5],
    [18, 'degR', 10],
  ];
  test.each(cases)('%s %s is %s K', (value, unit, expected) => {
    expectClose(toSI(value, 'temperatureDifference', unit), expected, 1e-15, `${value} ${unit}`);
  });
});
