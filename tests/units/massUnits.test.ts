import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Definitions: 1 lb = 0.45359237 kg (1959 agreement), 1 t = 1000 kg.
describe('mass flow units convert to kg/s', () => {
  const cases: [value: number, unit: string, expected_kg_s: number][] = [
    [15, 'kg/s', 15],
    [60, 'kg/min', 1],
    [3600, 'kg/h', 1],
    [3.6, 't/h', 1],
    [86.4, 't/d', 1],
    [1, 'lb/s', 0.45359237],
    [60, 'lb/min', 0.45359237],
    [3600, 'lb/h', 0.45359237],
    [3.6, 'klb/h', 0.45359237],
    [3.6, 'kpph', 0.45359237],
    [120, 'klb/h', (120_000 * 0.45359237) / 3600],
  ];
  test.each(cases)('%s %s is %s kg/s', (value, unit, expected) => {
    expectClose(toSI(value, 'massFlow', unit), expected, 1e-15, `${value} ${unit}`);
  });
});

describe('mass units convert to kg', () => {
  const cases: [value: number, unit: string, expected_kg: number][] = [
    [1000, 'g', 1],
    [1, 'kg', 1],
    [1, 't', 1000],
    [1, 'tonne', 1000],
    [1, 'lb', 0.45359237],
    [1, 'klb', 453.59237],
  ];
  test.each(cases)('%s %s is %s kg', (value, unit, expected) => {
    expectClose(toSI(value, 'mass', unit), expected, 1e-15, `${value} ${unit}`);
  });
});
