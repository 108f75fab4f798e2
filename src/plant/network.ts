// Streams and the nodes they join. Every flow into or out of a header, the
// deaerator or a flash tank is one stream; the builder turns the streams at each
// balance node into its mass (and, where needed, energy) row.
import type { LinearExpression } from '../lp/index.js';
import type { PassSolution } from './passSolution.js';

/** Ends of streams that are not balance nodes. */
export const ATMOSPHERE = 'atmosphere';
export const DRAIN = 'drain';
export const MAKEUP = 'makeup';
export const PROCESS = 'process';

export type StreamKind =
  | 'steam'
  | 'extraction'
  | 'exhaust'
  | 'letdown'
  | 'spray'
  | 'vent'
  | 'process'
  | 'condensate'
  | 'blowdown'
  | 'flashVapour'
  | 'flashLiquid'
  | 'feedwater'
  | 'makeup'
  | 'heatingSteam'
  | 'trapLoss'
  /** heat alone (no mass): a makeup preheater's duty, into the deaerator */
  | 'makeupHeat';

export interface Stream {
  /** unit, header or terminal id the stream leaves */
  from: string;
  /** unit, header or terminal id the stream enters */
  to: string;
  kind: StreamKind;
  /** mass flow, kg/s, linear in the pass's variables */
  flow: LinearExpression;
  /** specific enthalpy at the pass's point, kJ/kg */
  h: number;
  /**
   * First-order move of the enthalpy with the pass's floating-header moves
   * (zero at the point), kJ/kg. In an energy row the stream then carries
   * m h + m0 dh, the Taylor expansion of m (h + dh) about the point flow m0.
   */
  dh?: LinearExpression;
  /** pressure the stream is at, MPa (for reporting its state) */
  p: number;
  /**
   * Energy the stream carries in its nodes' energy rows, kW, when that is not
   * flow x h: a heat-duty user draws its duty plus its condensate's enthalpy,
   * and a Willans-line exhaust carries its inflow's energy less the work, both
   * exactly linear.
   */
  energy?: LinearExpression;
}

/** A node whose balance the model enforces. */
export interface BalanceNode {
  id: string;
  /** energy balance enforced in the linear model (otherwise closed by updating the node's enthalpy) */
  energyRow: boolean;
  /** heat lost from the node, kW */
  heatLoss: number;
}

/**
 * A stream's enthalpy in a solution, kJ/kg: its energy over its flow where it
 * carries its own energy, else its point moved by its solved move.
 */
export function solvedEnthalpy(stream: Stream, solution: PassSolution): number {
  if (stream.energy) {
    const flow = solution.evaluate(stream.flow);
    if (Math.abs(flow) > 1e-9) return solution.evaluate(stream.energy) / flow;
  }
  return stream.h + (stream.dh ? solution.evaluate(stream.dh) : 0);
}

/** The energy a stream carries in a solution, kW: its own expression where it has one (a heat-only stream has no flow), else flow x enthalpy. */
export function solvedEnergy(stream: Stream, solution: PassSolution): number {
  if (stream.energy) return solution.evaluate(stream.energy);
  return solution.evaluate(stream.flow) * solvedEnthalpy(stream, solution);
}

/**
 * A header's heat loss while steam flows through it, kW: an idle header is out
 * of service and loses nothing (the case's loss is the piping's at operating
 * conditions).
 */
export function headerLoss(heatLoss: number, streamsInto: readonly Stream[], solution: PassSolution): number {
  return streamsInto.some((stream) => solution.evaluate(stream.flow) > 1e-9) ? heatLoss : 0;
}
