import type { LinearModel, ObjectiveSense } from './linearModel.js';
import { assertValidModel } from './validate.js';

/**
 * A model flattened to arrays, the form every backend consumes: columns in
 * declaration order, rows in declaration order, the matrix row-wise (CSR)
 * with zero coefficients dropped. Bounds arrays are copies, so a persistent
 * session can change them without touching the LinearModel.
 */
export interface CompiledModel {
  readonly name: string;
  readonly sense: ObjectiveSense;
  readonly offset: number;
  readonly columnNames: readonly string[];
  readonly rowNames: readonly string[];
  readonly columnIndex: ReadonlyMap<string, number>;
  readonly rowIndex: ReadonlyMap<string, number>;
  readonly colCost: Float64Array;
  readonly colLower: Float64Array;
  readonly colUpper: Float64Array;
  /** 1 where the column must take an integer value. */
  readonly integrality: Uint8Array;
  readonly rowLower: Float64Array;
  readonly rowUpper: Float64Array;
  readonly starts: Int32Array;
  readonly indices: Int32Array;
  readonly values: Float64Array;
  readonly isMip: boolean;
}

/** Validates (throwing InvalidModelError with every issue) and flattens. */
export function compileModel(model: LinearModel): CompiledModel {
  assertValidModel(model);
  const objective = model.objective!;
  const columnCount = model.variables.length;
  const rowCount = model.rows.length;
  const colCost = new Float64Array(columnCount);
  const colLower = new Float64Array(columnCount);
  const colUpper = new Float64Array(columnCount);
  const integrality = new Uint8Array(columnCount);
  const columnIndex = new Map<string, number>();
  for (const variable of model.variables) {
    colLower[variable.index] = variable.lower;
    colUpper[variable.index] = variable.upper;
    integrality[variable.index] = variable.isInteger ? 1 : 0;
    columnIndex.set(variable.name, variable.index);
  }
  for (const [variable, coefficient] of objective.expression.terms) colCost[variable.index] += coefficient;

  const rowLower = new Float64Array(rowCount);
  const rowUpper = new Float64Array(rowCount);
  const starts = new Int32Array(rowCount + 1);
  const indices: number[] = [];
  const values: number[] = [];
  const rowIndex = new Map<string, number>();
  for (const row of model.rows) {
    rowLower[row.index] = row.lower;
    rowUpper[row.index] = row.upper;
    rowIndex.set(row.name, row.index);
    for (const [variable, coefficient] of row.expression.terms) {
      if (coefficient === 0) continue;
      indices.push(variable.index);
      values.push(coefficient);
    }
    starts[row.index + 1] = indices.length;
  }
  return {
    name: model.name,
    sense: objective.sense,
    offset: objective.expression.constant,
    columnNames: model.variables.map((variable) => variable.name),
    rowNames: model.rows.map((row) => row.name),
    columnIndex,
    rowIndex,
    colCost,
    colLower,
    colUpper,
    integrality,
    rowLower,
    rowUpper,
    starts,
    indices: Int32Array.from(indices),
    values: Float64Array.from(values),
    isMip: integrality.some((flag) => flag === 1),
  };
}

/** A copy whose bound and cost arrays may be changed independently. */
export function copyCompiled(compiled: CompiledModel): CompiledModel {
  return {
    ...compiled,
    colCost: compiled.colCost.slice(),
    colLower: compiled.colLower.slice(),
    colUpper: compiled.colUpper.slice(),
    rowLower: compiled.rowLower.slice(),
    rowUpper: compiled.rowUpper.slice(),
  };
}

/** Row activities A x. */
export function rowActivities(compiled: CompiledModel, colValue: ArrayLike<number>): Float64Array {
  const activity = new Float64Array(compiled.rowNames.length);
  for (let row = 0; row < activity.length; row++) {
    let total = 0;
    for (let k = compiled.starts[row]; k < compiled.starts[row + 1]; k++) total += compiled.values[k] * colValue[compiled.indices[k]];
    activity[row] = total;
  }
  return activity;
}

/** Objective value c x + offset. */
export function objectiveValue(compiled: CompiledModel, colValue: ArrayLike<number>): number {
  let total = compiled.offset;
  for (let column = 0; column < compiled.colCost.length; column++) total += compiled.colCost[column] * colValue[column];
  return total;
}
