// What every boiler shares: feedwater in, steam out, blowdown to its destination.
import { expr, type LinearExpression } from '../../lp/index.js';
import type { FixedState, LiquidDestination } from '../../model/index.js';
import { saturatedLiquid } from '../../properties/index.js';
import type { BuildContext } from '../context.js';
import { feedwaterAt } from '../feedwater.js';
import { DRAIN } from '../network.js';

/** The node a liquid stream is sent to. */
export function liquidNode(destination: LiquidDestination): string {
  if (destination.kind === 'flashTank') return destination.id;
  if (destination.kind === 'deaerator') return 'deaerator';
  return DRAIN;
}

export interface SteamRaising {
  /** heat absorbed per kg of steam, blowdown included, kJ/kg */
  heatPerKg: number;
  /** blowdown per kg of steam */
  blowdownPerKg: number;
  /** feedwater enthalpy at the boiler inlet, ideal lift and pump shaft work per kg, kJ/kg */
  feedwaterH: number;
  lift: number;
  pumpWork: number;
  /** saturated drum water, kJ/kg */
  drumWaterH: number;
  pressure: number;
}

/** The fixed states of a boiler at a header for one pass. */
export function steamRaisingPoint(context: BuildContext, headerId: string, outlet: FixedState, blowdownFraction: number): SteamRaising {
  const pressure = context.pressure(headerId);
  const feedwater = feedwaterAt(context.plant, pressure, context.pumpEfficiency);
  context.largestLift = Math.max(context.largestLift, feedwater.lift);
  const drumWaterH = saturatedLiquid(pressure).h;
  const blowdownPerKg = blowdownFraction / (1 - blowdownFraction);
  return {
    heatPerKg: outlet.h - feedwater.h + blowdownPerKg * (drumWaterH - feedwater.h),
    blowdownPerKg,
    feedwaterH: feedwater.h,
    lift: feedwater.lift,
    pumpWork: feedwater.pumpWork,
    drumWaterH,
    pressure,
  };
}

/**
 * Declares the streams of a boiler making `steam` (kg/s) into `headerId`:
 * feedwater F = S / (1 - b) from the deaerator, blowdown B = S b / (1 - b) of
 * saturated drum water, and the pumps' lift of the feedwater.
 */
export function declareSteamRaising(
  context: BuildContext,
  owner: string,
  headerId: string,
  steam: LinearExpression,
  outlet: FixedState,
  point: SteamRaising,
  blowdownTo: LiquidDestination,
): void {
  const feedPerKg = 1 + point.blowdownPerKg;
  // The stream is what leaves the deaerator; the pump's work is added between it and the boiler.
  const deaerator = context.plant.deaerator;
  context.stream({ from: 'deaerator', to: owner, kind: 'feedwater', flow: expr().addExpression(steam, feedPerKg), h: deaerator.feedwaterH, p: deaerator.pressure });
  context.stream({ from: owner, to: headerId, kind: 'steam', flow: steam.clone(), h: outlet.h, p: point.pressure });
  if (point.blowdownPerKg > 0) {
    context.stream({ from: owner, to: liquidNode(blowdownTo), kind: 'blowdown', flow: expr().addExpression(steam, point.blowdownPerKg), h: point.drumWaterH, p: point.pressure });
  }
  context.pumpLift.addExpression(steam, feedPerKg * point.lift);
}
