import type { BoundChange, SolveOptions, SolverBackend } from './backend.js';
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
  async solveBoundVariants(model: LinearModel, variants: readonly (readonly BoundChange[])[], options: SolveOptions = {}): Promise<SolveResult[]> {
    const session = await HighsSession.open(model, options);
    try {
      const declared = new Map(model.variables.map((variable) => [variable.name, variable]));
      const results: SolveResult[] = [];
      let changed: string[] = [];
      for (const variant of variants) {
        // Each variant is set on the model as built: undo the last one first.
        for (const name of changed) session.setBounds(name, declared.get(name)!.lower, declared.get(name)!.upper);
        for (const [name, lower, upper] of variant) session.setBounds(name, lower, upper);
        changed = variant.map(([name]) => name);
        results.push(session.solve({ warmStart: true }));
      }
      return results;
    } finally {
      session.dispose();
    }
  },
};
