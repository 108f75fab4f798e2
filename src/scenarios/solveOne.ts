// One plant solved to plain data: the same function runs in a worker and in
// process, so results are identical either way.
import { getBackend } from '../lp/index.js';
import type { Plant } from '../model/index.js';
import { plantResult, solvePlant } from '../plant/index.js';
import type { JobOptions, JobOutcome } from './jobs.js';

export async function solveOne(plant: Plant, options: JobOptions): Promise<JobOutcome> {
  try {
    const commitment = options.commitment ? new Map(Object.entries(options.commitment)) : undefined;
    const outcome = await solvePlant(plant, { objective: options.objective, backend: getBackend(options.backend ?? 'highs'), commitment, ...(options.start ? { start: options.start } : {}), ...(options.probeMarginalValues === false ? { probeMarginalValues: false } : {}) });
    if (!outcome.ok) return { ok: false, reason: outcome.reason, message: outcome.message };
    return { ok: true, result: plantResult(outcome), start: outcome.start };
  } catch (error) {
    // A property call outside IF97 or a solver fault: one failed scenario, not a crashed batch.
    return { ok: false, reason: 'error', message: error instanceof Error ? error.message : String(error) };
  }
}
