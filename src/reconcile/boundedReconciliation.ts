// Weighted least squares with lower bounds on the flows (a flow is zero or
// more): the quadratic programme min sum ((x_i - y_i) / s_i)^2 subject to
// A x = 0 and x_j >= l_j, solved by a primal active-set method (Fletcher,
// Practical Methods of Optimization, 2nd ed. 1987, section 10.3) whose every
// step is the projection of reconcileLinear with the active bounds written as
// balances x_j = l_j. Bounds on reconciled flows as a QP: Narasimhan and
// Jordache, Data Reconciliation and Gross Error Detection (2000), ch. 5.
//
// A bound is released when the fit without it alone puts the flow above the
// bound: for a convex quadratic the optimum as a function of the held value
// t is convex, so the released flow lies on the side where the objective
// falls, and that is the sign of the bound's multiplier.
import { reconcileLinear, type BalanceRow, type LinearProblem, type LinearResult } from './linearReconciliation.js';

export interface BoundedResult {
  result: LinearResult;
  /** variables held at their bound in the optimum, in index order */
  atBound: number[];
}

/** Below this (kg/s, or the variable's own unit) a flow is taken as at its bound. */
const BOUND_TOLERANCE = 1e-9;

/** `unbounded`, when given, is reconcileLinear(problem) already solved: no bound broken then costs no solve. */
export function reconcileBounded(problem: LinearProblem, lower: readonly (number | null)[], unbounded?: LinearResult): BoundedResult {
  const active = new Set<number>();
  const solve = (held: ReadonlySet<number>): LinearResult => reconcileLinear({ ...problem, balances: [...problem.balances, ...boundRows(held, lower)] });
  let result = unbounded ?? solve(active);
  const limit = 4 * problem.variableCount + 4;
  for (let step = 0; step < limit; step++) {
    // Add the bound broken furthest, if any.
    let worst = -1;
    let worstBy = BOUND_TOLERANCE;
    result.estimate.forEach((value, j) => {
      const bound = lower[j];
      if (value === null || bound === null || bound === undefined || active.has(j)) return;
      if (bound - value > worstBy) [worst, worstBy] = [j, bound - value];
    });
    if (worst >= 0) {
      active.add(worst);
      result = solve(active);
      continue;
    }
    // Every bound holds: release one the optimum does not need.
    let release = -1;
    let releaseBy = BOUND_TOLERANCE;
    for (const j of active) {
      const without = new Set(active);
      without.delete(j);
      const value = solve(without).estimate[j];
      if (value !== null && value - lower[j]! > releaseBy) [release, releaseBy] = [j, value - lower[j]!];
    }
    if (release < 0) break;
    active.delete(release);
    result = solve(active);
  }
  return { result, atBound: [...active].sort((a, b) => a - b) };
}

function boundRows(held: ReadonlySet<number>, lower: readonly (number | null)[]): BalanceRow[] {
  return [...held].map((j) => ({ name: `bound ${j}`, terms: new Map([[j, 1]]), constant: -(lower[j] ?? 0) }));
}
