// The solution of one pass, read by our own names.
import type { LinearExpression, SolveResult, Variable } from '../lp/index.js';

export interface PassSolution {
  value(variable: Variable | null | undefined): number;
  evaluate(expression: LinearExpression): number;
  /** d objective / d right-hand side of the named row, in objective units per row unit; null when unavailable */
  shadowPrice(rowName: string): number | null;
}

export function passSolution(result: SolveResult): PassSolution {
  return {
    value: (variable: Variable | null | undefined) => (variable ? result.value(variable) : 0),
    evaluate: (expression: LinearExpression) => expression.evaluate((variable) => result.value(variable)),
    shadowPrice: (row: string) => (result.dualsAvailable ? result.shadowPrice(row) : null),
  };
}
