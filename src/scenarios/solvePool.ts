// Solving a batch of plants: on worker threads (one per core, at most the
// number of jobs) when the compiled worker is present, else in process.
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { Plant } from '../model/index.js';
import type { JobOptions, JobOutcome } from './jobs.js';
import { solveOne } from './solveOne.js';

export interface PoolOptions extends JobOptions {
  /** most worker threads; default the machine's available parallelism; 1 solves in process */
  workers?: number;
  /** called after each plant is solved */
  onProgress?: (done: number, total: number) => void;
}

const WORKER_URL = new URL('./scenarioWorker.js', import.meta.url);

/** Whether solves can go to worker threads: only when running the compiled package (dist). */
export function workersAvailable(): boolean {
  return WORKER_URL.protocol === 'file:' && existsSync(fileURLToPath(WORKER_URL));
}

/** How many workers a batch of this size would use. */
export function workerCount(jobs: number, options: PoolOptions = {}): number {
  const most = Math.max(1, Math.floor(options.workers ?? availableParallelism()));
  return workersAvailable() ? Math.min(most, jobs) : 1;
}

/**
 * Solves every plant; outcomes come back in the order given. `warm[i]`, where
 * given, is another solve's decisions and point, tried for plant i.
 */
export async function solvePlants(plants: Plant[], options: PoolOptions = {}, warm: (Pick<JobOptions, 'commitment' | 'start'> | undefined)[] = []): Promise<JobOutcome[]> {
  const baseOptions: JobOptions = { objective: options.objective, backend: options.backend };
  const optionsOf = (index: number): JobOptions => (warm[index] ? { ...baseOptions, ...warm[index] } : baseOptions);
  const count = workerCount(plants.length, options);
  const outcomes: JobOutcome[] = new Array(plants.length);
  let done = 0;
  if (count <= 1) {
    for (const [index, plant] of plants.entries()) {
      outcomes[index] = await solveOne(plant, optionsOf(index));
      options.onProgress?.(++done, plants.length);
    }
    return outcomes;
  }
  let next = 0;
  const workers = Array.from({ length: count }, () => new Worker(WORKER_URL));
  try {
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const send = (): void => {
              if (next >= plants.length) {
                resolve();
                return;
              }
              const index = next++;
              worker.postMessage({ index, plant: plants[index], options: optionsOf(index) });
            };
            worker.on('message', (reply: { index: number; outcome: JobOutcome }) => {
              outcomes[reply.index] = reply.outcome;
              options.onProgress?.(++done, plants.length);
              send();
            });
            worker.once('error', reject);
            send();
          }),
      ),
    );
  } finally {
    await Promise.all(workers.map((worker) => worker.terminate()));
  }
  return outcomes;
}
