import type { CompiledModel } from './compile.js';

/** The JSON model javascript-lp-solver 1.0.3 reads (its `Model` type, restated to keep the package out of this file). */
export interface JslpModel {
  optimize: string;
  opType: 'max' | 'min';
  constraints: Record<string, { min?: number; max?: number; equal?: number }>;
  variables: Record<string, Record<string, number>>;
  ints: Record<string, 1>;
}

export interface JslpTranslation {
  readonly model: JslpModel;
  /** Our column values from the package's answer (keys it leaves out are 0). */
  recover(answer: Readonly<Record<string, unknown>>): number[];
}

/** Key of the objective attribute; cannot clash with the generated keys below. */
const objectiveKey = 'objective_';

/** How column j is written: x = offset + sign * c<j>, or x = c<j>p - c<j>n when free. */
type ColumnMap = { readonly kind: 'shift'; readonly offset: number; readonly sign: 1 | -1 } | { readonly kind: 'split' };

/**
 * Translates a compiled model into the package's JSON with only
 * non-negative variables. Measured on 1.0.3: with its `unrestricted` flag the
 * package returned suboptimal points reported as optimal on random LPs, so
 * no variable is passed that way. A finite lower bound is shifted to zero
 * (x = l + x'), an upper bound alone is mirrored (x = u - x'), a free variable
 * is split (x = x+ - x-). Remaining upper bounds become one-variable rows
 * `b<j>`. Rows with no finite bound are left out, as they cannot bind.
 * Our names never reach the package (keys are generated), so none can clash
 * with its result fields such as `feasible`.
 */
export function toJslpModel(compiled: CompiledModel): JslpTranslation {
  const constraints: JslpModel['constraints'] = {};
  const variables: JslpModel['variables'] = {};
  const ints: JslpModel['ints'] = {};
  const maps: ColumnMap[] = [];
  const rowShift = new Float64Array(compiled.rowNames.length);
  // Column -> its (key, scale) pieces, to attach row coefficients afterwards.
  const pieces: { key: string; scale: number }[][] = [];

  compiled.columnNames.forEach((_, column) => {
    const isInteger = compiled.integrality[column] === 1;
    let lower = compiled.colLower[column];
    let upper = compiled.colUpper[column];
    if (isInteger) {
      lower = Math.ceil(lower);
      upper = Math.floor(upper);
    }
    const cost = compiled.colCost[column];
    if (lower === Number.NEGATIVE_INFINITY && upper === Number.POSITIVE_INFINITY) {
      maps.push({ kind: 'split' });
      const positive = `c${column}p`;
      const negative = `c${column}n`;
      variables[positive] = { [objectiveKey]: cost };
      variables[negative] = { [objectiveKey]: -cost };
      if (isInteger) ints[positive] = ints[negative] = 1;
      pieces.push([{ key: positive, scale: 1 }, { key: negative, scale: -1 }]);
      return;
    }
    const key = `c${column}`;
    const sign: 1 | -1 = lower === Number.NEGATIVE_INFINITY ? -1 : 1;
    const offset = sign === 1 ? lower : upper;
    const span = upper - lower; // bound on x' = sign * (x - offset); may be infinite
    maps.push({ kind: 'shift', offset, sign });
    variables[key] = { [objectiveKey]: sign * cost };
    if (Number.isFinite(span)) {
      constraints[`b${column}`] = { max: span };
      variables[key][`b${column}`] = 1;
    }
    if (isInteger) ints[key] = 1;
    pieces.push([{ key, scale: sign }]);
  });

  compiled.rowNames.forEach((_, row) => {
    const rowKey = `r${row}`;
    for (let k = compiled.starts[row]; k < compiled.starts[row + 1]; k++) {
      const column = compiled.indices[k];
      const map = maps[column];
      if (map.kind === 'shift') rowShift[row] += compiled.values[k] * map.offset;
    }
    const lower = compiled.rowLower[row] - rowShift[row];
    const upper = compiled.rowUpper[row] - rowShift[row];
    if (!Number.isFinite(lower) && !Number.isFinite(upper)) return;
    if (compiled.rowLower[row] === compiled.rowUpper[row]) constraints[rowKey] = { equal: lower };
    else {
      const bound: { min?: number; max?: number } = {};
      if (Number.isFinite(lower)) bound.min = lower;
      if (Number.isFinite(upper)) bound.max = upper;
      constraints[rowKey] = bound;
    }
    for (let k = compiled.starts[row]; k < compiled.starts[row + 1]; k++) {
      for (const piece of pieces[compiled.indices[k]]) variables[piece.key][rowKey] = piece.scale * compiled.values[k];
    }
  });

  return {
    model: { optimize: objectiveKey, opType: compiled.sense === 'maximize' ? 'max' : 'min', constraints, variables, ints },
    recover(answer) {
      const read = (key: string): number => {
        const found = answer[key];
        return typeof found === 'number' ? found : 0;
      };
      return maps.map((map, column) =>
        map.kind === 'split' ? read(`c${column}p`) - read(`c${column}n`) : map.offset + map.sign * read(`c${column}`),
      );
    },
  };
}
