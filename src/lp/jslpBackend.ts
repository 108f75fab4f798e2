import type { SolveOptions, SolverBackend } from './backend.js';
import { compileModel, objectiveValue } from './compile.js';
import { toJslpModel } from './jslpModel.js';
import { type JslpAnswer, JslpWatchdog } from './jslpWatchdog.js';
import type { LinearModel } from './linearModel.js';
import { buildResult, type SolveResult, type SolveStatus } from './result.js';

const backendName = 'jslp';

/** Watchdog limit when the caller sets none, seconds. */
export const defaultJslpTimeLimitSeconds = 10;

/**
 * javascript-lp-solver 1.0.3 verdicts to our statuses. The package reports
 * two flags, `feasible` and `bounded`; the key is built from both. Anything
 * else is 'unknown'.
 */
export const jslpStatusTable: ReadonlyMap<string, SolveStatus> = new Map<string, SolveStatus>([
  ['feasible/bounded', 'optimal'],
  ['feasible/unbounded', 'unbounded'],
  ['infeasible/bounded', 'infeasible'],
  ['infeasible/unbounded', 'infeasible'],
]);

export function jslpVerdictKey(answer: JslpAnswer): string {
  const feasible = answer.feasible === true ? 'feasible' : answer.feasible === false ? 'infeasible' : 'no-verdict';
  const bounded = answer.bounded === false ? 'unbounded' : 'bounded';
  return `${feasible}/${bounded}`;
}

const sharedWatchdog = new JslpWatchdog();

/** Stops the shared jslp worker thread (tests and benchmarks call this at the end). */
export function closeJslpWorker(): Promise<void> {
  return sharedWatchdog.close();
}

/**
 * javascript-lp-solver as a second, independent backend: for cross-checking
 * optima in tests and selectable by name. It gives no duals, and it runs in a
 * worker under a watchdog so a solve that never returns ends as
 * 'did_not_finish' instead of hanging the process.
 */
export const jslpBackend: SolverBackend = {
  name: backendName,
  async solve(model: LinearModel, options: SolveOptions = {}): Promise<SolveResult> {
    const compiled = compileModel(model);
    const limitSeconds = options.timeLimitSeconds ?? defaultJslpTimeLimitSeconds;
    const translation = toJslpModel(compiled);
    const outcome = await sharedWatchdog.run(translation.model, limitSeconds * 1000);
    const noDuals = 'javascript-lp-solver gives no duals';
    if (outcome.kind === 'timeout') {
      return buildResult(compiled, {
        backend: backendName,
        status: 'did_not_finish',
        timeMs: outcome.elapsedMs,
        message: `javascript-lp-solver did not finish within ${limitSeconds} s; the watchdog stopped it`,
        dualsMissingReason: noDuals,
      });
    }
    if (outcome.kind === 'failed') {
      return buildResult(compiled, {
        backend: backendName,
        status: 'error',
        timeMs: outcome.elapsedMs,
        message: `javascript-lp-solver failed: ${outcome.message}`,
        dualsMissingReason: noDuals,
      });
    }
    const key = jslpVerdictKey(outcome.answer);
    const status = jslpStatusTable.get(key) ?? 'unknown';
    const colValue = translation.recover(outcome.answer);
    return buildResult(
      compiled,
      {
        backend: backendName,
        status,
        timeMs: outcome.elapsedMs,
        ...(status === 'optimal' ? { colValue, objective: objectiveValue(compiled, colValue) } : {}),
        ...(status === 'unknown' ? { message: `javascript-lp-solver verdict "${key}" is not in the status table` } : {}),
        dualsMissingReason: noDuals,
      },
      options.feasibilityTolerance,
    );
  },
};
