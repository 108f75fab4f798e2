import type { SolveOptions, SolverBackend } from './backend.js';
import { compileModel } from './compile.js';
import type { LinearModel } from './linearModel.js';
import { buildResult, type DualSource, type SolveResult, type SolveStatus } from './result.js';

/** Values a fake backend hands back, by our names; variables left out are 0. */
export interface CannedSolution {
  status?: SolveStatus;
  /** Default: computed from the primal values and the model's objective. */
  objective?: number;
  primal?: Readonly<Record<string, number>>;
  /** Row duals by row name, in the shadowPrice convention; rows left out are 0. Omit for no duals. */
  dual?: Readonly<Record<string, number>>;
  reducedCost?: Readonly<Record<string, number>>;
  dualSource?: DualSource;
  message?: string;
}

export interface FakeBackend extends SolverBackend {
  /** Every model passed to solve, in order. */
  readonly calls: LinearModel[];
}

/**
 * A backend for tests of code that builds models: returns canned values
 * instead of solving. The model is still validated and the canned point is
 * still checked against the rows (a canned point that breaks a row comes back
 * as 'error'), so builder tests exercise the same path as real solves.
 */
export function createFakeBackend(
  canned: CannedSolution | ((model: LinearModel, call: number) => CannedSolution),
  name = 'fake',
): FakeBackend {
  const calls: LinearModel[] = [];
  return {
    name,
    calls,
    async solve(model: LinearModel, options: SolveOptions = {}): Promise<SolveResult> {
      calls.push(model);
      const answer = typeof canned === 'function' ? canned(model, calls.length - 1) : canned;
      const compiled = compileModel(model);
      for (const key of Object.keys(answer.primal ?? {})) {
        if (!compiled.columnIndex.has(key)) throw new Error(`Canned value for "${key}", which is not a variable of model "${model.name}".`);
      }
      const colValue = compiled.columnNames.map((column) => answer.primal?.[column] ?? 0);
      let objective = answer.objective;
      if (objective === undefined) {
        objective = compiled.offset;
        colValue.forEach((value, column) => (objective! += compiled.colCost[column] * value));
      }
      const status = answer.status ?? 'optimal';
      return buildResult(
        compiled,
        {
          backend: name,
          status,
          timeMs: 0,
          colValue,
          objective,
          ...(answer.dual
            ? {
                rowDual: compiled.rowNames.map((row) => answer.dual?.[row] ?? 0),
                colDual: compiled.columnNames.map((column) => answer.reducedCost?.[column] ?? 0),
                dualSource: answer.dualSource ?? 'lp',
              }
            : { dualsMissingReason: 'the canned answer has none' }),
          ...(answer.message === undefined ? {} : { message: answer.message }),
        },
        options.feasibilityTolerance,
      );
    },
  };
}
