// Worker entry for a year: takes the plant and columns once, then solves the
// blocks it is sent, one at a time, and posts each block's records back.
import { parentPort } from 'node:worker_threads';
import { solveBlock, type BlockSettings, type BlockTask } from './solveBlock.js';

let settings: BlockSettings | null = null;

parentPort?.on('message', (message: { settings: BlockSettings } | { task: BlockTask }) => {
  if ('settings' in message) {
    settings = message.settings;
    return;
  }
  const task = message.task;
  void solveBlock(settings!, task, () => parentPort?.postMessage({ period: true })).then(
    (records) => parentPort?.postMessage({ block: task.block, records }),
    (error: unknown) => parentPort?.postMessage({ block: task.block, error: error instanceof Error ? error.message : String(error) }),
  );
});
