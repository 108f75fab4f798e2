// Expansion through one turbine stage.
import { statePH, statePS, type SteamState } from '../../properties/index.js';

export interface StageExpansion {
  /** Isentropic exhaust state at the exhaust pressure. */
  isentropic: SteamState;
  /** Actual exhaust state. */
  exhaust: SteamState;
  /** Enthalpy drop h_in - h_out, kJ/kg. */
  enthalpyDrop: number;
}

/**
 * Exhaust of an expansion from `inlet` to `exhaustPressure` (MPa) at isentropic
 * efficiency eta: h_out = h_in - eta (h_in - h_out,s), with h_out,s at the inlet
 * entropy (the definition of isentropic efficiency).
 */
export function expandIsentropic(inlet: SteamState, exhaustPressure: number, efficiency: number): StageExpansion {
  checkExhaustPressure(inlet, exhaustPressure);
  if (!(efficiency > 0 && efficiency <= 1)) {
    throw new Error(`isentropic efficiency ${efficiency} is outside (0, 1]. Give it as a fraction.`);
  }
  const isentropic = statePS(exhaustPressure, inlet.s);
  const exhaustEnthalpy = inlet.h - efficiency * (inlet.h - isentropic.h);
  return { isentropic, exhaust: statePH(exhaustPressure, exhaustEnthalpy), enthalpyDrop: inlet.h - exhaustEnthalpy };
}

/** Exhaust at a given enthalpy, with its implied isentropic efficiency available from the drop. */
export function expandToEnthalpy(inlet: SteamState, exhaustPressure: number, exhaustEnthalpy: number): StageExpansion {
  checkExhaustPressure(inlet, exhaustPressure);
  const isentropic = statePS(exhaustPressure, inlet.s);
  return { isentropic, exhaust: statePH(exhaustPressure, exhaustEnthalpy), enthalpyDrop: inlet.h - exhaustEnthalpy };
}

/** Isentropic efficiency implied by an expansion. */
export function impliedEfficiency(expansion: StageExpansion, inletEnthalpy: number): number {
  return expansion.enthalpyDrop / (inletEnthalpy - expansion.isentropic.h);
}

/**
 * Theoretical steam rate, kg/kWh, for an isentropic expansion: 3600 / (h1 - h2s).
 * (In lb/kWh, 3412.14 / (h1 - h2s) with enthalpies in Btu/lb.)
 */
export function theoreticalSteamRate(inlet: SteamState, exhaustPressure: number): number {
  checkExhaustPressure(inlet, exhaustPressure);
  return 3600 / (inlet.h - statePS(exhaustPressure, inlet.s).h);
}

function checkExhaustPressure(inlet: SteamState, exhaustPressure: number): void {
  if (!(exhaustPressure < inlet.p)) {
    throw new Error(
      `turbine exhaust pressure ${exhaustPressure} MPa is not below the inlet pressure ${inlet.p} MPa. A stage must expand to a lower pressure.`,
    );
  }
}
