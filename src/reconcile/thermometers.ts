// Thermometers in the plant's network: each sets the enthalpy of the streams
// it reads, h = h(p, T) by IF97, and a header's energy balance is written
// where every stream at it has a measured (or exactly known) enthalpy.
//
// - A thermometer on a header reads the header's steam: every stream leaving
//   the header is at that state.
// - A thermometer on a unit with `to: <header>` reads the unit's stream into
//   that header (a boiler's steam, a letdown's outlet, a turbine exhaust).
//
// A header's balance is written only when the header has a thermometer and
// every stream into it has one too, or is saturated vapour from a flash tank
// (its enthalpy is the saturated vapour's at the tank pressure, exactly).
// A model's design enthalpy (a turbine exhaust at its rated efficiency) is
// not a measurement: an energy balance built on it would move good meters.
import type { Issue, Meter, Plant } from '../model/index.js';
import type { StreamNetwork } from '../plant/index.js';

export interface Thermometer {
  meter: Meter;
  /** the header it reads, or the header its stream flows into */
  header: string;
  /** pressure of the point, MPa */
  p: number;
  /** indices of the network streams whose enthalpy follows it */
  streams: number[];
}

export interface ThermometerPlan {
  thermometers: Thermometer[];
  /** headers whose energy balance can be written */
  energyHeaders: string[];
  /** why a header with a thermometer has no energy balance */
  notes: string[];
  issues: Issue[];
}

/** Streams whose enthalpy the model knows exactly without a thermometer. */
const EXACT_KINDS = new Set(['flashVapour']);

export function planThermometers(meters: readonly Meter[], network: StreamNetwork, plant: Plant): ThermometerPlan {
  const headers = new Map(plant.headers.map((header) => [header.id, header]));
  const thermometers: Thermometer[] = [];
  const issues: Issue[] = [];
  const taken = new Map<number, string>(); // stream -> tag
  for (const meter of meters) {
    if (meter.measures !== 'temperature') continue;
    const header = headers.get(meter.unit);
    let streams: number[];
    let at: string;
    if (header) {
      if (meter.to !== null) {
        issues.push(meter.issueAt('to', 'thermometer-to', `thermometer ${meter.tag} reads header ${meter.unit}: leave "to" out (it is for a unit's stream into a header)`));
        continue;
      }
      at = header.id;
      streams = network.streams.flatMap((stream, index) => (stream.from === header.id ? [index] : []));
    } else {
      if (meter.to === null || !headers.has(meter.to)) {
        const into = [...new Set(network.streams.filter((stream) => stream.from === meter.unit && headers.has(stream.to)).map((stream) => `"${stream.to}"`))];
        issues.push(meter.issueAt(meter.to === null ? 'unit' : 'to', 'thermometer-no-stream', `thermometer ${meter.tag}: expected a header id in "unit", or a unit with "to:" naming the header its stream enters${into.length > 0 ? ` (${meter.unit} feeds ${into.join(', ')})` : `; ${meter.unit} feeds no header`}`));
        continue;
      }
      at = meter.to;
      streams = network.streams.flatMap((stream, index) => (stream.from === meter.unit && stream.to === meter.to ? [index] : []));
      if (streams.length === 0) {
        issues.push(meter.issueAt('to', 'thermometer-no-stream', `thermometer ${meter.tag}: ${meter.unit} has no stream into ${meter.to}`));
        continue;
      }
    }
    const clash = streams.find((index) => taken.has(index));
    if (clash !== undefined) {
      issues.push(meter.issueAt('unit', 'meter-same-stream', `thermometers ${taken.get(clash)} and ${meter.tag} both read ${network.streams[clash].id}; keep one`));
      continue;
    }
    for (const index of streams) taken.set(index, meter.tag);
    thermometers.push({ meter, header: at, p: headers.get(at)!.pressure, streams });
  }

  const energyHeaders: string[] = [];
  const notes: string[] = [];
  const measuredStream = new Set(thermometers.flatMap((thermometer) => thermometer.streams));
  for (const header of plant.headers) {
    if (!thermometers.some((thermometer) => thermometer.header === header.id && thermometer.meter.unit === header.id)) continue;
    const unknown = network.streams.filter((stream, index) => stream.to === header.id && !measuredStream.has(index) && !EXACT_KINDS.has(stream.kind));
    if (unknown.length === 0) energyHeaders.push(header.id);
    else notes.push(`${header.id}: no energy balance, as ${unknown.map((stream) => stream.id).join(', ')} ${unknown.length === 1 ? 'has' : 'have'} no thermometer; its thermometer is not used`);
  }
  return { thermometers, energyHeaders, notes, issues };
}
