// The one line for a case that could not be solved, with advice where the
// backend is the cause rather than the case.
import type { BackendName } from '../lp/index.js';
import { CliError, EXIT_PROBLEMS } from './errors.js';

export function solveFailure(casePath: string, scenario: string | undefined, outcome: { reason: string; message: string }, solver: BackendName): CliError {
  const where = `${casePath}${scenario ? ` scenario "${scenario}"` : ''}`;
  // javascript-lp-solver is the cross-check backend; on larger models it can
  // return a point that breaks rows, which the result check refuses.
  const advice = outcome.reason === 'solver' && solver === 'jslp' ? '; javascript-lp-solver is the cross-check backend: solve with --solver highs' : '';
  return new CliError(`${where}: ${outcome.message}${advice}`, EXIT_PROBLEMS);
}
