// The year's blocks solved on worker threads (in process when the compiled
// worker is absent, as under vitest), their records handed on strictly in
// period order as soon as they are ready, so the caller can fold them into
// totals without keeping them.
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { PeriodRecord } from './periodRecord.js';
import type { WindowNote } from './solveRolling.js';
import { solveBlock, type BlockSettings, type BlockTask } from './solveBlock.js';

export interface YearRunOptions {
  /** most worker threads; default the machine's parallelism; 1 solves in process */
  workers?: number;
  /** after each period is solved */
  onProgress?: (done: number, total: number) => void;
  /** with rolling windows: after each window's program is solved and its periods kept */
  onWindow?: (note: WindowNote) => void;
}

const WORKER_URL = new URL('./yearWorker.js', import.meta.url);

function workersAvailable(): boolean {
  return WORKER_URL.protocol === 'file:' && existsSync(fileURLToPath(WORKER_URL));
}

/** Solves the tasks; `onRecords` receives each block's records in block order. */
export async function solveBlocks(settings: BlockSettings, tasks: BlockTask[], onRecords: (records: PeriodRecord[]) => void, options: YearRunOptions = {}): Promise<void> {
  const total = tasks.reduce((sum, task) => sum + task.labels.length, 0);
  let done = 0;
  const tick = (): void => options.onProgress?.(++done, total);
  const most = Math.max(1, Math.floor(options.workers ?? availableParallelism()));
  const count = workersAvailable() ? Math.min(most, tasks.length) : 1;
  if (count <= 1) {
    for (const task of tasks) onRecords(await solveBlock(settings, task, tick));
    return;
  }
  // Blocks finish out of order; each waits here until those before it are handed on.
  const waiting = new Map<number, PeriodRecord[]>();
  let nextOut = 0;
  const order = tasks.map((task) => task.block);
  const release = (): void => {
    while (nextOut < order.length && waiting.has(order[nextOut])) {
      const records = waiting.get(order[nextOut])!;
      waiting.delete(order[nextOut]);
      nextOut += 1;
      onRecords(records);
    }
  };
  let next = 0;
  const workers = Array.from({ length: count }, () => new Worker(WORKER_URL));
  try {
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            worker.postMessage({ settings });
            const send = (): void => {
              if (next >= tasks.length) {
                resolve();
                return;
              }
              worker.postMessage({ task: tasks[next++] });
            };
            worker.on('message', (reply: { period: true } | { block: number; records: PeriodRecord[] } | { block: number; error: string }) => {
              if ('period' in reply) {
                tick();
                return;
              }
              if ('error' in reply) {
                reject(new Error(`block ${reply.block}: ${reply.error}`));
                return;
              }
              waiting.set(reply.block, reply.records);
              release();
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
}
