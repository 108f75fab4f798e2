import type { LinearModel } from './linearModel.js';
import type { SolveResult } from './result.js';

export interface SolveOptions {
  /** Wall-clock limit per solve, seconds. For javascript-lp-solver it is the watchdog limit (default 10 s). */
  timeLimitSeconds?: number;
  /** HiGHS presolve; default 'choose'. */
  presolve?: 'on' | 'off' | 'choose';
  /** Relative MIP gap at which HiGHS may stop; HiGHS default 1e-4. */
  mipRelativeGap?: number;
  /** Tolerance of our own primal check of every returned point; default 1e-6 relative. */
  feasibilityTolerance?: number;
  /** Whether a MIP's duals are computed, from the LP with its integers fixed (one more solve); default true. */
  mipDuals?: boolean;
}

/** One solver behind one small interface; results are keyed by our own names. */
export interface SolverBackend {
  readonly name: string;
  solve(model: LinearModel, options?: SolveOptions): Promise<SolveResult>;
  /**
   * Solves the model once per variant, each variant setting some variables'
   * bounds ([name, lower, upper]) on the model as built, and keeping the
   * solver's state from one to the next where the backend can (warm starts).
   * Optional: without it, callers build each variant as its own model.
   */
  solveBoundVariants?(model: LinearModel, variants: readonly (readonly BoundChange[])[], options?: SolveOptions): Promise<SolveResult[]>;
}

/** A variable's bounds in one variant of a model: [name, lower, upper]. */
export type BoundChange = readonly [string, number, number];
