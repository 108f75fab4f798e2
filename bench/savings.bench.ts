// Wall time of `savings` on the demo mill with every scenario: the base
// solves, every measure on every scenario, and the roadmap's re-solves. In
// process versus one pool of worker threads kept for all three batches (each
// worker loads HiGHS once). Medians over rounds; the machine is shared.
import { readFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { loadCaseText } from '../src/model/index.js';
import { findSavings } from '../src/savings/index.js';

const json = process.argv.includes('--json');
const rounds = Number(process.env.BENCH_ROUNDS ?? 3);
const path = new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url);
const text = readFileSync(path, 'utf8');
const loaded = loadCaseText(text, 'kestrel-bay-board-mill.yaml');
if (!loaded.ok) throw new Error('demo case did not load');
const { plant, variants } = loaded;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

async function measure(workers: number): Promise<{ median_s: number; median_cpu_s: number; measures: number; solves: number }> {
  const times: number[] = [];
  // Processor time of this thread: in process it is the whole run's, and it
  // moves far less than wall time when other work shares the cores.
  const cpu: number[] = [];
  let measures = 0;
  let solves = 0;
  for (let round = 0; round < rounds; round++) {
    const start = performance.now();
    const cpuStart = process.cpuUsage();
    const result = await findSavings(text, plant, variants, { workers });
    times.push((performance.now() - start) / 1000);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1e6);
    measures = result.measures.length;
    // Roadmap step 1 reuses the first measure's solves.
    solves = variants.scenarios.length * (1 + result.measures.length + Math.max(0, result.roadmap.length - 1));
  }
  return { median_s: median(times), median_cpu_s: median(cpu), measures, solves };
}

const cores = availableParallelism();
const serial = await measure(1);
const parallel = await measure(cores);
const rows = [
  { what: 'savings on the mill, in process', workers: 1, ...serial },
  { what: `savings on the mill, ${cores} worker threads`, workers: cores, ...parallel },
];
if (json) for (const row of rows) console.log(JSON.stringify(row));
else {
  console.log(`${variants.scenarios.length} scenarios, ${serial.measures} measures, ${serial.solves} plant solves per run; median of ${rounds} rounds`);
  for (const row of rows) console.log(`${row.what}: ${row.median_s.toFixed(2)} s${row.workers === 1 ? ` (processor time ${row.median_cpu_s.toFixed(2)} s)` : ''}`);
  console.log(`workers / in process: ${(parallel.median_s / serial.median_s).toFixed(2)}`);
}
