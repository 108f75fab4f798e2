import type { Highs, ModelData } from 'highs';
import type { CompiledModel } from './compile.js';
import { LpNameTable } from './lpNames.js';

/**
 * The compiled model as HiGHS column/row/CSR arrays, never as LP text:
 * passing arrays to a persistent model is an order of magnitude faster than
 * parsing text for small re-solved models. Names go in LP-safe spelling so
 * that HiGHS's own exports stay readable; results are read back by index.
 */
export function toHighsModelData(highs: Highs, compiled: CompiledModel): ModelData {
  const names = new LpNameTable([...compiled.columnNames, ...compiled.rowNames]);
  const numCols = compiled.columnNames.length;
  const numRows = compiled.rowNames.length;
  return {
    numCols,
    numRows,
    sense: compiled.sense === 'maximize' ? highs.constants.objectiveSense.maximize : highs.constants.objectiveSense.minimize,
    offset: compiled.offset,
    colCost: compiled.colCost,
    colLower: compiled.colLower,
    colUpper: compiled.colUpper,
    rowLower: compiled.rowLower,
    rowUpper: compiled.rowUpper,
    matrix: { format: 'csr', numRows, numCols, starts: compiled.starts, indices: compiled.indices, values: compiled.values },
    ...(compiled.isMip ? { integrality: Int32Array.from(compiled.integrality) } : {}),
    colNames: compiled.columnNames.map((name) => names.lpName(name)),
    rowNames: compiled.rowNames.map((name) => names.lpName(name)),
    modelName: compiled.name,
  };
}
