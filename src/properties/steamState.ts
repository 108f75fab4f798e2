import { CRITICAL_PRESSURE } from './constants.js';
import type { PhaseProperties } from './gibbsProperties.js';
import { saturationTemperatureOrNull } from './saturation.js';

export type Region = 1 | 2 | 4;

/** A state of water or steam in the release's units. */
export interface SteamState {
  p: number; // MPa absolute
  T: number; // K
  h: number; // kJ/kg
  s: number; // kJ/(kg K)
  v: number; // m3/kg
  /** kJ/(kg K); null for wet steam (0 < x < 1), the phase's own cp at x = 0 or 1. */
  cp: number | null;
  /** Vapour quality; null in single phase. */
  x: number | null;
  region: Region;
  /** Saturation temperature at p, K; null above the critical pressure and below 611.213 Pa. */
  Tsat: number | null;
  /** T - Tsat in K for superheated vapour (region 2 below the critical pressure), else null. */
  superheat: number | null;
}

/** A single-phase state from region 1 or 2 properties. */
export function singlePhaseState(phase: PhaseProperties, region: 1 | 2): SteamState {
  const Tsat = saturationTemperatureOrNull(phase.p);
  // On the saturation line Eqs. 30 and 31 agree only to round-off; a
  // superheat of -1e-12 K would read as nonsense, so it is clipped to zero.
  const superheat = region === 2 && Tsat !== null && phase.p <= CRITICAL_PRESSURE ? Math.max(0, phase.T - Tsat) : null;
  return {
    p: phase.p,
    T: phase.T,
    h: phase.h,
    s: phase.s,
    v: phase.v,
    cp: phase.cp,
    x: null,
    region,
    Tsat,
    superheat,
  };
}

/** Wet steam of quality x between saturated liquid and vapour at the same (p, T). */
export function wetState(liquid: PhaseProperties, vapour: PhaseProperties, x: number): SteamState {
  const mix = (f: number, g: number): number => f + x * (g - f);
  let cp: number | null = null;
  if (x === 0) cp = liquid.cp;
  if (x === 1) cp = vapour.cp;
  return {
    p: liquid.p,
    T: liquid.T,
    h: mix(liquid.h, vapour.h),
    s: mix(liquid.s, vapour.s),
    v: mix(liquid.v, vapour.v),
    cp,
    x,
    region: 4,
    Tsat: liquid.T,
    superheat: null,
  };
}
