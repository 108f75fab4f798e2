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

/** What a HiGHS status means for the user, and what to change; empty for the statuses that need none. */
export const highsStatusAdvice: ReadonlyMap<number, string> = new Map([
  [0, 'HiGHS did not run the model; this is a bug in steamwright, please report it with the case'],
  [6, 'the model has no variables; the case describes no equipment to decide'],
  [9, 'the model is infeasible or unbounded and HiGHS could not tell which; check for a demand no source can meet, or a price that pays for unlimited flow'],
  [11, 'HiGHS stopped at an objective bound it was given'],
  [12, 'HiGHS stopped at an objective target it was given'],
  [15, 'HiGHS ended without saying why; try --solver jslp as a cross-check, or simplify the case'],
  [16, 'HiGHS stopped at a limit on the number of solutions'],
  [17, 'the solve was interrupted'],
]);
