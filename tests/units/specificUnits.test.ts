import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Definitions: 1 Btu/lb = 2.326 kJ/kg and 1 Btu/(lb degR) = 4.1868 kJ/(kg K),
// both exact (NIST SP 811 B.8).
describe('specific enthalpy units convert to kJ/kg', () => {
  const cases: [value: number, unit: string, expected: number][] = [
    [2800, 'kJ/kg', 2800],
    [2.8e6, 'J/kg', 2800],
    [2.8, 'MJ/kg', 2800],
    [1, 'Btu/lb', 2.326],
    [1000, 'Btu/lbm', 2326],
  ];
  test.each(cases)('%s %s is %s kJ/kg', (value, unit, expected) => {
    expectClose(toSI(value, 'specificEnthalpy', unit), expected, 1e-15, `${value} ${unit}`);
  });
});

describe('specific entropy units convert to kJ/(kg K)', () => {
  const spellings = [
    'kJ/(kg K)', 'kJ/kg/K', 'kJ/kg-K', 'kJ/(kg·K)', 'kJ/(kgK)',
  ];
  test.each(spellings)('1 %s is 1 kJ/(kg K)', (unit) => {
    expectClose(toSI(1, 'specificEntropy', unit), 1, 1e-15, unit);
  });

  const british = ['Btu/(lb R)', 'Btu/lb/R', 'Btu/lb-R', 'Btu/(lb degF)', 'Btu/lb/degF', 'Btu/(lb °F)'];
  test.each(british)('1 %s is 4.1868 kJ/(kg K)', (unit) => {
    expectClose(toSI(1, 'specificEntropy', unit), 4.1868, 1e-15, unit);
  });

  test('1000 J/(kg K) is 1 kJ/(kg K)', () => {
    expectClose(toSI(1000, 'specificEntropy', 'J/(kg K)'), 1, 1e-15, 'J/(kg K)');
  });
});
