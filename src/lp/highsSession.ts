import type { Highs, Model as HighsModel } from 'highs';
import type { SolveOptions } from './backend.js';
import { type CompiledModel, compileModel, copyCompiled } from './compile.js';
import { loadHighs } from './highsLoader.js';
import { toHighsModelData } from './highsModelData.js';
import { applyHighsOptions, runHighs } from './highsRun.js';
import type { LinearModel } from './linearModel.js';
import type { SolveResult } from './result.js';
import type { Row } from './row.js';
import type { Variable } from './variable.js';

export interface SessionSolveOptions {
  /** Start from the previous basis (default true); false clears the solver state first. */
  warmStart?: boolean;
}

/**
 * One model structure held in HiGHS for repeated solves with changed costs,
 * bounds or right-hand sides (successive linearisation, scenarios, hourly
 * periods). The session owns WebAssembly memory that garbage collection never
 * frees: call dispose() when done, in a finally block.
 *
 * The session keeps its own copy of the bound and cost arrays, so each
 * returned point is checked against the rows as they stand now. The
 * LinearModel it was opened from is not changed.
 */
export class HighsSession {
  private isDisposed = false;

  private constructor(
    private readonly highs: Highs,
    private readonly solver: HighsModel,
    private compiled: CompiledModel,
    private source: LinearModel,
    private options: SolveOptions,
  ) {}

  /** Validates and compiles the model (throwing InvalidModelError), then loads it into HiGHS. */
  static async open(model: LinearModel, options: SolveOptions = {}): Promise<HighsSession> {
    const compiled = copyCompiled(compileModel(model));
    const highs = await loadHighs();
    const solver = highs.createModel(toHighsModelData(highs, compiled));
    try {
      applyHighsOptions(solver, options);
    } catch (error) {
      solver.dispose();
      throw error;
    }
    return new HighsSession(highs, solver, compiled, model, { ...options });
  }

  get disposed(): boolean {
    return this.isDisposed;
  }

  setOptions(options: SolveOptions): void {
    this.live();
    this.options = { ...options };
    applyHighsOptions(this.solver, this.options);
  }

  setCost(variable: Variable | string, cost: number): void {
    const column = this.column(variable);
    requireFinite(cost, `cost of variable "${this.compiled.columnNames[column]}"`);
    this.compiled.colCost[column] = cost;
    this.solver.changeColCost(column, cost);
  }

  /** Changes several costs in one call into HiGHS. */
  setCosts(costs: Iterable<readonly [Variable | string, number]>): void {
    const changes = new Map<number, number>();
    for (const [variable, cost] of costs) {
      const column = this.column(variable);
      requireFinite(cost, `cost of variable "${this.compiled.columnNames[column]}"`);
      changes.set(column, cost);
    }
    if (changes.size === 0) return;
    const columns = [...changes.keys()].sort((first, second) => first - second);
    const values = columns.map((column) => changes.get(column)!);
    columns.forEach((column, position) => (this.compiled.colCost[column] = values[position]));
    this.solver.changeColsCost({ kind: 'set', indices: columns }, values);
  }

  setObjectiveOffset(offset: number): void {
    this.live();
    requireFinite(offset, 'objective offset');
    (this.compiled as { offset: number }).offset = offset;
    this.solver.changeObjectiveOffset(offset);
  }

  setBounds(variable: Variable | string, lower: number, upper: number): void {
    const column = this.column(variable);
    checkBounds(lower, upper, `variable "${this.compiled.columnNames[column]}"`);
    this.compiled.colLower[column] = lower;
    this.compiled.colUpper[column] = upper;
    this.solver.changeColBounds(column, lower, upper);
  }

  /** Sets a row's normalised bounds (the expression constant already moved across). */
  setRowBounds(row: Row | string, lower: number, upper: number): void {
    const index = this.rowIndex(row);
    checkBounds(lower, upper, `row "${this.compiled.rowNames[index]}"`);
    this.compiled.rowLower[index] = lower;
    this.compiled.rowUpper[index] = upper;
    this.solver.changeRowBounds(index, lower, upper);
  }

  /**
   * Sets the right-hand side as it would be written in addRow: the row's
   * expression constant is moved across as addRow did. Not for ranged rows.
   */
  setRhs(row: Row | string, rhs: number): void {
    const index = this.rowIndex(row);
    const declared = this.source.rows[index];
    requireFinite(rhs, `right-hand side of row "${declared.name}"`);
    const bound = rhs - declared.expression.constant;
    if (declared.sense === '<=') this.setRowBounds(declared.name, Number.NEGATIVE_INFINITY, bound);
    else if (declared.sense === '>=') this.setRowBounds(declared.name, bound, Number.POSITIVE_INFINITY);
    else if (declared.sense === '=') this.setRowBounds(declared.name, bound, bound);
    else throw new Error(`Row "${declared.name}" is ranged; use setRowBounds(row, lower, upper) for it.`);
  }

  /**
   * Takes another model of the same structure (same columns, rows, matrix
   * pattern and integrality: see structureKey) and changes in HiGHS only the
   * costs, bounds and coefficients that differ, keeping the basis for a warm
   * start. The caller vouches for the structure.
   */
  reload(model: LinearModel, compiled: CompiledModel, options: SolveOptions): void {
    this.live();
    const old = this.compiled;
    const costColumns: number[] = [];
    const costs: number[] = [];
    for (let column = 0; column < compiled.colCost.length; column++) {
      if (compiled.colCost[column] !== old.colCost[column]) {
        costColumns.push(column);
        costs.push(compiled.colCost[column]);
      }
      if (compiled.colLower[column] !== old.colLower[column] || compiled.colUpper[column] !== old.colUpper[column]) this.solver.changeColBounds(column, compiled.colLower[column], compiled.colUpper[column]);
    }
    if (costColumns.length > 0) this.solver.changeColsCost({ kind: 'set', indices: costColumns }, costs);
    if (compiled.offset !== old.offset) this.solver.changeObjectiveOffset(compiled.offset);
    for (let row = 0; row < compiled.rowLower.length; row++) {
      if (compiled.rowLower[row] !== old.rowLower[row] || compiled.rowUpper[row] !== old.rowUpper[row]) this.solver.changeRowBounds(row, compiled.rowLower[row], compiled.rowUpper[row]);
      for (let k = compiled.starts[row]; k < compiled.starts[row + 1]; k++) {
        if (compiled.values[k] !== old.values[k]) this.solver.changeCoefficient(row, compiled.indices[k], compiled.values[k]);
      }
    }
    this.compiled = copyCompiled(compiled);
    this.source = model;
    this.setOptions(options);
  }

  /** Solves the current state; the time limit applies to this run alone. */
  solve(options: SessionSolveOptions = {}): SolveResult {
    this.live();
    return runHighs(this.highs, this.solver, this.compiled, this.options, options.warmStart ?? true);
  }

  /** The model as HiGHS holds it, in HiGHS's own LP writer's text (for debugging). */
  exportHighsLp(): string {
    this.live();
    return this.solver.exportModel('lp');
  }

  /** Frees the WebAssembly memory. Idempotent. */
  dispose(): void {
    if (this.isDisposed) return;
    this.isDisposed = true;
    this.solver.dispose();
  }

  private live(): void {
    if (this.isDisposed) throw new Error(`The HiGHS session for model "${this.compiled.name}" was disposed; open a new one.`);
  }

  private column(variable: Variable | string): number {
    this.live();
    const name = typeof variable === 'string' ? variable : variable.name;
    const index = this.compiled.columnIndex.get(name);
    if (index === undefined || (typeof variable !== 'string' && variable.owner !== this.source)) {
      throw new Error(`Variable "${name}" is not in model "${this.compiled.name}".`);
    }
    return index;
  }

  private rowIndex(row: Row | string): number {
    this.live();
    const name = typeof row === 'string' ? row : row.name;
    const index = this.compiled.rowIndex.get(name);
    if (index === undefined || (typeof row !== 'string' && this.source.rows[index] !== row)) {
      throw new Error(`Row "${name}" is not in model "${this.compiled.name}".`);
    }
    return index;
  }
}

/** Opens a persistent HiGHS session; see HighsSession. */
export function openHighsSession(model: LinearModel, options: SolveOptions = {}): Promise<HighsSession> {
  return HighsSession.open(model, options);
}

function requireFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new Error(`The ${what} is ${value}; expected a finite number.`);
}

function checkBounds(lower: number, upper: number, what: string): void {
  if (Number.isNaN(lower) || Number.isNaN(upper)) throw new Error(`Bounds of ${what} contain NaN; expected numbers or infinities.`);
  if (lower > upper) throw new Error(`Bounds of ${what}: lower ${lower} is above upper ${upper}.`);
  if (lower === Number.POSITIVE_INFINITY || upper === Number.NEGATIVE_INFINITY) {
    throw new Error(`Bounds of ${what} [${lower}, ${upper}] cannot be met by any finite value.`);
  }
}
