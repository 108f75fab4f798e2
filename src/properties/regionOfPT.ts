import {
  B23_MAX_TEMPERATURE,
  COVERAGE,
  MAX_PRESSURE,
  MAX_TEMPERATURE,
  MIN_TEMPERATURE,
  REGION1_MAX_TEMPERATURE,
  REGION5_MAX_PRESSURE,
  REGION5_MAX_TEMPERATURE,
} from './constants.js';
import { pressureB23 } from './boundaryB23.js';
import { PropertyRangeError, formatValue, requireFinite } from './PropertyRangeError.js';
import { saturationPressureRegion4 } from './region4.js';

/** Refuses a pressure outside 0 < p <= 100 MPa. */
export function requirePressure(p: number): void {
  requireFinite('pressure', p, 'MPa');
  if (p <= 0) {
    throw new PropertyRangeError(
      `pressure ${formatValue(p)} MPa is not above zero; IF97 needs an absolute pressure above 0 MPa`,
    );
  }
  if (p > MAX_PRESSURE) {
    throw new PropertyRangeError(`pressure ${formatValue(p)} MPa is above the IF97 limit of ${MAX_PRESSURE} MPa`);
  }
}

export function region3Refusal(p: number, second: string): PropertyRangeError {
  return new PropertyRangeError(
    `state at ${formatValue(p)} MPa, ${second} lies in IF97 region 3 (near the critical point), which steamwright does not implement; ${COVERAGE}`,
  );
}

/** Refusal for a state hotter than 1073.15 K; `second` is the other input with its unit. */
export function aboveMaxTemperatureRefusal(p: number, second: string): PropertyRangeError {
  if (p > REGION5_MAX_PRESSURE) {
    return new PropertyRangeError(
      `state at ${formatValue(p)} MPa, ${second} lies above ${MAX_TEMPERATURE} K, where IF97 is valid only up to ${REGION5_MAX_PRESSURE} MPa`,
    );
  }
  return new PropertyRangeError(
    `state at ${formatValue(p)} MPa, ${second} lies in IF97 region 5 (above ${MAX_TEMPERATURE} K), which steamwright does not implement; ${COVERAGE}`,
  );
}

/**
 * The IF97 region of (p MPa, T K), IAPWS R7-97(2012) Figure 1. Exactly on
 * the saturation line (p = psat(T)) the state is taken as liquid, region 1;
 * ask for saturated vapour by quality (statePX(p, 1)) instead.
 */
export function regionOfPT(p: number, T: number): 1 | 2 {
  requirePressure(p);
  requireFinite('temperature', T, 'K');
  if (T < MIN_TEMPERATURE) {
    throw new PropertyRangeError(`temperature ${formatValue(T)} K is below the IF97 limit of ${MIN_TEMPERATURE} K`);
  }
  if (T > MAX_TEMPERATURE) {
    if (T > REGION5_MAX_TEMPERATURE) {
      throw new PropertyRangeError(
        `temperature ${formatValue(T)} K is above the IF97 limit of ${REGION5_MAX_TEMPERATURE} K`,
      );
    }
    throw aboveMaxTemperatureRefusal(p, `${formatValue(T)} K`);
  }
  if (T <= REGION1_MAX_TEMPERATURE) return p >= saturationPressureRegion4(T) ? 1 : 2;
  if (T <= B23_MAX_TEMPERATURE && p > pressureB23(T)) throw region3Refusal(p, `${formatValue(T)} K`);
  return 2;
}
