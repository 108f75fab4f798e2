// Random flow networks for the reconciliation tests, from a seeded generator
// so every run tests the same ones.
import type { BalanceRow, LinearProblem, Reading } from '../../../src/reconcile/index.js';
export { seededRandom } from '../../../src/seededRandom.js';
import { seededRandom } from '../../../src/seededRandom.js';

/** Standard normal draws by the Box-Muller transform (Box and Muller 1958). */
export function normalDraws(random: () => number): () => number {
  return () => {
    const u = 1 - random();
    const v = random();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
}

export interface Edge {
  from: number;
  to: number;
}

/** Node 0 is the environment (not balanced); nodes 1..nodes are balanced. */
export interface GeneratedNetwork {
  nodes: number;
  edges: Edge[];
  measured: boolean[];
}

/** A connected network: a random spanning tree over nodes and environment, then extra edges; each edge measured with probability `measuredShare`. */
export function generateNetwork(random: () => number, nodes: number, extraEdges: number, measuredShare: number): GeneratedNetwork {
  const edges: Edge[] = [];
  const order = Array.from({ length: nodes + 1 }, (_, i) => i);
  for (let i = 1; i <= nodes; i++) {
    const other = order[Math.floor(random() * i)];
    edges.push(random() < 0.5 ? { from: other, to: i } : { from: i, to: other });
  }
  for (let e = 0; e < extraEdges; e++) {
    const a = Math.floor(random() * (nodes + 1));
    let b = Math.floor(random() * nodes);
    if (b >= a) b++;
    edges.push({ from: a, to: b });
  }
  return { nodes, edges, measured: edges.map(() => random() < measuredShare) };
}

export function balances(network: GeneratedNetwork): BalanceRow[] {
  const rows: BalanceRow[] = [];
  for (let node = 1; node <= network.nodes; node++) {
    const terms = new Map<number, number>();
    network.edges.forEach((edge, index) => {
      if (edge.to === node) terms.set(index, 1);
      if (edge.from === node) terms.set(index, -1);
    });
    rows.push({ name: `n${node}`, terms });
  }
  return rows;
}

/** Readings near 10..110 with 1 % to 5 % standard deviations. */
export function readingsOf(network: GeneratedNetwork, random: () => number): Reading[] {
  return network.edges.flatMap((_, index) => {
    if (!network.measured[index]) return [];
    const value = 10 + 100 * random();
    return [{ variable: index, value, sigma: value * (0.01 + 0.04 * random()) }];
  });
}

/** Union-find over nodes 0..nodes, joining the given edges. */
function components(nodes: number, edges: readonly Edge[]): (node: number) => number {
  const parent = Array.from({ length: nodes + 1 }, (_, i) => i);
  const find = (node: number): number => {
    while (parent[node] !== node) {
      parent[node] = parent[parent[node]];
      node = parent[node];
    }
    return node;
  };
  for (const edge of edges) parent[find(edge.from)] = find(edge.to);
  return find;
}

/**
 * The graph rule (Vaclavek 1969; Mah, Stanley and Downing 1976): an unmeasured
 * flow is unobservable when it lies on a cycle of unmeasured flows, i.e. its
 * ends stay joined through the other unmeasured flows.
 */
export function observableByGraph(network: GeneratedNetwork): boolean[] {
  return network.edges.map((edge, index) => {
    if (network.measured[index]) return true;
    const others = network.edges.filter((_, other) => other !== index && !network.measured[other]);
    const find = components(network.nodes, others);
    return find(edge.from) !== find(edge.to);
  });
}

/**
 * The graph rule for redundancy: merge the nodes joined by unmeasured flows; a
 * measured flow is redundant when it still joins two different merged nodes
 * (else no balance is left that contains it).
 */
export function redundantByGraph(network: GeneratedNetwork): boolean[] {
  const unmeasured = network.edges.filter((_, index) => !network.measured[index]);
  const find = components(network.nodes, unmeasured);
  return network.edges.map((edge, index) => network.measured[index] && find(edge.from) !== find(edge.to));
}

/**
 * The weighted least-squares fit of a linear problem as an LP-format
 * quadratic programme for HiGHS, the second solver the reconciliation is
 * checked against: minimise sum (x_i - y_i)^2 / s_i^2, i.e. sum x_i^2 / s_i^2
 * - 2 y_i x_i / s_i^2 (the constant dropped), subject to the balances. The
 * variables `free(j)` says are free get no bound; the others are zero or more.
 */
export function leastSquaresLp(problem: LinearProblem, free: (variable: number) => boolean): string {
  const linear = problem.readings.map((reading) => `${-2 * reading.value / reading.sigma ** 2} x${reading.variable}`).join(' + ').replace(/\+ -/g, '- ');
  const quadratic = problem.readings.map((reading) => `${2 / reading.sigma ** 2} x${reading.variable} ^ 2`).join(' + ');
  const rows = problem.balances.map((row, i) => ` b${i}: ${[...row.terms].map(([j, c]) => `${c >= 0 ? '+' : '-'} x${j}`).join(' ')} = 0`).join('\n');
  const bounds = Array.from({ length: problem.variableCount }, (_, j) => j).filter(free).map((j) => ` x${j} free`).join('\n');
  return `Minimize\n obj: ${linear} + [ ${quadratic} ] / 2\nSubject To\n${rows}\nBounds\n${bounds}\nEnd`;
}
