// Streams and the nodes they join. Every flow into or out of a header, the
// deaerator or a flash tank is one stream; the builder turns the streams at each
// balance node into its mass (and, where needed, energy) row.
import type { LinearExpression } from '../lp/index.js';

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
  | 'heatingSteam';

export interface Stream {
  /** unit, header or terminal id the stream leaves */
  from: string;
  /** unit, header or terminal id the stream enters */
  to: string;
  kind: StreamKind;
  /** mass flow, kg/s, linear in the pass's variables */
  flow: LinearExpression;
  /** specific enthalpy, kJ/kg, fixed for the pass */
  h: number;
  /** pressure the stream is at, MPa (for reporting its state) */
  p: number;
  /**
   * Energy the stream carries in its nodes' energy rows, kW, when that is not
   * flow x h: a heat-duty user on a floating header draws its duty plus its
   * condensate's enthalpy, whatever the header's enthalpy turns out to be.
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
