import type { SolveStatus } from './result.js';

/**
 * HiGHS model status codes (highs 1.15 `constants.modelStatus`) to our
 * statuses. Code 9, "infeasible or unbounded", never reaches the caller
 * unresolved: the backend re-solves without presolve first, and only if that
 * still cannot tell does it end here as 'unknown'.
 */
export const highsStatusTable: ReadonlyMap<number, SolveStatus> = new Map<number, SolveStatus>([
  [0, 'unknown'], // not set
  [1, 'error'], // load error
  [2, 'error'], // model error
  [3, 'error'], // presolve error
  [4, 'error'], // solve error
  [5, 'error'], // postsolve error
  [6, 'unknown'], // empty model
  [7, 'optimal'],
  [8, 'infeasible'],
  [9, 'unknown'], // infeasible or unbounded, after the re-solve without presolve
  [10, 'unbounded'],
  [11, 'unknown'], // objective bound reached
  [12, 'unknown'], // objective target reached
  [13, 'time_limit'],
  [14, 'iteration_limit'],
  [15, 'unknown'],
  [16, 'unknown'], // solution limit reached
  [17, 'unknown'], // interrupted
]);

export const highsStatusNames: ReadonlyMap<number, string> = new Map([
  [0, 'not set'], [1, 'load error'], [2, 'model error'], [3, 'presolve error'], [4, 'solve error'],
  [5, 'postsolve error'], [6, 'empty'], [7, 'optimal'], [8, 'infeasible'], [9, 'infeasible or unbounded'],
  [10, 'unbounded'], [11, 'objective bound reached'], [12, 'objective target reached'], [13, 'time limit reached'],
  [14, 'iteration limit reached'], [15, 'unknown'], [16, 'solution limit reached'], [17, 'interrupted'],
]);

export function mapHighsStatus(code: number): SolveStatus {
  return highsStatusTable.get(code) ?? 'unknown';
}
