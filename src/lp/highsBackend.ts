import type { SolveOptions, SolverBackend } from './backend.js';
import { HighsSession } from './highsSession.js';
import type { LinearModel } from './linearModel.js';
import type { SolveResult } from './result.js';

/**
 * HiGHS (npm `highs`, WebAssembly), the default backend. Each call loads the
 * model into a fresh persistent HiGHS model from arrays, solves, and disposes
 * it; for repeated solves of one structure use openHighsSession instead.
 */
export const highsBackend: SolverBackend = {
  name: 'highs',
  async solve(model: LinearModel, options: SolveOptions = {}): Promise<SolveResult> {
    const session = await HighsSession.open(model, options);
    try {
      return session.solve({ warmStart: false });
    } finally {
      session.dispose();
    }
  },
};
