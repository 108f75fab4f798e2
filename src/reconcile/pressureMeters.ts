// Pressure gauges on headers. A header's pressure is in no mass balance, so a
// gauge is never redundant and is reported as read; where the header has an
// energy balance, the thermometers there take their steam's enthalpy at the
// gauge's pressure instead of the case's, and a gauge far from the case's
// pressure is named in the notes (the case's states are then not the day's).
import type { Issue, Meter, Plant } from '../model/index.js';

export interface PressureMeter {
  meter: Meter;
  /** the header it reads */
  header: string;
  /** the case's pressure of that header, MPa abs */
  casePressure: number;
}

/** Each pressure gauge's header, or a located issue for a gauge that names no header or shares one. */
export function pressureMeters(meters: readonly Meter[], plant: Plant): { metered: PressureMeter[]; issues: Issue[] } {
  const metered: PressureMeter[] = [];
  const issues: Issue[] = [];
  const byHeader = new Map<string, Meter>();
  const headers = new Map(plant.headers.map((header) => [header.id, header.pressure]));
  for (const meter of meters) {
    if (meter.measures !== 'pressure') continue;
    const casePressure = headers.get(meter.unit);
    if (casePressure === undefined) {
      issues.push(meter.issueAt('unit', 'meter-no-header', `pressure gauge ${meter.tag} names "${meter.unit}", which is not a header; expected one of ${[...headers.keys()].map((id) => `"${id}"`).join(', ')}`));
      continue;
    }
    if (meter.to !== null) {
      issues.push(meter.issueAt('to', 'meter-pressure-to', `pressure gauge ${meter.tag}: "to" picks a stream, and a gauge reads the header ${meter.unit} itself; leave "to" out`));
      continue;
    }
    const other = byHeader.get(meter.unit);
    if (other) {
      issues.push(meter.issueAt('unit', 'meter-same-header', `pressure gauges ${other.tag} and ${meter.tag} both read header ${meter.unit}; keep one, or combine their readings`));
      continue;
    }
    byHeader.set(meter.unit, meter);
    metered.push({ meter, header: meter.unit, casePressure });
  }
  return { metered, issues };
}
