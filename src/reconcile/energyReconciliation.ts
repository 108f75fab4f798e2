// Reconciliation with energy balances where temperatures are measured.
//
// A stream's enthalpy is either known (the plant's design point) or follows a
// measured temperature: h = h(p, T) from IAPWS-IF97 at the stream's pressure.
// An energy balance sum (m h) = heat loss is then bilinear in flow and
// temperature. It is solved by successive linearisation (Knepper and Gorman,
// AIChE J. 26 (1980) 260; Crowe, AIChE J. 32 (1986) 616; the same iteration
// VDI 2048 Part 1 prescribes): about the last estimate (m0, T0),
//
//   m h(T) ~ h0 m + m0 cp0 T - m0 cp0 T0,
//
// with cp0 = dh/dT at constant pressure from IF97, each pass a linear weighted
// least squares with known terms (reconcileLinear), until no estimate moves.
// At the fixed point the linearisation is exact to first order, so the
// global and measurement tests are those of the last pass.
import { statePT } from '../properties/index.js';
import { reconcileLinear, type BalanceRow, type LinearProblem, type LinearResult, type Reading } from './linearReconciliation.js';

export interface EnergyStream {
  id: string;
  from: string;
  to: string;
  /** pressure, MPa */
  p: number;
  /** specific enthalpy when no temperature point sets it, kJ/kg */
  h: number;
  /** index of the temperature point whose temperature sets this stream's enthalpy, or null */
  point: number | null;
}

export interface TemperaturePoint {
  id: string;
  /** pressure at the point, MPa (every stream on the point is taken at it) */
  p: number;
  /** start of the iteration when the point has no reading, K */
  guess: number;
}

export interface EnergyNode {
  id: string;
  /** the node's energy balance holds (adiabatic mixing, a deaerator): written as a row */
  energy: boolean;
  /** heat lost from the node, kW (0 when none) */
  heatLoss: number;
}

export interface EnergyProblem {
  streams: readonly EnergyStream[];
  nodes: readonly EnergyNode[];
  points: readonly TemperaturePoint[];
  /** flow readings, `variable` = stream index, kg/s */
  flows: readonly Reading[];
  /** temperature readings, `variable` = point index, K */
  temperatures: readonly Reading[];
  /**
   * Further linear rows with variables of their own, numbered after the
   * streams and the points (a turbine's power tied to its flows): their count,
   * their rows and their readings, which come last in the linear problem.
   */
  extra?: { variables: number; rows: readonly BalanceRow[]; readings: readonly Reading[] };
}

export interface EnergyResult {
  /** each stream's flow, kg/s; null where not observable */
  flows: (number | null)[];
  flowSigma: (number | null)[];
  /** each point's temperature, K; null where not observable */
  temperatures: (number | null)[];
  temperatureSigma: (number | null)[];
  /**
   * The last pass: variables are the streams, then the points, then the
   * extra variables; its readings are the flow readings, then the temperature
   * readings, then the extra readings, in the problem's order; its global
   * statistic and measurement tests are the reconciliation's.
   */
  last: LinearResult;
  /** the last pass's linear problem (the linearisation at the estimate), for the tests and serial elimination */
  problem: LinearProblem;
  iterations: number;
  /** each node's mass balance at the estimate (in less out), kg/s; null where a flow is not observable */
  massResidual: (number | null)[];
  /** each energy node's balance at the estimate (in less out less loss), kW; null where not energy-balanced or not observable */
  energyResidual: (number | null)[];
}

export interface EnergySettings {
  /** largest move of a flow (kg/s) and of a temperature (K) that ends the iteration */
  tolerance?: number;
  maxIterations?: number;
}

/** Thrown when successive linearisation does not settle; names what kept moving. */
export class EnergyIterationError extends Error {}

/** Energy rows are written in MW so that they sit near the mass rows' scale (kg/s). */
const ENERGY_SCALE = 1e-3;

export function reconcileWithEnergy(problem: EnergyProblem, settings: EnergySettings = {}): EnergyResult {
  const tolerance = settings.tolerance ?? 1e-9;
  const maxIterations = settings.maxIterations ?? 50;
  const streamCount = problem.streams.length;
  const pointCount = problem.points.length;
  const extra = problem.extra ?? { variables: 0, rows: [], readings: [] };
  const readings: Reading[] = [...problem.flows, ...problem.temperatures.map((reading) => ({ ...reading, variable: streamCount + reading.variable })), ...extra.readings];
  const massRows = massBalances(problem);

  // Start: the mass-only reconciliation's flows, the temperature readings.
  const start = reconcileLinear({ variableCount: streamCount, balances: massRows, readings: problem.flows });
  let flows = start.estimate.map((value) => value ?? 0);
  let temperatures = problem.points.map((point) => point.guess);
  for (const reading of problem.temperatures) temperatures[reading.variable] = reading.value;

  let last: LinearResult | null = null;
  let moved = '';
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const linear: LinearProblem = { variableCount: streamCount + pointCount + extra.variables, balances: [...massRows, ...energyBalances(problem, flows, temperatures), ...extra.rows], readings };
    last = reconcileLinear(linear);
    const nextFlows = flows.map((value, j) => last!.estimate[j] ?? value);
    const nextTemperatures = temperatures.map((value, k) => last!.estimate[streamCount + k] ?? value);
    let largest = 0;
    moved = '';
    nextFlows.forEach((value, j) => {
      const move = Math.abs(value - flows[j]);
      if (move > largest) [largest, moved] = [move, `flow of ${problem.streams[j].id}`];
    });
    nextTemperatures.forEach((value, k) => {
      const move = Math.abs(value - temperatures[k]);
      if (move > largest) [largest, moved] = [move, `temperature at ${problem.points[k].id}`];
    });
    flows = nextFlows;
    temperatures = nextTemperatures;
    if (largest <= tolerance) return resultOf(problem, last, linear, iteration, flows, temperatures);
  }
  throw new EnergyIterationError(`the energy balances did not settle in ${maxIterations} passes; the ${moved} kept moving (check the temperature readings and the streams' pressures)`);
}

function massBalances(problem: EnergyProblem): BalanceRow[] {
  return problem.nodes.map((node) => {
    const terms = new Map<number, number>();
    problem.streams.forEach((stream, j) => {
      if (stream.to === node.id) terms.set(j, (terms.get(j) ?? 0) + 1);
      if (stream.from === node.id) terms.set(j, (terms.get(j) ?? 0) - 1);
    });
    return { name: `${node.id}.mass`, terms };
  });
}

/** Specific enthalpy and dh/dT of a stream at a temperature estimate. */
function enthalpyOf(stream: EnergyStream, problem: EnergyProblem, temperatures: readonly number[]): { h: number; cp: number } {
  if (stream.point === null) return { h: stream.h, cp: 0 };
  const state = statePT(problem.points[stream.point].p, temperatures[stream.point]);
  return { h: state.h, cp: state.cp ?? 0 };
}

/** Each energy node's balance linearised about (flows, temperatures), in MW. */
function energyBalances(problem: EnergyProblem, flows: readonly number[], temperatures: readonly number[]): BalanceRow[] {
  const streamCount = problem.streams.length;
  return problem.nodes
    .filter((node) => node.energy)
    .map((node) => {
      const terms = new Map<number, number>();
      let constant = -node.heatLoss * ENERGY_SCALE;
      problem.streams.forEach((stream, j) => {
        const sign = stream.to === node.id ? 1 : stream.from === node.id ? -1 : 0;
        if (sign === 0) return;
        const { h, cp } = enthalpyOf(stream, problem, temperatures);
        terms.set(j, (terms.get(j) ?? 0) + sign * h * ENERGY_SCALE);
        if (stream.point !== null && cp !== 0) {
          const variable = streamCount + stream.point;
          const slope = sign * flows[j] * cp * ENERGY_SCALE;
          terms.set(variable, (terms.get(variable) ?? 0) + slope);
          constant -= slope * temperatures[stream.point];
        }
      });
      return { name: `${node.id}.energy`, terms, constant };
    });
}

function resultOf(problem: EnergyProblem, last: LinearResult, linear: LinearProblem, iterations: number, flows: readonly number[], temperatures: readonly number[]): EnergyResult {
  const streamCount = problem.streams.length;
  const flowEstimates = problem.streams.map((_, j) => (last.observable[j] ? flows[j] : null));
  const temperatureEstimates = problem.points.map((_, k) => (last.observable[streamCount + k] ? temperatures[k] : null));
  const massResidual = problem.nodes.map((node) => {
    let sum = 0;
    for (const [j, stream] of problem.streams.entries()) {
      const sign = stream.to === node.id ? 1 : stream.from === node.id ? -1 : 0;
      if (sign === 0) continue;
      if (flowEstimates[j] === null) return null;
      sum += sign * flowEstimates[j]!;
    }
    return sum;
  });
  const energyResidual = problem.nodes.map((node) => {
    if (!node.energy) return null;
    let sum = -node.heatLoss;
    for (const [j, stream] of problem.streams.entries()) {
      const sign = stream.to === node.id ? 1 : stream.from === node.id ? -1 : 0;
      if (sign === 0) continue;
      if (flowEstimates[j] === null || (stream.point !== null && temperatureEstimates[stream.point] === null)) return null;
      sum += sign * flowEstimates[j]! * enthalpyOf(stream, problem, temperatures).h;
    }
    return sum;
  });
  return {
    flows: flowEstimates,
    flowSigma: problem.streams.map((_, j) => last.sigma[j]),
    temperatures: temperatureEstimates,
    temperatureSigma: problem.points.map((_, k) => last.sigma[streamCount + k]),
    last,
    problem: linear,
    iterations,
    massResidual,
    energyResidual,
  };
}
