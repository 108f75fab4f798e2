// npm run bench:lp — solves per second of a network-like LP (about 150
// columns, 50 rows) re-solved 2,000 times with changed costs: HiGHS
// persistent warm, persistent cold, a fresh model from arrays per solve, the
// one-shot LP-text call, and javascript-lp-solver. Prints medians and ratios
// from this one run, the module load time, and memory at start and end.
import {
  LinearModel,
  closeJslpWorker,
  expr,
  getBackend,
  highsLoadTimeMs,
  loadHighs,
  openHighsSession,
  toLpFormat,
  type Variable,
} from '../src/lp/index.js';
import { seededRandom } from '../src/seededRandom.js';

const solves = Number(process.env.BENCH_LP_SOLVES ?? 2000);
const jslpSolves = Math.min(solves, Number(process.env.BENCH_LP_JSLP_SOLVES ?? 300));

/** 50 nodes on a ring with chords: 150 arcs with capacities, supplies at 5 nodes, demands elsewhere. */
function networkModel(): { model: LinearModel; arcs: Variable[]; baseCosts: number[] } {
  const random = seededRandom(7);
  const nodeCount = 50;
  const model = new LinearModel('network');
  const arcs: Variable[] = [];
  const baseCosts: number[] = [];
  const balance = Array.from({ length: nodeCount }, () => expr());
  const connect = (from: number, to: number, index: number): void => {
    const arc = model.addVariable(`arc${index}.${from}.${to}`, { upper: 40 + Math.round(60 * random()) });
    balance[from].add(arc, -1);
    balance[to].add(arc, 1);
    arcs.push(arc);
    baseCosts.push(1 + Math.round(20 * random()));
  };
  for (let node = 0; node < nodeCount; node++) {
    connect(node, (node + 1) % nodeCount, arcs.length);
    connect((node + 1) % nodeCount, node, arcs.length);
    connect(node, (node + 7) % nodeCount, arcs.length);
  }
  const supply = [0, 10, 20, 30, 40];
  for (let node = 0; node < nodeCount; node++) {
    const demand = supply.includes(node) ? -45 : 5;
    model.addRow(`node${node}.balance`, balance[node], '=', demand);
  }
  const objective = expr();
  arcs.forEach((arc, index) => objective.add(arc, baseCosts[index]));
  model.setObjective('minimize', objective);
  return { model, arcs, baseCosts };
}

function median(samples: number[]): number {
  const sorted = [...samples].sort((first, second) => first - second);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

function megabytes(bytes: number): string {
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

async function main(): Promise<void> {
  const startMemory = process.memoryUsage();
  const highs = await loadHighs();
  const startHeap = highs.memoryBytes;
  const { model, arcs, baseCosts } = networkModel();
  console.log(`network LP: ${model.variables.length} columns, ${model.rows.length} rows; ${solves} re-solves with changed costs`);
  console.log(`HiGHS module load: ${highsLoadTimeMs()!.toFixed(1)} ms`);

  const random = seededRandom(11);
  const costSets = Array.from({ length: solves }, () => baseCosts.map((cost) => cost * (0.8 + 0.4 * random())));
  const objectives: Record<string, number[]> = {};
  const times: Record<string, number[]> = {};
  const record = (label: string, elapsed: number, objective: number | null): void => {
    (times[label] ??= []).push(elapsed);
    (objectives[label] ??= []).push(objective ?? Number.NaN);
  };

  const session = await openHighsSession(model);
  try {
    for (const warm of [true, false]) {
      const label = warm ? 'highs persistent, warm' : 'highs persistent, cold';
      for (const costs of costSets) {
        const started = performance.now();
        session.setCosts(arcs.map((arc, index) => [arc, costs[index]] as const));
        const result = session.solve({ warmStart: warm });
        record(label, performance.now() - started, result.objective);
      }
    }
  } finally {
    session.dispose();
  }

  const fresh = getBackend('highs');
  for (const costs of costSets) {
    const objective = expr();
    arcs.forEach((arc, index) => objective.add(arc, costs[index]));
    model.setObjective('minimize', objective);
    const started = performance.now();
    const result = await fresh.solve(model);
    record('highs fresh model from arrays', performance.now() - started, result.objective);
  }

  for (const costs of costSets) {
    const objective = expr();
    arcs.forEach((arc, index) => objective.add(arc, costs[index]));
    model.setObjective('minimize', objective);
    const started = performance.now();
    const text = toLpFormat(model).text;
    const result = highs.solve(text, { output_flag: false });
    record('highs one-shot LP text', performance.now() - started, result.ObjectiveValue);
  }

  const jslp = getBackend('jslp');
  let jslpUnfinished = 0;
  for (const costs of costSets.slice(0, jslpSolves)) {
    const objective = expr();
    arcs.forEach((arc, index) => objective.add(arc, costs[index]));
    model.setObjective('minimize', objective);
    const started = performance.now();
    const result = await jslp.solve(model, { timeLimitSeconds: 5 });
    if (result.status === 'did_not_finish') jslpUnfinished++;
    record('javascript-lp-solver (worker)', performance.now() - started, result.objective);
  }
  await closeJslpWorker();

  const reference = times['highs persistent, warm'];
  const referenceMedian = median(reference);
  console.log('\nmethod                              solves  median ms  solves/s  x warm');
  for (const [label, samples] of Object.entries(times)) {
    const middle = median(samples);
    console.log(
      `${label.padEnd(36)}${String(samples.length).padStart(6)}${middle.toFixed(3).padStart(11)}${(1000 / middle).toFixed(0).padStart(10)}${(middle / referenceMedian).toFixed(1).padStart(8)}`,
    );
  }
  // The methods solve the same cost sets, so their optima must agree.
  let worstGap = 0;
  for (const [label, values] of Object.entries(objectives)) {
    values.forEach((value, index) => {
      const gap = Math.abs(value - objectives['highs persistent, warm'][index]) / Math.max(1, Math.abs(value));
      if (label !== 'highs persistent, warm') worstGap = Math.max(worstGap, Number.isNaN(gap) ? 0 : gap);
    });
  }
  console.log(`\nlargest relative objective gap to the warm solve: ${worstGap.toExponential(2)}; jslp did not finish: ${jslpUnfinished}`);
  const endMemory = process.memoryUsage();
  console.log(`wasm heap: start ${megabytes(startHeap)}, end ${megabytes(highs.memoryBytes)}`);
  console.log(`process RSS: start ${megabytes(startMemory.rss)}, end ${megabytes(endMemory.rss)}; JS heap used: start ${megabytes(startMemory.heapUsed)}, end ${megabytes(endMemory.heapUsed)}`);
}

await main();
