// npm run bench:batch: `steamwright state --batch -` streaming N JSON lines,
// its throughput and its peak memory, for a small and a large N in one run:
// streaming means the peak barely moves with N. Never part of the test suite.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const cli = fileURLToPath(new URL('../src/cli/main.js', import.meta.url));
const json = process.argv.includes('--json');

const LINES = [
  '{"p":"3 MPa","T":"300 K"}',
  '{"p":"1 MPa","h":"2800 kJ/kg"}',
  '{"p":"0.5 MPa","s":"7 kJ/(kg K)"}',
  '{"p":"1 MPa","x":0.5}',
  '{"p":"42 barg","T":"400 degC"}',
];

/** Peak resident memory of a process, kB, from Linux's /proc (VmHWM). */
function peakKB(pid: number): number {
  try {
    const match = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return match ? Number(match[1]) : NaN;
  } catch {
    return NaN;
  }
}

async function run(count: number): Promise<{ lines: number; seconds: number; peakMB: number }> {
  const child = spawn(process.execPath, [cli, 'state', '--batch', '-'], { stdio: ['pipe', 'pipe', 'inherit'] });
  let received = 0;
  let peak = 0;
  child.stdout.on('data', (chunk: Buffer) => {
    for (const byte of chunk) if (byte === 10) received += 1;
  });
  const poll = setInterval(() => (peak = Math.max(peak, peakKB(child.pid!) || 0)), 20);
  const start = process.hrtime.bigint();
  const block = `${LINES.join('\n')}\n`;
  for (let sent = 0; sent < count; sent += LINES.length) {
    if (!child.stdin.write(block)) await new Promise((resolve) => child.stdin.once('drain', resolve));
  }
  child.stdin.end();
  const code: number = await new Promise((resolve) => child.on('close', (status) => resolve(status ?? -1)));
  clearInterval(poll);
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  if (code !== 0) throw new Error(`state --batch exited ${code}`);
  return { lines: received, seconds, peakMB: peak / 1024 };
}

const small = await run(1_000);
const large = await run(Number(process.env.BATCH_LINES ?? 1_000_000));
const figures = {
  small_lines: small.lines,
  small_peak_MB: small.peakMB,
  large_lines: large.lines,
  large_peak_MB: large.peakMB,
  peak_ratio: large.peakMB / small.peakMB,
  large_lines_per_s: large.lines / large.seconds,
};
if (json) console.log(JSON.stringify(figures));
else {
  console.log(`state --batch: ${small.lines} lines peak ${small.peakMB.toFixed(1)} MB; ${large.lines} lines peak ${large.peakMB.toFixed(1)} MB (ratio ${figures.peak_ratio.toFixed(2)})`);
  console.log(`  throughput ${(figures.large_lines_per_s / 1000).toFixed(1)} k lines/s (parse, evaluate, JSON out)`);
}
