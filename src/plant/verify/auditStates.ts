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
   * w = v_f (p - p_da) / eta (incompressible liquid). The plant's convention is
   * the first listed pump's efficiency for all feedwater, 100 % with no pump,
   * and no work at all when the case says feedwater_pumps: none.
   */
  pumpWork(pressure: number): number {
    if (!this.plant.deaerator.pumpWork) return 0;
    const efficiency = this.plant.deaerator.feedwaterPumps[0]?.pumpEfficiency ?? 1;
    const liquid = saturatedLiquid(this.plant.deaerator.pressure);
    // v [m3/kg] x dp [MPa] x 1000 = kJ/kg
    return Math.max(0, (liquid.v * (pressure - this.plant.deaerator.pressure) * 1000) / efficiency);
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

/** A controlled header sits at its set point from the case; a floating one where the solve left it. */
function headerEnthalpy(header: Header, solved: number | undefined): number {
  if (header.state.kind === 'controlled') {
    return header.state.specifiedBy === 'temperature' ? statePT(header.pressure, header.state.T).h : header.state.h;
  }
  if (solved === undefined) throw new Error(`the solve gives no state for floating header "${header.id}".`);
  return solved;
}
