import type { Highs, Model as HighsModel } from 'highs';
import type { SolveOptions } from './backend.js';
import type { CompiledModel } from './compile.js';
import { highsStatusAdvice, highsStatusNames, mapHighsStatus } from './highsStatus.js';
import { buildResult, type RawOutcome, type SolveResult } from './result.js';

const backendName = 'highs';
const unboundedOrInfeasible = 9;
const optimal = 7;
const feasibleSolution = 2;

/** Options applied to a persistent HiGHS model before each run. */
export function applyHighsOptions(model: HighsModel, options: SolveOptions): void {
  model.options.set({
    output_flag: false,
    // Cumulative across runs on a persistent model; the clocks are zeroed before each run.
    // The wrapper refuses an infinite value; the largest double means "no limit".
    time_limit: options.timeLimitSeconds ?? Number.MAX_VALUE,
    presolve: options.presolve ?? 'choose',
    mip_rel_gap: options.mipRelativeGap ?? 1e-4,
  });
}

/**
 * One solve of a persistent HiGHS model holding `compiled`, options already
 * applied. Resolves "infeasible or unbounded" from presolve by re-solving
 * without presolve; gets MIP duals from the LP with integers fixed at the
 * optimum; checks the point against the rows before returning it.
 */
export function runHighs(
  highs: Highs,
  model: HighsModel,
  compiled: CompiledModel,
  options: SolveOptions,
  warmStart: boolean,
): SolveResult {
  const started = performance.now();
  let raw: RawOutcome;
  try {
    raw = solveOnce(highs, model, compiled, options, warmStart, started);
  } catch (error) {
    raw = {
      backend: backendName,
      status: 'error',
      timeMs: performance.now() - started,
      message: `HiGHS failed: ${error instanceof Error ? error.message : String(error)}`,
    };
  }
  return buildResult(compiled, raw, options.feasibilityTolerance);
}

function solveOnce(
  highs: Highs,
  model: HighsModel,
  compiled: CompiledModel,
  options: SolveOptions,
  warmStart: boolean,
  started: number,
): RawOutcome {
  if (!warmStart) model.clearSolver();
  model.zeroAllClocks();
  let code = model.run().modelStatus;
  const notes: string[] = [];
  if (code === unboundedOrInfeasible && (options.presolve ?? 'choose') !== 'off') {
    model.options.set('presolve', 'off');
    try {
      model.clearSolver();
      model.zeroAllClocks();
      code = model.run().modelStatus;
      notes.push('presolve could not tell infeasible from unbounded, so the model was re-solved without presolve');
    } finally {
      model.options.set('presolve', options.presolve ?? 'choose');
    }
  }
  const status = mapHighsStatus(code);
  if (code === unboundedOrInfeasible) notes.push('HiGHS could not tell infeasible from unbounded even without presolve');
  if (status === 'unknown' || status === 'error') {
    const advice = highsStatusAdvice.get(code);
    notes.push(`HiGHS model status ${code} (${highsStatusNames.get(code) ?? 'not listed'})${advice ? `: ${advice}` : ''}`);
  }

  const primalStatus = Number(model.info.get('primal_solution_status'));
  const hasPoint = primalStatus === feasibleSolution && (status === 'optimal' || status === 'time_limit' || status === 'iteration_limit');
  const outcome: { -readonly [K in keyof RawOutcome]: RawOutcome[K] } = {
    backend: backendName,
    status,
    timeMs: 0,
    iterations: compiled.isMip ? null : lpIterations(model),
    mipNodes: compiled.isMip ? Number(model.info.get('mip_node_count')) : null,
  };
  if (hasPoint) {
    const solution = model.getSolution();
    outcome.colValue = solution.colValue;
    outcome.objective = model.getObjectiveValue();
    if (!compiled.isMip && code === optimal && Number(model.info.get('dual_solution_status')) === feasibleSolution) {
      outcome.rowDual = solution.rowDual;
      outcome.colDual = solution.colDual;
      outcome.dualSource = 'lp';
    } else if (compiled.isMip && code === optimal && options.mipDuals === false) {
      outcome.dualsMissingReason = 'MIP duals were not asked for (mipDuals: false)';
    } else if (compiled.isMip && code === optimal) {
      const fixed = fixedLpDuals(highs, model, options);
      if (fixed.rowDual) {
        outcome.rowDual = fixed.rowDual;
        outcome.colDual = fixed.colDual;
        outcome.dualSource = 'fixed_lp';
      } else {
        outcome.dualsMissingReason = fixed.reason;
      }
    } else {
      outcome.dualsMissingReason = `HiGHS gives no duals when the solve ends "${status}"`;
    }
  }
  if (status === 'time_limit' || status === 'iteration_limit') notes.push(limitNote(model, compiled, status, options, hasPoint));
  outcome.timeMs = performance.now() - started;
  if (notes.length > 0) outcome.message = notes.join('; ');
  return outcome;
}

/** A stop at a limit: the best point's gap for a MIP, and what to change. */
function limitNote(model: HighsModel, compiled: CompiledModel, status: 'time_limit' | 'iteration_limit', options: SolveOptions, hasPoint: boolean): string {
  const limit = status === 'time_limit' ? `the time limit of ${options.timeLimitSeconds ?? 'unlimited'} s` : 'the iteration limit';
  const raise = status === 'time_limit' ? 'raise solver.time_limit_seconds' : 'simplify the case';
  if (!hasPoint) return `HiGHS reached ${limit} before it found any feasible point; ${raise}`;
  if (!compiled.isMip) return `HiGHS reached ${limit}; the point returned is feasible but may not be optimal; ${raise}`;
  const gap = Number(model.info.get('mip_gap'));
  const gapText = Number.isFinite(gap) ? `within ${(gap * 100).toPrecision(3)} % of the best possible (MIP gap)` : 'of unknown distance from the best possible';
  return `HiGHS reached ${limit}; the best point found is ${gapText}; ${raise} or solver.mip_gap to accept it`;
}

function lpIterations(model: HighsModel): number {
  return (
    Number(model.info.get('simplex_iteration_count')) +
    Number(model.info.get('ipm_iteration_count')) +
    Number(model.info.get('crossover_iteration_count'))
  );
}

/** MIP solves return no duals; solve the LP with integers fixed at the optimum for them. */
function fixedLpDuals(
  highs: Highs,
  model: HighsModel,
  options: SolveOptions,
): { rowDual?: Float64Array; colDual?: Float64Array; reason: string } {
  const fixedData = model.getFixedLp('csr');
  const fixedModel = highs.createModel({ ...fixedData, integrality: undefined });
  try {
    applyHighsOptions(fixedModel, options);
    const code = fixedModel.run().modelStatus;
    if (code !== optimal || Number(fixedModel.info.get('dual_solution_status')) !== feasibleSolution) {
      return { reason: `the LP with integers fixed ended with HiGHS status ${code} (${highsStatusNames.get(code) ?? 'not listed'})` };
    }
    const solution = fixedModel.getSolution();
    return { rowDual: solution.rowDual, colDual: solution.colDual, reason: '' };
  } finally {
    fixedModel.dispose();
  }
}
