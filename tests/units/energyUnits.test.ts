import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Definitions: 1 Btu(IT) = 1.05505585262 kJ (ISO 31-4; NIST SP 811 B.8),
// 1 therm = 100,000 Btu(IT), 1 kWh = 3.6 MJ, 1 hp = 745.69987158227022 W.
describe('energy units convert to GJ', () => {
  const cases: [value: number, unit: string, expected_GJ: number][] = [
    [1e6, 'kJ', 1],
    [1000, 'MJ', 1],
    [1, 'GJ', 1],
    [1, 'TJ', 1000],
    [1, 'kWh', 0.0036],
    [1, 'MWh', 3.6],
    [1, 'GWh', 3600],
    [1e6, 'Btu', 1.05505585262],
    [1000, 'kBtu', 1.05505585262],
    [1, 'MMBtu', 1.05505585262],
    [10, 'therm', 1.05505585262],
    [1, 'Dth', 1.05505585262],
  ];
  test.each(cases)('%s %s is %s GJ', (value, unit, expected) => {
    expectClose(toSI(value, 'energy', unit), expected, 1e-15, `${value} ${unit}`);
  });
});

describe('power units convert to kW', () => {
  const cases: [value: number, unit: string, expected_kW: number][] = [
    [1000, 'W', 1],
    [750, 'kW', 750],
    [5, 'MW', 5000],
    [1, 'hp', 0.74569987158227022],
    [3.6, 'GJ/h', 1000],
    [3600, 'Btu/h', 1.05505585262],
    [3.6, 'kBtu/h', 1.05505585262],
    [1, 'MMBtu/h', 1055.05585262 / 3.6],
  ];
  test.each(cases)('%s %s is %s kW', (value, unit, expected) => {
    expectClose(toSI(value, 'power', unit), expected, 1e-15, `${value} ${unit}`);
  });

  test('3412.14 Btu/h is 1 kW (3600 / 1.05505585262 = 3412.1416 Btu/h per kW)', () => {
    expectClose(toSI(3412.1416, 'power', 'Btu/h'), 1, 1e-8, 'Btu/h per kW');
  });
});
