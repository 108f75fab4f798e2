// Flash of hot condensate or blowdown to a lower pressure.
import { saturatedLiquid, saturatedVapour } from '../../properties/index.js';

export interface FlashSplit {
  /** Mass fraction of the inlet that leaves as saturated vapour, 0..1. */
  vapourFraction: number;
  /** Enthalpy of the vapour and of the liquid leaving, kJ/kg. */
  vapourEnthalpy: number;
  liquidEnthalpy: number;
}

/**
 * Adiabatic flash of liquid with enthalpy `inletEnthalpy` (kJ/kg) into a vessel
 * at `pressure` (MPa): x = (h_in - h_f(p)) / h_fg(p). Liquid already below the
 * vessel's saturation enthalpy does not flash (x = 0).
 */
export function flashSplit(inletEnthalpy: number, pressure: number): FlashSplit {
  const liquid = saturatedLiquid(pressure);
  const vapour = saturatedVapour(pressure);
  const fraction = (inletEnthalpy - liquid.h) / (vapour.h - liquid.h);
  return {
    vapourFraction: Math.min(1, Math.max(0, fraction)),
    vapourEnthalpy: vapour.h,
    liquidEnthalpy: liquid.h,
  };
}
