import {
  CRITICAL_PRESSURE,
  CRITICAL_TEMPERATURE,
  MIN_TEMPERATURE,
  REGION1_MAX_TEMPERATURE,
} from './constants.js';
import { PropertyRangeError, formatValue, requireFinite } from './PropertyRangeError.js';
import { saturationPressureRegion4, saturationTemperatureRegion4 } from './region4.js';

/** Saturation pressure at 273.15 K, MPa (611.213 Pa, IAPWS R7-97(2012) section 8.1). */
export const MIN_SATURATION_PRESSURE = saturationPressureRegion4(MIN_TEMPERATURE);

/**
 * Saturation pressure at 623.15 K, MPa (16.5292 MPa). Above it the
 * saturation line runs through region 3, which is not implemented.
 */
export const REGION3_SATURATION_PRESSURE = saturationPressureRegion4(REGION1_MAX_TEMPERATURE);

/** Saturation pressure at T (K), MPa. IAPWS R7-97(2012) Eq. 30. */
export function saturationPressure(T: number): number {
  requireFinite('temperature', T, 'K');
  if (T < MIN_TEMPERATURE) {
    throw new PropertyRangeError(`temperature ${formatValue(T)} K is below the IF97 limit of ${MIN_TEMPERATURE} K`);
  }
  if (T > CRITICAL_TEMPERATURE) {
    throw new PropertyRangeError(
      `temperature ${formatValue(T)} K is above the critical temperature of ${CRITICAL_TEMPERATURE} K, where no saturation pressure exists`,
    );
  }
  return saturationPressureRegion4(T);
}

/** Saturation temperature at p (MPa), K. IAPWS R7-97(2012) Eq. 31. */
export function saturationTemperature(p: number): number {
  requireFinite('pressure', p, 'MPa');
  if (p < MIN_SATURATION_PRESSURE) {
    throw new PropertyRangeError(
      `pressure ${formatValue(p)} MPa is below the IF97 saturation limit of ${formatValue(MIN_SATURATION_PRESSURE)} MPa (273.15 K)`,
    );
  }
  if (p > CRITICAL_PRESSURE) {
    throw new PropertyRangeError(
      `pressure ${formatValue(p)} MPa is above the critical pressure of ${CRITICAL_PRESSURE} MPa, where no saturation temperature exists`,
    );
  }
  return saturationTemperatureRegion4(p);
}

/** Saturation temperature at p, or null where there is none (below 611.213 Pa, above 22.064 MPa). */
export function saturationTemperatureOrNull(p: number): number | null {
  if (p < MIN_SATURATION_PRESSURE || p > CRITICAL_PRESSURE) return null;
  return saturationTemperatureRegion4(p);
}
