import type { CompiledModel } from './compile.js';

/** The JSON model javascript-lp-solver 1.0.3 reads (its `Model` type, restated to keep the package out of this file). */
export interface JslpModel {
  optimize: string;
  opType: 'max' | 'min';
  constraints: Record<string, { min?: number; max?: number; equal?: number }>;
  variables: Record<string, Record<string, number>>;
  ints: Record<string, 1>;
  unrestricted: Record<string, 1>;
}

/** Key of the objective attribute; cannot clash with the generated row keys below. */
export const jslpObjectiveKey = 'objective_';

/** Generated key of column j; our names never reach the package, so none can clash with its result fields. */
export function jslpColumnKey(column: number): string {
  return `c${column}`;
}

/**
 * Translates a compiled model. The package knows only non-negative or free
 * variables, so any other bound becomes a one-variable row `b<j>`; rows
 * without a finite bound are left out, as they cannot bind.
 */
export function toJslpModel(compiled: CompiledModel): JslpModel {
  const constraints: JslpModel['constraints'] = {};
  const variables: JslpModel['variables'] = {};
  const ints: JslpModel['ints'] = {};
  const unrestricted: JslpModel['unrestricted'] = {};

  compiled.columnNames.forEach((_, column) => {
    const key = jslpColumnKey(column);
    const coefficients: Record<string, number> = { [jslpObjectiveKey]: compiled.colCost[column] };
    const lower = compiled.colLower[column];
    const upper = compiled.colUpper[column];
    if (lower < 0) unrestricted[key] = 1;
    const bound: { min?: number; max?: number } = {};
    if (Number.isFinite(lower) && lower !== 0) bound.min = lower;
    if (Number.isFinite(upper)) bound.max = upper;
    if (bound.min !== undefined || bound.max !== undefined) {
      constraints[`b${column}`] = bound;
      coefficients[`b${column}`] = 1;
    }
    if (compiled.integrality[column] === 1) ints[key] = 1;
    variables[key] = coefficients;
  });

  compiled.rowNames.forEach((_, row) => {
    const lower = compiled.rowLower[row];
    const upper = compiled.rowUpper[row];
    if (!Number.isFinite(lower) && !Number.isFinite(upper)) return;
    const key = `r${row}`;
    if (lower === upper) constraints[key] = { equal: lower };
    else {
      const bound: { min?: number; max?: number } = {};
      if (Number.isFinite(lower)) bound.min = lower;
      if (Number.isFinite(upper)) bound.max = upper;
      constraints[key] = bound;
    }
    for (let k = compiled.starts[row]; k < compiled.starts[row + 1]; k++) {
      variables[jslpColumnKey(compiled.indices[k])][key] = compiled.values[k];
    }
  });

  return {
    optimize: jslpObjectiveKey,
    opType: compiled.sense === 'maximize' ? 'max' : 'min',
    constraints,
    variables,
    ints,
    unrestricted,
  };
}
