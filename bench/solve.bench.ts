// npm run bench:solve: wall time of `steamwright solve` on each demo case from
// process start (module load, wasm start, every pass), and time per pass in
// process. Medians over rounds; never part of the test suite.
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { loadCaseText } from '../src/model/index.js';
import { plantResult, solvePlant } from '../src/plant/index.js';
import { auditPlant, solvedPlantFromReports } from '../src/plant/verify/index.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const cli = fileURLToPath(new URL('../src/cli/main.js', import.meta.url));
const rounds = Number(process.env.BENCH_ROUNDS ?? 7);
const json = process.argv.includes('--json');

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

// Start-up: a new process each time, interleaved so load hits all alike, and
// each compared with `node -e 0` measured in the same rounds (a ratio).
function wallMs(args: string[], env: NodeJS.ProcessEnv = process.env): number {
  const start = process.hrtime.bigint();
  const run = spawnSync(process.execPath, args, { encoding: 'utf8', env });
  if (run.status !== 0) throw new Error(`${args.join(' ')} failed: ${run.stderr}`);
  return Number(process.hrtime.bigint() - start) / 1e6;
}
{
  const mill = `${root}/cases/kestrel-bay-board-mill.yaml`;
  const runs: Record<string, string[]> = { 'node -e 0': ['-e', '0'], '--version': [cli, '--version'], '--help': [cli, '--help'], 'solve --help': [cli, 'solve', '--help'], 'solve mill --json': [cli, 'solve', mill, '--json'], 'same, V8 wasm tiering': [cli, 'solve', mill, '--json'] };
  // The last row keeps V8's default WebAssembly tiering (see src/cli/main.ts), to show what the baseline-only setting saves.
  const envOf = (name: string): NodeJS.ProcessEnv => (name === 'same, V8 wasm tiering' ? { ...process.env, STEAMWRIGHT_WASM_TIERING: '1' } : process.env);
  const times: Record<string, number[]> = Object.fromEntries(Object.keys(runs).map((name) => [name, []]));
  for (let round = 0; round < rounds; round += 1) for (const [name, args] of Object.entries(runs)) times[name].push(wallMs(args, envOf(name)));
  const base = median(times['node -e 0']);
  const startup = Object.fromEntries(Object.entries(times).map(([name, values]) => [name, { ms_median: median(values), ratio_to_node: median(values) / base }]));
  if (json) console.log(JSON.stringify({ startup, rounds }));
  else {
    console.log('start-up, new process each time (median ms, and ratio to node -e 0 in the same rounds)');
    for (const [name, figures] of Object.entries(startup)) console.log(`  ${name.padEnd(22)} ${figures.ms_median.toFixed(0).padStart(6)} ms  x${figures.ratio_to_node.toFixed(1)}`);
  }
}

const cases = readdirSync(`${root}/cases`).filter((name) => name.endsWith('.yaml'));
for (const name of cases) {
  const path = `${root}/cases/${name}`;
  const wall: number[] = [];
  for (let round = 0; round < rounds; round += 1) {
    const start = process.hrtime.bigint();
    const run = spawnSync(process.execPath, [cli, 'solve', path, '--json'], { encoding: 'utf8' });
    wall.push(Number(process.hrtime.bigint() - start) / 1e6);
    if (run.status !== 0) throw new Error(`solve ${name} failed: ${run.stderr}`);
  }
  const loaded = loadCaseText(readFileSync(path, 'utf8'), name);
  if (!loaded.ok) throw new Error(`${name} does not load`);
  await solvePlant(loaded.plant); // warm: wasm compiled, code optimised
  const inProcess: number[] = [];
  const perPass: number[] = [];
  const firstOnly: number[] = [];
  const withoutProbes: number[] = [];
  let passes = 0;
  let candidates = 0;
  for (let round = 0; round < rounds; round += 1) {
    // The same solve three ways, interleaved so that load on the machine hits all alike:
    // in full; without the marginal-value probes; and without the on/off candidates beyond
    // the MIP at the converged points (no flips or swaps), probes off too.
    let start = process.hrtime.bigint();
    const outcome = await solvePlant(loaded.plant);
    const ms = Number(process.hrtime.bigint() - start) / 1e6;
    passes = outcome.passes.length;
    candidates = outcome.ok ? outcome.commitments.length : 0;
    inProcess.push(ms);
    perPass.push(ms / Math.max(1, passes));
    start = process.hrtime.bigint();
    await solvePlant(loaded.plant, { probeMarginalValues: false });
    withoutProbes.push(Number(process.hrtime.bigint() - start) / 1e6);
    start = process.hrtime.bigint();
    await solvePlant(loaded.plant, { probeMarginalValues: false, maxFlips: 0 });
    firstOnly.push(Number(process.hrtime.bigint() - start) / 1e6);
  }
  // The independent audit alone, on the last solve's flows (it runs once per solve).
  const last = await solvePlant(loaded.plant);
  if (!last.ok) throw new Error(`${name}: ${last.message}`);
  const result = plantResult(last);
  const solved = solvedPlantFromReports(result.headers, result.units);
  const auditMs: number[] = [];
  for (let round = 0; round < rounds; round += 1) {
    const start = process.hrtime.bigint();
    const repeats = 20;
    for (let repeat = 0; repeat < repeats; repeat += 1) auditPlant(loaded.plant, solved);
    auditMs.push(Number(process.hrtime.bigint() - start) / 1e6 / repeats);
  }
  const figures = {
    case: name,
    audit_ms_median: median(auditMs),
    end_to_end_ms_median: median(wall),
    warm_solve_ms_median: median(inProcess),
    passes,
    ms_per_pass_median: median(perPass),
    commitments_tried: candidates,
    without_probes_ms_median: median(withoutProbes),
    without_flips_or_probes_ms_median: median(firstOnly),
    rounds,
  };
  if (json) console.log(JSON.stringify(figures));
  else {
    console.log(`${name}`);
    console.log(`  end to end (new process, solve --json): ${figures.end_to_end_ms_median.toFixed(0)} ms median of ${rounds}`);
    console.log(`  warm in-process solve: ${figures.warm_solve_ms_median.toFixed(1)} ms, ${passes} passes of the kept commitment, ${figures.ms_per_pass_median.toFixed(1)} ms per pass`);
    console.log(`  on/off candidates tried: ${candidates}; solve without the probes ${figures.without_probes_ms_median.toFixed(1)} ms, without flips, swaps or probes ${figures.without_flips_or_probes_ms_median.toFixed(1)} ms`);
    console.log(`  so the candidates cost ${(figures.without_probes_ms_median - figures.without_flips_or_probes_ms_median).toFixed(1)} ms and the probes ${(figures.warm_solve_ms_median - figures.without_probes_ms_median).toFixed(1)} ms (ratio full / first commitment only ${(figures.warm_solve_ms_median / figures.without_flips_or_probes_ms_median).toFixed(2)})`);
    console.log(`  independent audit (part of every solve): ${figures.audit_ms_median.toFixed(2)} ms, ${((100 * figures.audit_ms_median) / figures.warm_solve_ms_median).toFixed(1)} % of the warm solve`);
  }
}
