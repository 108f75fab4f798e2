// What each equipment kind gives the linear model. The builder loops over these
// and never asks what kind a unit is.
import type { BuildContext } from './context.js';
import type { Stream } from './network.js';
import type { PassSolution } from './passSolution.js';

export interface UnitReport {
  id: string;
  kind: string;
  /** a short description of the load, e.g. "42.0 t/h" is left to the report; here numbers */
  values: Record<string, number | string | boolean | null>;
  /** limits the unit sits at in the solution, in words */
  binding: string[];
}

export interface PointChange {
  /** what moved, e.g. "hp.h" or "st1.stage2.h" */
  what: string;
  /** absolute change, in the unit of `unit` */
  change: number;
  unit: 'kJ/kg' | 'kg/s' | 'fraction';
}

export interface UnitContribution {
  readonly id: string;
  readonly kind: string;
  /** Declares variables, streams, rows and costs for one pass, at the current property points. */
  build(context: BuildContext): void;
  /** Moves this unit's own property points to agree with the solution; returns what changed. */
  update?(solution: PassSolution, headerEnthalpy: (id: string) => number): PointChange[];
  /** The unit's results from the final pass. */
  report(solution: PassSolution): UnitReport;
  /** Runs after every unit has built: for rows that need streams or loads declared by others. */
  finish?(context: BuildContext): void;
  /**
   * The power the unit makes, kW, as a linear function of the flows of streams
   * it declared, at this pass's point and with the unit running: for
   * reconciling a power meter against the unit's steam (see streamNetwork).
   */
  powerInFlows?(): PowerInFlows;
  /**
   * The fuel the unit fires, kW, against the flow of one stream it declared
   * (a boiler's steam), with the unit running, at this pass's point: for
   * reconciling a fuel meter. Not linear: the reconciliation linearises it.
   */
  fuelOfSteam?(): { stream: Stream; fuel: (steam: number) => number };
}

/** power = sum of coefficient x stream flow + constant, kW */
export interface PowerInFlows {
  terms: { stream: Stream; coefficient: number }[];
  constant: number;
}
