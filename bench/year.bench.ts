// npm run bench:year: `steamwright year` on the Kestrel Bay mill with a
// generated hourly profile (seasonal and daily shape, seeded noise, a boiler
// overhaul, a back-pressure turbine inspection and a kiln stop; scripts/millProfile.ts) of
// 720, 2190 and 8760 periods. Each size runs the built command line in its own
// process: wall time, peak memory (VmHWM, every worker thread included), and
// how the periods were solved. One round per size (the large ones take
// minutes); sizes as ratios within one run. Never part of the test suite.
//   npm run bench:year                 all three sizes
//   npm run bench:year -- 720 2190     chosen sizes
//   npm run bench:year -- --workers 2  worker threads (default: one per core)
//   npm run bench:year -- 720 --switching  boiler 1 with a start cost and minimum times (invented): rolling windows
//   npm run bench:year -- 720 --compare-reuse  also each size with every model loaded afresh (STEAMWRIGHT_MODEL_REUSE=0), as a ratio
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { millProfileCsv } from '../scripts/millProfile.js';

const cli = fileURLToPath(new URL('../src/cli/main.js', import.meta.url));
const caseFile = fileURLToPath(new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url));
const args = process.argv.slice(2);
const workersAt = args.indexOf('--workers');
const workers = workersAt >= 0 ? Number(args[workersAt + 1]) : availableParallelism();
const sizes = args.filter((arg, at) => /^\d+$/.test(arg) && !(workersAt >= 0 && at === workersAt + 1)).map(Number);
const switching = args.includes('--switching');
const compareReuse = args.includes('--compare-reuse');
const BOILER_1 = '    blowdown_to: blowdown_flash     # flashed, the vapour recovered to the LP header\n    can_switch_off: true\n';

function peakKB(pid: number): number {
  try {
    const match = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return match ? Number(match[1]) : NaN;
  } catch {
    return NaN;
  }
}

interface Run {
  periods: number;
  seconds: number;
  peakMB: number;
  how: { neighbour: number; full: number; same_as_earlier: number; one_pass: number };
  failed: number;
  mode: string;
}

async function run(periods: number, reuse = true): Promise<Run> {
  const folder = mkdtempSync(path.join(tmpdir(), 'steamwright-year-bench-'));
  try {
    mkdirSync(path.join(folder, 'profiles'));
    let text = readFileSync(caseFile, 'utf8').replace(/hours: 8760\s*$/, `hours: ${periods}\n`);
    if (switching) {
      if (!text.includes(BOILER_1)) throw new Error('the mill case no longer has boiler_1 as the benchmark expects');
      text = text.replace(BOILER_1, `${BOILER_1}    switching: { start_cost: 1500 EUR, min_hours_on: 6, min_hours_off: 4 }\n`);
    }
    writeFileSync(path.join(folder, 'mill.yaml'), text);
    writeFileSync(path.join(folder, 'profiles', 'kestrel-bay-year.csv'), millProfileCsv({ hours: periods }));
    const child = spawn(process.execPath, [cli, 'year', path.join(folder, 'mill.yaml'), '--json', '--workers', String(workers)], { stdio: ['ignore', 'pipe', 'inherit'], env: { ...process.env, STEAMWRIGHT_MODEL_REUSE: reuse ? '1' : '0' } });
    let output = '';
    let peak = 0;
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => (output += chunk));
    const poll = setInterval(() => (peak = Math.max(peak, peakKB(child.pid!) || 0)), 50);
    const start = process.hrtime.bigint();
    const code: number = await new Promise((resolve) => child.on('close', (status) => resolve(status ?? -1)));
    clearInterval(poll);
    const seconds = Number(process.hrtime.bigint() - start) / 1e9;
    if (code !== 0 && code !== 1) throw new Error(`year exited ${code}`);
    const result = JSON.parse(output) as { how: Run['how']; failed: unknown[]; mode: string };
    return { periods, seconds, peakMB: peak / 1024, how: result.how, failed: result.failed.length, mode: result.mode };
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}

const runs: Run[] = [];
for (const periods of sizes.length > 0 ? sizes : [720, 2190, 8760]) {
  const result = await run(periods);
  runs.push(result);
  const solved = result.how.neighbour + result.how.full;
  console.log(
    `${String(periods).padStart(5)} periods  ${result.seconds.toFixed(1).padStart(7)} s  ${((result.seconds * 1000) / periods).toFixed(1).padStart(6)} ms/period  peak ${result.peakMB.toFixed(0).padStart(4)} MB  ` +
      `from neighbour ${((100 * result.how.neighbour) / Math.max(1, solved)).toFixed(1)} %, full search ${result.how.full}, identical ${result.how.same_as_earlier}, one pass ${result.how.one_pass} (${((100 * result.how.one_pass) / Math.max(1, solved)).toFixed(1)} %), failed ${result.failed}, ${result.mode}`,
  );
  if (compareReuse) {
    const fresh = await run(periods, false);
    console.log(`${String(periods).padStart(5)} periods  ${fresh.seconds.toFixed(1).padStart(7)} s  every model loaded afresh: kept models take x${(result.seconds / fresh.seconds).toFixed(2)} of the time, peak ${fresh.peakMB.toFixed(0)} MB`);
  }
}
if (runs.length > 1) {
  const first = runs[0];
  for (const other of runs.slice(1)) console.log(`${other.periods} / ${first.periods} periods: time x${(other.seconds / first.seconds).toFixed(2)}, peak memory x${(other.peakMB / first.peakMB).toFixed(2)} (workers: ${workers})`);
}
