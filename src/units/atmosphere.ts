import { ATMOSPHERE_KPA } from './exactFactors.js';

/** Options shared by parsing and conversion. */
export interface ParseOptions {
  /** Site atmospheric pressure for gauge units, MPa absolute; the standard atmosphere 0.101325 MPa if absent. */
  atmosphericPressure_MPa?: number;
}

export const STANDARD_ATMOSPHERE_MPA = ATMOSPHERE_KPA / 1000;

/** The atmospheric pressure to use, MPa. A bad option is a programmer error: the case loader checks site data. */
export function atmosphericPressureOf(options: ParseOptions | undefined): number {
  const pressure = options?.atmosphericPressure_MPa ?? STANDARD_ATMOSPHERE_MPA;
  if (!Number.isFinite(pressure) || pressure <= 0) {
    throw new RangeError(`atmosphericPressure_MPa must be a positive number of MPa, found ${pressure}`);
  }
  return pressure;
}
