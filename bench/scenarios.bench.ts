// Wall time of comparing the demo mill's scenarios in process versus on
// worker threads, and of a 100-step sweep of the power import price.
import { readFileSync } from 'node:fs';
import { loadCaseText } from '../src/model/index.js';
import { compareScenarios, runSweep } from '../src/scenarios/index.js';

const path = new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url);
const text = readFileSync(path, 'utf8').replace(/steps: 9\n/, 'steps: 100\n');
const loaded = loadCaseText(text, 'kestrel-bay-board-mill.yaml');
if (!loaded.ok) throw new Error('demo case did not load');

async function time(label: string, run: () => Promise<unknown>): Promise<number> {
  const start = performance.now();
  await run();
  const ms = performance.now() - start;
  console.log(`${label}: ${(ms / 1000).toFixed(2)} s`);
  return ms;
}

const serial = await time('compare, 3 scenarios, in process', () => compareScenarios(loaded.variants, [], { workers: 1 }));
const parallel = await time('compare, 3 scenarios, worker threads', () => compareScenarios(loaded.variants, []));
console.log(`parallel / serial: ${(parallel / serial).toFixed(2)}`);
await time('sweep, 100 steps, worker threads', () => runSweep(loaded.variants, 'import_price'));
