// npm run bench:reconcile: reconciling a generated plant of 1,000 streams and
// 300 nodes (75 % of the streams metered), medians over rounds: one weighted
// least-squares solve with its classification, and the full run with the
// tests and serial elimination when one meter reads 8 standard deviations high.
// Never part of the test suite.
import { Matrix, solve } from 'ml-matrix';
import { reconcileLinear, testReconciliation, type BalanceRow, type LinearProblem, type Reading } from '../src/reconcile/index.js';
import { seededRandom } from '../src/seededRandom.js';

const json = process.argv.includes('--json');
const STREAMS = 1000;
const NODES = 300;
const ROUNDS = 5;

function generatedPlant(): { problem: LinearProblem; biased: number } {
  const random = seededRandom(15);
  const normal = (): number => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  // Node 0 is the environment; a spanning tree first, so the plant is connected.
  const edges: [number, number][] = [];
  for (let node = 1; node <= NODES; node++) edges.push([Math.floor(random() * node), node]);
  while (edges.length < STREAMS) {
    const a = Math.floor(random() * (NODES + 1));
    const b = Math.floor(random() * (NODES + 1));
    if (a !== b) edges.push([a, b]);
  }
  const terms = Array.from({ length: NODES }, () => new Map<number, number>());
  edges.forEach(([from, to], index) => {
    if (from > 0) terms[from - 1].set(index, -1);
    if (to > 0) terms[to - 1].set(index, 1);
  });
  const balances: BalanceRow[] = terms.map((row, i) => ({ name: `n${i + 1}`, terms: row }));
  // True flows that balance: random flows projected onto A x = 0.
  const A = Matrix.zeros(NODES, STREAMS);
  balances.forEach((row, i) => row.terms.forEach((coefficient, j) => A.set(i, j, coefficient)));
  const x0 = Matrix.columnVector(Array.from({ length: STREAMS }, () => 20 + 80 * random()));
  const x = x0.clone().sub(A.transpose().mmul(solve(A.mmul(A.transpose()), A.mmul(x0))));
  const readings: Reading[] = [];
  for (let j = 0; j < STREAMS; j++) {
    if (random() >= 0.75) continue;
    const sigma = 0.01 * Math.abs(x.get(j, 0)) + 0.1;
    readings.push({ variable: j, value: x.get(j, 0) + sigma * normal(), sigma });
  }
  // One meter reads 8 standard deviations high: the one the balances check best
  // (largest share of its variance removed), so that it can be found.
  const first = reconcileLinear({ variableCount: STREAMS, balances, readings });
  let biased = 0;
  first.readings.forEach((reading, i) => {
    if (reading.adjustmentSigma / readings[i].sigma > first.readings[biased].adjustmentSigma / readings[biased].sigma) biased = i;
  });
  readings[biased] = { ...readings[biased], value: readings[biased].value + 8 * readings[biased].sigma };
  return { problem: { variableCount: STREAMS, balances, readings }, biased };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function time<T>(action: () => T): { ms: number; value: T } {
  const start = process.hrtime.bigint();
  const value = action();
  return { ms: Number(process.hrtime.bigint() - start) / 1e6, value };
}

const { problem, biased } = generatedPlant();
const solveTimes: number[] = [];
const fullTimes: number[] = [];
let summary = '';
for (let round = 0; round < ROUNDS; round++) {
  const single = time(() => reconcileLinear(problem));
  solveTimes.push(single.ms);
  const full = time(() => testReconciliation(problem, { level: 0.05 }));
  fullTimes.push(full.ms);
  const result = full.value;
  summary = `${problem.readings.length} readings, ${single.value.readings.filter((reading) => reading.redundant).length} redundant, ${single.value.observable.filter((ok) => !ok).length} streams not observable, ${result.global.dof} degrees of freedom; suspects ${result.suspects.length} (first ${result.suspects[0]?.reading === biased ? 'the biased meter' : 'another meter'})`;
}
const solveMedian = median(solveTimes);
const fullMedian = median(fullTimes);
if (json) {
  process.stdout.write(`${JSON.stringify({ streams: STREAMS, nodes: NODES, rounds: ROUNDS, solve_ms: solveMedian, tested_ms: fullMedian, ratio: fullMedian / solveMedian })}\n`);
} else {
  process.stdout.write(`reconcile, generated plant: ${STREAMS} streams, ${NODES} nodes; ${summary}\n`);
  process.stdout.write(`  one solve with classification: median ${solveMedian.toFixed(0)} ms over ${ROUNDS} rounds\n`);
  process.stdout.write(`  with tests and serial elimination: median ${fullMedian.toFixed(0)} ms (${(fullMedian / solveMedian).toFixed(1)} x one solve)\n`);
}
