import { type CompiledModel, rowActivities } from './compile.js';

/** Default tolerance for the primal check, relative to the size of each row. */
export const defaultFeasibilityTolerance = 1e-6;

export interface FeasibilityReport {
  readonly feasible: boolean;
  readonly activity: Float64Array;
  /** Plain-English violations, worst first, at most five. */
  readonly violations: readonly string[];
}

/**
 * Checks a primal point against every row, column bound and integrality
 * requirement. A row passes when its violation is at most
 * `tolerance * max(1, |bound|, sum |a_ij x_j|)`: solvers work to absolute
 * tolerances on a scaled model, so the check scales with the row's magnitude.
 */
export function checkPrimalFeasibility(
  compiled: CompiledModel,
  colValue: ArrayLike<number>,
  tolerance = defaultFeasibilityTolerance,
): FeasibilityReport {
  const activity = rowActivities(compiled, colValue);
  const found: { excess: number; text: string }[] = [];
  for (let row = 0; row < activity.length; row++) {
    let magnitude = 0;
    for (let k = compiled.starts[row]; k < compiled.starts[row + 1]; k++) {
      magnitude += Math.abs(compiled.values[k] * colValue[compiled.indices[k]]);
    }
    const name = compiled.rowNames[row];
    checkBound(found, `row "${name}" activity`, activity[row], compiled.rowLower[row], compiled.rowUpper[row], tolerance, magnitude);
  }
  for (let column = 0; column < compiled.columnNames.length; column++) {
    const value = colValue[column];
    const name = compiled.columnNames[column];
    if (!Number.isFinite(value)) {
      found.push({ excess: Number.POSITIVE_INFINITY, text: `variable "${name}" has value ${value}` });
      continue;
    }
    checkBound(found, `variable "${name}"`, value, compiled.colLower[column], compiled.colUpper[column], tolerance, 0);
    if (compiled.integrality[column] === 1 && Math.abs(value - Math.round(value)) > 1e-6) {
      found.push({ excess: Math.abs(value - Math.round(value)), text: `integer variable "${name}" has fractional value ${value}` });
    }
  }
  found.sort((first, second) => second.excess - first.excess);
  return { feasible: found.length === 0, activity, violations: found.slice(0, 5).map((item) => item.text) };
}

function checkBound(
  found: { excess: number; text: string }[],
  label: string,
  value: number,
  lower: number,
  upper: number,
  tolerance: number,
  magnitude: number,
): void {
  if (value < lower) {
    const excess = lower - value;
    if (excess > tolerance * Math.max(1, Math.abs(lower), magnitude)) {
      found.push({ excess, text: `${label} ${value} is below its lower bound ${lower} by ${excess}` });
    }
  } else if (value > upper) {
    const excess = value - upper;
    if (excess > tolerance * Math.max(1, Math.abs(upper), magnitude)) {
      found.push({ excess, text: `${label} ${value} is above its upper bound ${upper} by ${excess}` });
    }
  }
}
