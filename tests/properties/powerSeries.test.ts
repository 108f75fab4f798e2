import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  createPowerSeries,
  derivativeRowsInY,
  emptyDerivatives,
  emptyValueAndSlope,
  fillPowers,
  seriesDerivatives,
  seriesValue,
  seriesValueAndDy,
  type CoefficientRow,
} from '../../src/properties/powerSeries.js';
import { expectClose } from '../helpers/expectClose.js';

// A small made-up table with negative, zero and large exponents, like the IF97 ones.
const ROWS: CoefficientRow[] = [
  [0, -3, 0.7],
  [0, 0, -1.2],
  [1, 2, 0.35],
  [3, 7, -0.02],
  [-2, 1, 0.5],
  [5, 13, 1e-3],
];

function direct(x: number, y: number): number {
  return ROWS.reduce((sum, [I, J, n]) => sum + n * x ** I * y ** J, 0);
}

describe('powerSeries', () => {
  it('fillPowers matches Math.pow from x^-43 to x^58', () => {
    const min = -43;
    const max = 58;
    const zero = 3 - min;
    const out = new Float64Array(max - min + 7);
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 1.9, noNaN: true }), (base) => {
        fillPowers(base, min, max, zero, out);
        for (let k = min; k <= max; k++) expectClose(out[zero + k], base ** k, 1e-13, `${base}^${k}`);
      }),
      { numRuns: 50 },
    );
  });

  it('seriesValue is the direct sum', () => {
    const series = createPowerSeries(ROWS, 0);
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 2, noNaN: true }), fc.double({ min: 0.5, max: 2, noNaN: true }), (x, y) => {
        expectClose(seriesValue(series, x, y), direct(x, y), 1e-13, `at ${x}, ${y}`);
      }),
    );
  });

  it('seriesDerivatives agree with central differences', () => {
    const series = createPowerSeries(ROWS, 2);
    const d = seriesDerivatives(series, 1.3, 0.9, emptyDerivatives());
    const step = 1e-5;
    expectClose(d.value, direct(1.3, 0.9), 1e-13, 'value');
    expectClose(d.dx, (direct(1.3 + step, 0.9) - direct(1.3 - step, 0.9)) / (2 * step), 1e-8, 'dx');
    expectClose(d.dy, (direct(1.3, 0.9 + step) - direct(1.3, 0.9 - step)) / (2 * step), 1e-8, 'dy');
    const bigStep = 1e-4;
    const dx = (x: number, y: number): number => (direct(x + step, y) - direct(x - step, y)) / (2 * step);
    const dy = (x: number, y: number): number => (direct(x, y + step) - direct(x, y - step)) / (2 * step);
    expectClose(d.dxx, (dx(1.3 + bigStep, 0.9) - dx(1.3 - bigStep, 0.9)) / (2 * bigStep), 1e-5, 'dxx');
    expectClose(d.dyy, (dy(1.3, 0.9 + bigStep) - dy(1.3, 0.9 - bigStep)) / (2 * bigStep), 1e-5, 'dyy');
    expectClose(d.dxy, (dy(1.3 + bigStep, 0.9) - dy(1.3 - bigStep, 0.9)) / (2 * bigStep), 1e-5, 'dxy');
  });

  it('the derived rows of d/dy evaluate to the derivative, and seriesValueAndDy to the second', () => {
    const full = seriesDerivatives(createPowerSeries(ROWS, 2), 1.1, 1.4, emptyDerivatives());
    const slope = createPowerSeries(derivativeRowsInY(ROWS), 1);
    expectClose(seriesValue(slope, 1.1, 1.4), full.dy, 1e-13, 'dy');
    const both = seriesValueAndDy(slope, 1.1, 1.4, emptyValueAndSlope());
    expectClose(both.value, full.dy, 1e-13, 'dy');
    expectClose(both.dy, full.dyy, 1e-13, 'dyy');
  });

  it('refuses exponents that are not integers after scaling', () => {
    expect(() => createPowerSeries([[0.25, 1, 1]], 0)).toThrow('not integers after scaling by 1');
    expect(createPowerSeries([[0.25, 1, 1]], 0, 4).exponentX[0]).toBe(1);
  });
});
