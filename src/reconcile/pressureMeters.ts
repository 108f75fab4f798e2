// Pressure gauges on headers. A header's pressure is in no mass balance, so a
// gauge is never redundant and is reported as read; where the header has an
// energy balance, the thermometers there take their steam's enthalpy at the
// gauge's pressure instead of the case's, and a gauge far from the case's
// pressure is named in the notes (the case's states are then not the day's).
import type { Issue, Meter, Plant } from '../model/index.js';
import { metersOnUnits } from './powerMeters.js';

export interface PressureMeter {
  meter: Meter;
  /** the header it reads */
  header: string;
  /** the case's pressure of that header, MPa abs */
  casePressure: number;
}

/** Each pressure gauge's header, or a located issue for a gauge that names no header or shares one. */
export function pressureMeters(meters: readonly Meter[], plant: Plant): { metered: PressureMeter[]; issues: Issue[] } {
  const headers = new Map(plant.headers.map((header) => [header.id, header.pressure]));
  const { found, issues } = metersOnUnits(meters, 'pressure', headers, { meter: 'pressure gauge', unit: 'header', expected: 'a header' });
  return { metered: found.map(({ meter, value }) => ({ meter, header: meter.unit, casePressure: value })), issues };
}
