import { createRequire } from 'node:module';
import { Worker } from 'node:worker_threads';
import type { JslpModel } from './jslpModel.js';

/** What javascript-lp-solver's Solve returns: verdict flags and values by key. */
export type JslpAnswer = Record<string, number | boolean | undefined>;

export type WatchdogOutcome =
  | { readonly kind: 'answer'; readonly answer: JslpAnswer; readonly elapsedMs: number }
  | { readonly kind: 'failed'; readonly message: string; readonly elapsedMs: number }
  | { readonly kind: 'timeout'; readonly elapsedMs: number };

/*
 * The worker's code, passed as a string (eval) so that it runs the same from
 * the TypeScript sources under vitest and from dist after tsc: there is no
 * separate file to copy. It loads the package from an absolute path resolved
 * here, beside this module, so resolution does not depend on the cwd.
 */
const workerSource = `
const { parentPort, workerData } = require('node:worker_threads');
const loaded = require(workerData.solverPath);
const solver = typeof loaded.Solve === 'function' ? loaded : loaded.default;
parentPort.on('message', (job) => {
  try {
    parentPort.postMessage({ id: job.id, answer: solver.Solve(job.model) });
  } catch (error) {
    parentPort.postMessage({ id: job.id, failure: String(error && error.message ? error.message : error) });
  }
});
`;

let solverPath: string | null = null;

function resolveSolverPath(): string {
  solverPath ??= createRequire(import.meta.url).resolve('javascript-lp-solver');
  return solverPath;
}

/**
 * Runs javascript-lp-solver in a worker thread under a time limit. On some
 * feasible LPs (about 1 % of random ones, measured on 1.0.3) its phase-1
 * fallback loops without end; then the worker is terminated and the solve
 * reported as not finished, and a fresh worker serves the next job. Jobs run
 * one at a time. An idle worker does not keep the process alive.
 */
export class JslpWatchdog {
  private worker: Worker | null = null;
  private tail: Promise<unknown> = Promise.resolve();
  private nextId = 1;

  run(model: JslpModel, timeLimitMs: number): Promise<WatchdogOutcome> {
    const job = this.tail.then(() => this.dispatch(model, timeLimitMs));
    this.tail = job.catch(() => undefined);
    return job;
  }

  /** Terminates the worker, if any. Later jobs start a new one. */
  async close(): Promise<void> {
    const worker = this.worker;
    this.worker = null;
    if (worker) await worker.terminate();
  }

  private spawn(): Worker {
    const worker = new Worker(workerSource, { eval: true, workerData: { solverPath: resolveSolverPath() } });
    worker.unref();
    return worker;
  }

  private dispatch(model: JslpModel, timeLimitMs: number): Promise<WatchdogOutcome> {
    const worker = (this.worker ??= this.spawn());
    const id = this.nextId++;
    const started = performance.now();
    return new Promise<WatchdogOutcome>((resolve) => {
      const finish = (outcome: WatchdogOutcome): void => {
        clearTimeout(timer);
        worker.off('message', onMessage);
        worker.off('error', onError);
        worker.off('exit', onExit);
        worker.unref();
        resolve(outcome);
      };
      const discard = (): void => {
        if (this.worker === worker) this.worker = null;
        void worker.terminate();
      };
      const onMessage = (reply: { id: number; answer?: JslpAnswer; failure?: string }): void => {
        if (reply.id !== id) return;
        const elapsedMs = performance.now() - started;
        if (reply.answer) finish({ kind: 'answer', answer: reply.answer, elapsedMs });
        else finish({ kind: 'failed', message: reply.failure ?? 'no answer', elapsedMs });
      };
      const onError = (error: Error): void => {
        discard();
        finish({ kind: 'failed', message: `worker error: ${error.message}`, elapsedMs: performance.now() - started });
      };
      const onExit = (code: number): void => {
        if (this.worker === worker) this.worker = null;
        finish({ kind: 'failed', message: `worker exited with code ${code}`, elapsedMs: performance.now() - started });
      };
      const timer = setTimeout(() => {
        discard();
        finish({ kind: 'timeout', elapsedMs: performance.now() - started });
      }, timeLimitMs);
      worker.on('message', onMessage);
      worker.on('error', onError);
      worker.on('exit', onExit);
      worker.ref();
      worker.postMessage({ id, model });
    });
  }
}
