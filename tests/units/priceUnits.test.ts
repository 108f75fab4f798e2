import { describe, test } from 'vitest';
import { toSI } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

const MMBTU_GJ = 1.05505585262; // 1e6 Btu(IT), NIST SP 811 B.8
const LB_KG = 0.45359237; // 1959 agreement

describe('energy prices convert to currency per GJ', () => {
  const cases: [value: number, unit: string, expected: number][] = [
    [9, '$/GJ', 9],
    [0.009, '$/MJ', 9],
    [0.036, '$/kWh', 10],
    [36, '$/MWh', 10],
    [MMBTU_GJ, '$/MMBtu', 1],
    [MMBTU_GJ / 10, '$/therm', 1],
    [MMBTU_GJ, '$/Dth', 1],
    [36, 'EUR/MWh', 10],
    [36, '€/MWh', 10],
    [36, '£/MWh', 10],
  ];
  test.each(cases)('%s %s is %s per GJ', (value, unit, expected) => {
    expectClose(toSI(value, 'energyPrice', unit), expected, 1e-15, `${value} ${unit}`);
  });
});

describe('mass prices convert to currency per tonne', () => {
  const cases: [value: number, unit: string, expected: number][] = [
    [2.5, '$/t', 2.5],
    [2.5, '$/tonne', 2.5],
    [0.0025, '$/kg', 2.5],
    [LB_KG, '$/klb', 1],
    [LB_KG, '$/1000 lb', 1],
    [LB_KG / 1000, '$/lb', 1],
    [3, 'GBP/t', 3],
  ];
  test.each(cases)('%s %s is %s per t', (value, unit, expected) => {
    expectClose(toSI(value, 'massPrice', unit), expected, 1e-15, `${value} ${unit}`);
  });
});

describe('emission factors convert to kg CO2 per GJ', () => {
  const cases: [value: number, unit: string, expected: number][] = [
    [56.1, 'kg/GJ', 56.1],
    // IPCC 2006 Guidelines, Vol. 2, Table 2.2: natural gas 56,100 kg CO2/TJ
    // (quoted from memory; only the unit arithmetic is under test).
    [56_100, 'kg/TJ', 56.1],
    [56.1, 't/TJ', 56.1],
    [3.6, 'kg/MWh', 1],
    [0.0036, 't/MWh', 1],
    [3.6, 'g/kWh', 1],
    [0.0036, 'kg/kWh', 1],
    [3.6, 'lb/MWh', LB_KG],
    [MMBTU_GJ, 'kg/MMBtu', 1],
    [MMBTU_GJ, 'lb/MMBtu', LB_KG],
    [MMBTU_GJ, 'lb CO2/MMBtu', LB_KG],
    [56.1, 'kg CO2e/GJ', 56.1],
  ];
  test.each(cases)('%s %s is %s kg/GJ', (value, unit, expected) => {
    expectClose(toSI(value, 'emissionFactor', unit), expected, 1e-15, `${value} ${unit}`);
  });
});
