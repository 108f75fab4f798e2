import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Definitions: 1 bar = 100 kPa, 1 atm = 101.325 kPa (10th CGPM), 1 psi =
// 6.894757293168 kPa (NIST SP 811 B.8). Gauge readings add the atmosphere.
describe('pressure units convert to MPa absolute', () => {
  const cases: [value: number, unit: string, expected_MPa: number][] = [
    [1e6, 'Pa', 1],
    [101.325, 'kPa', 0.101325],
    [4.2, 'MPa', 4.2],
    [10, 'bara', 1],
    [10, 'bar(a)', 1],
    [1, 'atm', 0.101325],
    [1, 'psia', 0.006894757293168],
    [0, 'psig', 0.101325],
    [0, 'barg', 0.101325],
    [41.89875, 'barg', 4.29120],
    [100, 'kPag', 0.201325],
    [1, 'MPag', 1.101325],
    [150, 'psig', 150 * 0.006894757293168 + 0.101325],
  ];
  test.each(cases)('%s %s is %s MPa', (value, unit, expected) => {
    expectClose(toSI(value, 'pressure', unit), expected, 1e-12, `${value} ${unit}`);
  });

  test('14.69595 psia is one standard atmosphere (NIST SP 811 B.8: 1 atm = 14.695 95 psi)', () => {
    expectClose(toSI(14.69595, 'pressure', 'psia'), 0.101325, 1e-6, '1 atm in psia');
  });

  test('gauge units use the site atmospheric pressure when one is given', () => {
    const site = { atmosphericPressure_MPa: 0.085 };
    expectClose(toSI(0, 'pressure', 'barg', site), 0.085, 1e-15, '0 barg at site');
    expectClose(toSI(10, 'pressure', 'barg', site), 1.085, 1e-15, '10 barg at site');
    expectClose(toSI(100, 'pressure', 'psig', site), 0.6894757293168 + 0.085, 1e-12, '100 psig at site');
  });

  test('absolute units ignore the site atmospheric pressure', () => {
    expectClose(toSI(10, 'pressure', 'bara', { atmosphericPressure_MPa: 0.085 }), 1, 1e-15, '10 bara at site');
  });
});
