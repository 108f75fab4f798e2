// A pool of solver workers kept for several batches: each worker loads
// HiGHS once, on its first solve, and keeps it for every later batch (the
// savings command solves the base, then the measures, then the roadmap).
// Where the compiled worker is absent (vitest on sources), solves run in
// process, as in solvePlants.
import { Worker } from 'node:worker_threads';
import type { Plant } from '../model/index.js';
import type { JobOptions, JobOutcome } from './jobs.js';
import { solveOne } from './solveOne.js';
import { workerCount, type PoolOptions } from './solvePool.js';

const WORKER_URL = new URL('./scenarioWorker.js', import.meta.url);

export class WorkerPool {
  private readonly workers: Worker[];
  private closed = false;

  /** `size` workers (none when they are not available or size is 1). */
  constructor(size: number) {
    this.workers = size > 1 ? Array.from({ length: size }, () => new Worker(WORKER_URL)) : [];
  }

  static forJobs(jobs: number, options: PoolOptions = {}): WorkerPool {
    return new WorkerPool(workerCount(jobs, options));
  }

  /** Solves every plant; outcomes in the order given; `warm[i]` as in solvePlants. */
  async solve(plants: Plant[], options: PoolOptions = {}, warm: (Pick<JobOptions, 'commitment' | 'start'> | undefined)[] = []): Promise<JobOutcome[]> {
    if (this.closed) throw new Error('the worker pool is closed. Make a new one.');
    const baseOptions: JobOptions = { objective: options.objective, backend: options.backend, ...(options.probeMarginalValues === false ? { probeMarginalValues: false } : {}) };
    const optionsOf = (index: number): JobOptions => (warm[index] ? { ...baseOptions, ...warm[index] } : baseOptions);
    const outcomes: JobOutcome[] = new Array(plants.length);
    let done = 0;
    if (this.workers.length === 0) {
      for (const [index, plant] of plants.entries()) {
        outcomes[index] = await solveOne(plant, optionsOf(index));
        options.onProgress?.(++done, plants.length);
      }
      return outcomes;
    }
    let next = 0;
    await Promise.all(
      this.workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const onMessage = (reply: { index: number; outcome: JobOutcome }): void => {
              outcomes[reply.index] = reply.outcome;
              options.onProgress?.(++done, plants.length);
              send();
            };
            const onError = (error: Error): void => {
              worker.off('message', onMessage);
              reject(error);
            };
            const send = (): void => {
              if (next >= plants.length) {
                worker.off('message', onMessage);
                worker.off('error', onError);
                resolve();
                return;
              }
              const index = next++;
              worker.postMessage({ index, plant: plants[index], options: optionsOf(index) });
            };
            worker.on('message', onMessage);
            worker.once('error', onError);
            send();
          }),
      ),
    );
    return outcomes;
  }

  async close(): Promise<void> {
    this.closed = true;
    await Promise.all(this.workers.map((worker) => worker.terminate()));
  }
}
