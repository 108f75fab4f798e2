// Boiler feedwater: saturated liquid from the deaerator, raised to boiler
// pressure by the feedwater pumps.
import { saturatedLiquid } from '../properties/index.js';
import type { Plant } from '../model/index.js';

export interface FeedwaterPoint {
  /** enthalpy at the boiler inlet, kJ/kg, including the pumps' shaft work */
  h: number;
  /** ideal (reversible) lift per kg pumped, kJ/kg: v dp */
  lift: number;
  /** pump shaft work per kg pumped, kJ/kg: v dp / eta */
  pumpWork: number;
}

/**
 * Feedwater delivered at `pressure` (MPa) by pumps of mean efficiency
 * `efficiency`: h = h_f(p_da) + v_f (p - p_da) / eta. All the shaft work ends
 * in the water (an adiabatic pump), so the boiler takes up that much less.
 */
export function feedwaterAt(plant: Plant, pressure: number, efficiency: number): FeedwaterPoint {
  const deaerator = plant.deaerator;
  const liquid = saturatedLiquid(deaerator.pressure);
  if (!deaerator.pumpWork) return { h: liquid.h, lift: 0, pumpWork: 0 };
  // v [m3/kg] x dp [MPa] = 1000 kJ/kg per (m3 MPa / kg)
  const lift = Math.max(0, liquid.v * (pressure - deaerator.pressure) * 1000);
  return { h: liquid.h + lift / efficiency, lift, pumpWork: lift / efficiency };
}

/** The name of a pump's lift variable: the ideal power v dp m it gives the water, kW. */
export function pumpLiftName(pumpId: string): string {
  return `${pumpId}.lift`;
}

/**
 * The pumps' mean efficiency, lift over shaft power, for the share of the
 * lift each pump took at `values` (a pass's variable values by name). Pumps
 * share the feedwater as the optimiser chooses, so the feedwater's enthalpy
 * follows the pumps that run; it is a loop point, settled with the others.
 * With no values yet (a first pass), or no lift, the first listed pump's
 * efficiency; 1 with no pump described.
 */
export function meanPumpEfficiency(plant: Plant, values: ReadonlyMap<string, number> | null): number {
  const pumps = plant.deaerator.feedwaterPumps;
  if (pumps.length === 0) return 1;
  let lift = 0;
  let shaft = 0;
  for (const pump of pumps) {
    const share = Math.max(0, values?.get(pumpLiftName(pump.id)) ?? 0);
    lift += share;
    shaft += share / pump.pumpEfficiency;
  }
  return lift > 1e-9 && shaft > 0 ? lift / shaft : pumps[0].pumpEfficiency;
}
