// Stream states as the audit works them out: from the case's own data and
// IAPWS-IF97, never from the states the linear model was built with.
import type { FixedState, Header, Plant } from '../../model/index.js';
import { saturatedLiquid, saturatedVapour, statePH, statePT, type SteamState } from '../../properties/index.js';
import type { SolvedPlant } from './solvedPlant.js';

export interface Point {
  p: number;
  h: number;
  s: number;
  /** K */
  T: number;
}

export function point(state: SteamState): Point {
  return { p: state.p, h: state.h, s: state.s, T: state.T };
}

export function pointPH(p: number, h: number): Point {
  return point(statePH(p, h));
}

/** Steam delivered at a stated temperature, or dry saturated when the case says "saturated". */
export function deliveredSteam(pressure: number, delivered: FixedState & { saturated: boolean }): Point {
  return point(delivered.saturated ? saturatedVapour(pressure) : statePT(pressure, delivered.T));
}

/** Liquid at a header's pressure and a stated temperature (condensate). */
export function liquidAt(pressure: number, temperature: number): Point {
  const saturation = saturatedLiquid(pressure);
  // At saturation IF97 regions 1 and 4 meet; take the liquid side.
  return temperature >= saturation.T ? point(saturation) : point(statePT(pressure, temperature));
}

export class AuditStates {
  private readonly headerPoints = new Map<string, Point>();
  readonly feedwater: Point;
  readonly deaeratorVapour: Point;
  readonly makeup: Point;
  /**
   * The pumps' mean efficiency: lift over shaft power, each pump's lift its
   * solved shaft power times its own efficiency from the case. The solve's
   * shares are themselves checked against the drives (see power.ts) and the
   * feedwater's needs (see supplies.ts).
   */
  readonly pumpEfficiency: number;
  /** ideal lift v dp m of all feedwater pumped, kW, as boilers are audited */
  lift = 0;

  constructor(
    readonly plant: Plant,
    solved: SolvedPlant,
  ) {
    const solvedHeaders = new Map(solved.headers.map((header) => [header.id, header]));
    for (const header of plant.headers) {
      const h = headerEnthalpy(header, solvedHeaders.get(header.id)?.h);
      this.headerPoints.set(header.id, pointPH(header.pressure, h));
    }
    this.feedwater = point(saturatedLiquid(plant.deaerator.pressure));
    this.deaeratorVapour = point(saturatedVapour(plant.deaerator.pressure));
    this.makeup = point(statePT(plant.site.atmosphericPressure, plant.site.makeupWater.temperature));
    this.pumpEfficiency = meanEfficiency(plant, solved);
  }

  header(id: string): Point {
    const found = this.headerPoints.get(id);
    if (!found) throw new Error(`the audit has no state for header "${id}". The plant and the solve must match.`);
    return found;
  }

  headerPressure(id: string): number {
    return this.header(id).p;
  }

  /**
   * Feedwater pump work per kg lifted from the deaerator to `pressure`:
   * w = v_f (p - p_da) / eta (incompressible liquid), at the pumps' mean
   * efficiency; 100 % with no pump described, and no work at all when the
   * case says feedwater_pumps: none.
   */
  pumpWork(pressure: number): number {
    return this.pumpLift(pressure) / this.pumpEfficiency;
  }

  /** The ideal lift per kg, v_f (p - p_da), kJ/kg. */
  pumpLift(pressure: number): number {
    if (!this.plant.deaerator.pumpWork) return 0;
    const liquid = saturatedLiquid(this.plant.deaerator.pressure);
    // v [m3/kg] x dp [MPa] x 1000 = kJ/kg
    return Math.max(0, liquid.v * (pressure - this.plant.deaerator.pressure) * 1000);
  }

  /** Feedwater at a boiler's inlet: deaerator water plus the pump's work. */
  boilerFeed(pressure: number): Point {
    // With pump work left out by the case, the lift is left out too: the water keeps the deaerator's state.
    if (!this.plant.deaerator.pumpWork) return this.feedwater;
    return pointPH(pressure, this.feedwater.h + this.pumpWork(pressure));
  }

  /** Ambient temperature, K: where header losses and condenser heat go. */
  get ambient(): number {
    return this.plant.site.ambientTemperature;
  }
}

/** Lift over shaft power of the pumps as the solve shared the work; the first pump's efficiency when none runs. */
function meanEfficiency(plant: Plant, solved: SolvedPlant): number {
  const pumps = plant.deaerator.feedwaterPumps;
  if (pumps.length === 0) return 1;
  let lift = 0;
  let shaft = 0;
  for (const pump of pumps) {
    const share = Math.max(0, solved.deaerator.pumps.find((entry) => entry.id === pump.id)?.shaft ?? 0);
    shaft += share;
    lift += share * pump.pumpEfficiency;
  }
  return shaft > 1e-9 ? lift / shaft : pumps[0].pumpEfficiency;
}

/** A controlled header sits at its set point from the case; a floating one where the solve left it. */
function headerEnthalpy(header: Header, solved: number | undefined): number {
  if (header.state.kind === 'controlled') {
    return header.state.specifiedBy === 'temperature' ? statePT(header.pressure, header.state.T).h : header.state.h;
  }
  if (solved === undefined) throw new Error(`the solve gives no state for floating header "${header.id}".`);
  return solved;
}
