// Boiler feedwater: saturated liquid from the deaerator, raised to boiler
// pressure by the feedwater pumps.
import { saturatedLiquid } from '../properties/index.js';
import type { Plant } from '../model/index.js';

export interface FeedwaterPoint {
  /** enthalpy at the boiler inlet, kJ/kg, including the pump's work */
  h: number;
  /** pump shaft work per kg pumped, kJ/kg: v dp / eta */
  pumpWork: number;
}

/** Feedwater delivered at `pressure` (MPa): h = h_f(p_da) + v_f (p - p_da) / eta_pump. */
export function feedwaterAt(plant: Plant, pressure: number): FeedwaterPoint {
  const deaerator = plant.deaerator;
  const liquid = saturatedLiquid(deaerator.pressure);
  if (!deaerator.pumpWork) return { h: liquid.h, pumpWork: 0 };
  const efficiency = deaerator.feedwaterPumps[0]?.pumpEfficiency ?? 1;
  // v [m3/kg] x dp [MPa] = 1000 kJ/kg per (m3 MPa / kg)
  const pumpWork = Math.max(0, (liquid.v * (pressure - deaerator.pressure) * 1000) / efficiency);
  return { h: liquid.h + pumpWork, pumpWork };
}
