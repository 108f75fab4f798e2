// Worker entry: solves the plants it is sent, one at a time. HiGHS is loaded
// once per worker, on its first solve, and reused for the rest.
import { parentPort } from 'node:worker_threads';
import type { Plant } from '../model/index.js';
import type { JobOptions } from './jobs.js';
import { solveOne } from './solveOne.js';

interface Request {
  index: number;
  plant: Plant;
  options: JobOptions;
}

parentPort?.on('message', (request: Request) => {
  void solveOne(request.plant, request.options).then((outcome) => parentPort?.postMessage({ index: request.index, outcome }));
});
