import { MIN_TEMPERATURE, REGION1_MAX_TEMPERATURE } from './constants.js';
import type { PhaseProperties } from './gibbsProperties.js';
import { temperaturePHRegion1, temperaturePHRegion2, temperaturePSRegion1, temperaturePSRegion2 } from './inverse.js';
import { PropertyRangeError, formatValue, requireFinite } from './PropertyRangeError.js';
import { enthalpyRegion1, entropyRegion1, propertiesRegion1 } from './region1.js';
import { enthalpyRegion2, entropyRegion2, propertiesRegion2 } from './region2.js';
import { saturationPressureRegion4, saturationTemperatureRegion4 } from './region4.js';
import { regionOfPH, regionOfPS } from './regionOfPH.js';
import { regionOfPT, requirePressure } from './regionOfPT.js';
import { MIN_SATURATION_PRESSURE, REGION3_SATURATION_PRESSURE } from './saturation.js';
import { singlePhaseState, wetState, type SteamState } from './steamState.js';

const REGION3_SATURATION = `which steamwright does not implement; saturation is available from ${MIN_TEMPERATURE} K to ${REGION1_MAX_TEMPERATURE} K (${formatValue(REGION3_SATURATION_PRESSURE)} MPa)`;

function phaseAt(p: number, T: number, region: 1 | 2): PhaseProperties {
  return region === 1 ? propertiesRegion1(p, T) : propertiesRegion2(p, T);
}

/** Water or steam at (p MPa, T K). On the saturation line the state is liquid (see regionOfPT). */
export function statePT(p: number, T: number): SteamState {
  const region = regionOfPT(p, T);
  return singlePhaseState(phaseAt(p, T, region), region);
}

/** Specific enthalpy at (p MPa, T K), kJ/kg. */
export function enthalpyPT(p: number, T: number): number {
  return regionOfPT(p, T) === 1 ? enthalpyRegion1(p, T) : enthalpyRegion2(p, T);
}

/** Specific entropy at (p MPa, T K), kJ/(kg K). */
export function entropyPT(p: number, T: number): number {
  return regionOfPT(p, T) === 1 ? entropyRegion1(p, T) : entropyRegion2(p, T);
}

function requireQuality(x: number): void {
  requireFinite('vapour quality', x, 'kg vapour per kg');
  if (x < 0 || x > 1) throw new PropertyRangeError(`vapour quality ${formatValue(x)} is outside the range 0 to 1`);
}

function saturatedAt(p: number, T: number, x: number): SteamState {
  return wetState(propertiesRegion1(p, T), propertiesRegion2(p, T), x);
}

function requireSaturationPressure(p: number): void {
  requirePressure(p);
  if (p < MIN_SATURATION_PRESSURE) {
    throw new PropertyRangeError(
      `pressure ${formatValue(p)} MPa is below the IF97 saturation limit of ${formatValue(MIN_SATURATION_PRESSURE)} MPa (${MIN_TEMPERATURE} K)`,
    );
  }
  if (p > REGION3_SATURATION_PRESSURE) {
    throw new PropertyRangeError(`saturated states at ${formatValue(p)} MPa lie in IF97 region 3, ${REGION3_SATURATION}`);
  }
}

/** Saturated mixture at pressure p (MPa) and vapour quality x in [0, 1]. */
export function statePX(p: number, x: number): SteamState {
  requireSaturationPressure(p);
  requireQuality(x);
  return saturatedAt(p, saturationTemperatureRegion4(p), x);
}

/** Saturated mixture at temperature T (K) and vapour quality x in [0, 1]. */
export function stateTX(T: number, x: number): SteamState {
  requireFinite('temperature', T, 'K');
  if (T < MIN_TEMPERATURE) {
    throw new PropertyRangeError(`temperature ${formatValue(T)} K is below the IF97 limit of ${MIN_TEMPERATURE} K`);
  }
  if (T > REGION1_MAX_TEMPERATURE) {
    throw new PropertyRangeError(`saturated states at ${formatValue(T)} K lie in IF97 region 3, ${REGION3_SATURATION}`);
  }
  requireQuality(x);
  return saturatedAt(saturationPressureRegion4(T), T, x);
}

/** Saturated liquid (x = 0) at p MPa. */
export function saturatedLiquid(p: number): SteamState {
  return statePX(p, 0);
}

/** Saturated vapour (x = 1) at p MPa. */
export function saturatedVapour(p: number): SteamState {
  return statePX(p, 1);
}

/** Water or steam at (p MPa, h kJ/kg), wet steam included. */
export function statePH(p: number, h: number): SteamState {
  const where = regionOfPH(p, h);
  if (where.region === 4) return saturatedAt(p, where.T, where.x);
  const T = where.region === 1 ? temperaturePHRegion1(p, h) : temperaturePHRegion2(p, h);
  return singlePhaseState(phaseAt(p, T, where.region), where.region);
}

/** Water or steam at (p MPa, s kJ/(kg K)), wet steam included. */
export function statePS(p: number, s: number): SteamState {
  const where = regionOfPS(p, s);
  if (where.region === 4) return saturatedAt(p, where.T, where.x);
  const T = where.region === 1 ? temperaturePSRegion1(p, s) : temperaturePSRegion2(p, s);
  return singlePhaseState(phaseAt(p, T, where.region), where.region);
}

/** Temperature at (p MPa, h kJ/kg), K; the saturation temperature for wet steam. */
export function temperaturePH(p: number, h: number): number {
  const where = regionOfPH(p, h);
  if (where.region === 4) return where.T;
  return where.region === 1 ? temperaturePHRegion1(p, h) : temperaturePHRegion2(p, h);
}

/** Temperature at (p MPa, s kJ/(kg K)), K; the saturation temperature for wet steam. */
export function temperaturePS(p: number, s: number): number {
  const where = regionOfPS(p, s);
  if (where.region === 4) return where.T;
  return where.region === 1 ? temperaturePSRegion1(p, s) : temperaturePSRegion2(p, s);
}
