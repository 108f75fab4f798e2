import { describe, expect, test } from 'vitest';
import { internalRateOfReturn, netPresentValue, projectCashFlows, simplePayback } from '../../src/scenarios/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Interest-table factors: P/A(10 %, 3) = 2.4869 and P/A(8 %, 20) = 9.8181, as
// printed in the compound-interest tables of engineering-economics texts
// (e.g. Newnan, Engineering Economic Analysis; quoted from memory, and each is
// recomputable by hand as (1 - 1.1^-3) / 0.1).
describe('netPresentValue', () => {
  test('1000 now against 500 a year for 3 years at 10 % is 1000 x (2.4869 x 0.5 - 1)', () => {
    expectClose(netPresentValue(0.1, [-1000, 500, 500, 500]), 500 * 2.4869 - 1000, 1e-4, 'P/A(10%,3)');
  });
  test('an annuity of 1 for 20 years at 8 % is worth P/A = 9.8181', () => {
    expectClose(netPresentValue(0.08, [0, ...Array(20).fill(1)]), 9.8181, 1e-4, 'P/A(8%,20)');
  });
  test('at zero rate it is the plain sum', () => {
    expect(netPresentValue(0, [-5, 2, 2, 2])).toBe(1);
  });
});

describe('internalRateOfReturn', () => {
  test('100 now for 110 in a year returns 10 % (by hand)', () => {
    expectClose(internalRateOfReturn([-100, 110])!, 0.1, 1e-9, 'one-year');
  });
  test('100 now for 121 in two years returns 10 % (by hand: 1.1^2 = 1.21)', () => {
    expectClose(internalRateOfReturn([-100, 0, 121])!, 0.1, 1e-9, 'two-year');
  });
  test('1000 for 500 a year over 3 years: P/A = 2 gives 23.38 % (interest tables bracket it between 20 % and 25 %)', () => {
    const irr = internalRateOfReturn([-1000, 500, 500, 500])!;
    expectClose(netPresentValue(irr, [-1000, 500, 500, 500]) + 1000, 1000, 1e-9, 'npv at irr');
    expect(irr).toBeGreaterThan(0.2);
    expect(irr).toBeLessThan(0.25);
    expectClose(irr, 0.2337519, 1e-6, 'irr');
  });
  test('a loss-making project has a negative IRR (by hand: 45y^2 + 45y = 100, y = 1/(1+i))', () => {
    const y = (-45 + Math.sqrt(45 * 45 + 4 * 45 * 100)) / 90;
    expectClose(internalRateOfReturn([-100, 45, 45])!, 1 / y - 1, 1e-9, 'negative');
  });
  test('cash flows that never change sign have no IRR', () => {
    expect(internalRateOfReturn([-100, -5, -5])).toBeNull();
    expect(internalRateOfReturn([100, 5])).toBeNull();
  });
});

describe('projectCashFlows and simplePayback', () => {
  test('a 2.5-year life ends with half a year of saving', () => {
    expect(projectCashFlows(1000, 400, 2.5)).toEqual([-1000, 400, 400, 200]);
  });
  test('simple payback is capital over the net annual saving', () => {
    expect(simplePayback(1.6e6, 239_828)).toBeCloseTo(6.6714, 4);
    expect(simplePayback(1000, 0)).toBeNull();
    expect(simplePayback(1000, -10)).toBeNull();
  });
});
