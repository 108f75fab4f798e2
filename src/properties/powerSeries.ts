// Evaluation of the IF97 polynomial sums  sum_i n_i x^I_i y^J_i  and their
// derivatives. Integer powers come from tables filled by repeated
// multiplication (cheaper than Math.pow and free of allocation); the
// coefficient rows are flattened once into typed arrays at module load.

/** Coefficient rows as printed in the release: [I, J, n]. */
export type CoefficientRow = readonly [number, number, number];

/** Derivatives of a two-variable power series, by x and y. */
export interface SeriesDerivatives {
  value: number;
  dx: number;
  dy: number;
  dxx: number;
  dyy: number;
  dxy: number;
}

export interface PowerSeries {
  readonly count: number;
  readonly exponentX: Int32Array;
  readonly exponentY: Int32Array;
  readonly coefficient: Float64Array;
  /** Lowest and highest power of x (and y) any evaluation needs, 0 included. */
  readonly minX: number;
  readonly maxX: number;
  readonly minY: number;
  readonly maxY: number;
  /** Scratch tables of powers; index k - minX holds x^k. */
  readonly powersX: Float64Array;
  readonly powersY: Float64Array;
}

/**
 * Flattens a table. `scaleX` turns fractional exponents into integers (the
 * region 2a T(p,s) table steps I by 0.25, so it is evaluated in x = pi^0.25
 * with exponent 4 I). `derivativeOrder` widens the power tables so that
 * derivatives up to that order need no extra work.
 */
export function createPowerSeries(
  rows: readonly CoefficientRow[],
  derivativeOrder: 0 | 1 | 2,
  scaleX = 1,
): PowerSeries {
  const count = rows.length;
  const exponentX = new Int32Array(count);
  const exponentY = new Int32Array(count);
  const coefficient = new Float64Array(count);
  let minX = 0;
  let maxX = 0;
  let minY = 0;
  let maxY = 0;
  rows.forEach(([I, J, n], index) => {
    const scaled = I * scaleX;
    if (!Number.isInteger(scaled) || !Number.isInteger(J)) {
      throw new Error(`coefficient row ${index} has exponents ${I}, ${J} that are not integers after scaling by ${scaleX}`);
    }
    exponentX[index] = scaled;
    exponentY[index] = J;
    coefficient[index] = n;
    minX = Math.min(minX, scaled - derivativeOrder);
    maxX = Math.max(maxX, scaled);
    minY = Math.min(minY, J - derivativeOrder);
    maxY = Math.max(maxY, J);
  });
  return {
    count,
    exponentX,
    exponentY,
    coefficient,
    minX,
    maxX,
    minY,
    maxY,
    powersX: new Float64Array(maxX - minX + 1),
    powersY: new Float64Array(maxY - minY + 1),
  };
}

/** Fills out[k - min] = base^k for min <= k <= max (min <= 0 <= max). */
export function fillPowers(base: number, min: number, max: number, out: Float64Array): void {
  const zero = -min;
  out[zero] = 1;
  let power = 1;
  for (let k = 1; k <= max; k++) {
    power *= base;
    out[zero + k] = power;
  }
  if (min < 0) {
    const inverse = 1 / base;
    power = 1;
    for (let k = 1; k <= zero; k++) {
      power *= inverse;
      out[zero - k] = power;
    }
  }
}

/** sum n x^I y^J. */
export function seriesValue(series: PowerSeries, x: number, y: number): number {
  const { count, exponentX, exponentY, coefficient, minX, minY, powersX, powersY } = series;
  fillPowers(x, minX, series.maxX, powersX);
  fillPowers(y, minY, series.maxY, powersY);
  let sum = 0;
  for (let i = 0; i < count; i++) {
    sum += coefficient[i] * powersX[exponentX[i] - minX] * powersY[exponentY[i] - minY];
  }
  return sum;
}

/** d/dy of sum n x^I y^J: sum n J x^I y^(J-1). */
export function seriesDy(series: PowerSeries, x: number, y: number): number {
  const { count, exponentX, exponentY, coefficient, minX, minY, powersX, powersY } = series;
  fillPowers(x, minX, series.maxX, powersX);
  fillPowers(y, minY, series.maxY, powersY);
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const J = exponentY[i];
    sum += coefficient[i] * J * powersX[exponentX[i] - minX] * powersY[J - 1 - minY];
  }
  return sum;
}

/** Value, first and second derivatives in one pass, written into `out`. */
export function seriesDerivatives(series: PowerSeries, x: number, y: number, out: SeriesDerivatives): SeriesDerivatives {
  const { count, exponentX, exponentY, coefficient, minX, minY, powersX, powersY } = series;
  fillPowers(x, minX, series.maxX, powersX);
  fillPowers(y, minY, series.maxY, powersY);
  let value = 0;
  let dx = 0;
  let dy = 0;
  let dxx = 0;
  let dyy = 0;
  let dxy = 0;
  for (let i = 0; i < count; i++) {
    const I = exponentX[i];
    const J = exponentY[i];
    const n = coefficient[i];
    const xI = powersX[I - minX];
    const xI1 = powersX[I - 1 - minX];
    const yJ = powersY[J - minY];
    const yJ1 = powersY[J - 1 - minY];
    value += n * xI * yJ;
    dx += n * I * xI1 * yJ;
    dy += n * J * xI * yJ1;
    dxx += n * I * (I - 1) * powersX[I - 2 - minX] * yJ;
    dyy += n * J * (J - 1) * xI * powersY[J - 2 - minY];
    dxy += n * I * J * xI1 * yJ1;
  }
  out.value = value;
  out.dx = dx;
  out.dy = dy;
  out.dxx = dxx;
  out.dyy = dyy;
  out.dxy = dxy;
  return out;
}

export function emptyDerivatives(): SeriesDerivatives {
  return { value: 0, dx: 0, dy: 0, dxx: 0, dyy: 0, dxy: 0 };
}
