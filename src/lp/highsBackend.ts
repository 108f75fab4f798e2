import type { BoundChange, SolveOptions, SolverBackend } from './backend.js';
import { AsyncLocalStorage } from 'node:async_hooks';
import { compileModel, type CompiledModel } from './compile.js';
import { HighsSession } from './highsSession.js';
import type { LinearModel } from './linearModel.js';
import type { SolveResult } from './result.js';

/**
 * HiGHS (npm `highs`, WebAssembly), the default backend. Each call loads the
 * model into a fresh persistent HiGHS model from arrays, solves, and disposes
 * it; inside withModelReuse a model of a structure solved before reuses the
 * kept HiGHS model instead. For repeated solves of one structure under the
 * caller's control use openHighsSession.
 */
export const highsBackend: SolverBackend = {
  name: 'highs',
  async solve(model: LinearModel, options: SolveOptions = {}): Promise<SolveResult> {
    const pool = reuse.getStore();
    if (pool) return pool.solve(model, options);
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

/**
 * HiGHS models kept for reuse within one scope (withModelReuse): a model of a
 * structure solved before (same columns, rows, matrix pattern and integrality)
 * is not loaded again; only the costs, bounds and coefficients that differ are
 * changed in the kept HiGHS model, which then starts from its last basis.
 */
class ModelPool {
  private readonly sessions = new Map<string, HighsSession>();

  async solve(model: LinearModel, options: SolveOptions): Promise<SolveResult> {
    const compiled = compileModel(model);
    const key = structureKey(compiled);
    const kept = this.sessions.get(key);
    if (kept) {
      // Most recently used last, so the first is the one to let go.
      this.sessions.delete(key);
      this.sessions.set(key, kept);
      kept.reload(model, compiled, options);
      return kept.solve({ warmStart: true });
    }
    const session = await HighsSession.open(model, options);
    this.sessions.set(key, session);
    if (this.sessions.size > POOL_SIZE) {
      const [oldest, evicted] = this.sessions.entries().next().value as [string, HighsSession];
      this.sessions.delete(oldest);
      evicted.dispose();
    }
    return session.solve({ warmStart: false });
  }

  dispose(): void {
    for (const session of this.sessions.values()) session.dispose();
    this.sessions.clear();
  }
}

/** Structures kept at once: a plant solve uses a handful (passes, on/off checks, candidates). */
const POOL_SIZE = 16;

const reuse = new AsyncLocalStorage<ModelPool>();

function structureKey(compiled: CompiledModel): string {
  return [compiled.name, compiled.sense, compiled.columnNames.join(','), compiled.rowNames.join(','), compiled.starts.join(','), compiled.indices.join(','), compiled.integrality.join('')].join('|');
}

/**
 * Runs `work` with HiGHS models kept between its solves of the same structure
 * (a chain of similar periods of a year), and frees them when it ends. A warm
 * start can land on another of several equally good points, so a result can
 * depend on what was solved before in the scope: use it where that order is
 * fixed by the inputs (one block of periods), not across independent jobs.
 */
export async function withModelReuse<T>(work: () => Promise<T>): Promise<T> {
  // STEAMWRIGHT_MODEL_REUSE=0 solves each model afresh, for measuring (bench:year -- --compare-reuse).
  if (process.env.STEAMWRIGHT_MODEL_REUSE === '0') return work();
  const pool = new ModelPool();
  try {
    return await reuse.run(pool, work);
  } finally {
    pool.dispose();
  }
}
