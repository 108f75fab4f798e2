// Which stream each meter measures: a stream at the meter's unit of the kind
// it names, picked out by `to` where the unit has several.
import type { Issue, Meter, MeteredFlow } from '../model/index.js';
import type { NetworkStream, StreamNetwork } from '../plant/index.js';

/** The stream kinds (src/plant/network.ts) each meter word may name. */
const KINDS: Record<MeteredFlow, readonly string[]> = {
  steam: ['steam', 'process', 'heatingSteam', 'letdown'],
  feedwater: ['feedwater'],
  blowdown: ['blowdown'],
  condensate: ['condensate'],
  letdown: ['letdown'],
  spray: ['spray'],
  extraction: ['extraction'],
  exhaust: ['exhaust'],
  vent: ['vent'],
  makeup: ['makeup'],
  heating_steam: ['heatingSteam'],
  flash_vapour: ['flashVapour'],
  flash_liquid: ['flashLiquid'],
};

export interface MeteredStream {
  meter: Meter;
  /** index into the network's streams */
  stream: number;
}

/** Every flow meter's stream, or a located issue for each meter that names none or several. Thermometers, pressure gauges, power and fuel meters are left out (thermometers.ts, pressureMeters.ts, powerMeters.ts). */
export function meterStreams(meters: readonly Meter[], network: StreamNetwork): { metered: MeteredStream[]; issues: Issue[] } {
  const metered: MeteredStream[] = [];
  const issues: Issue[] = [];
  const ends = new Set(network.streams.flatMap((stream) => [stream.from, stream.to]));
  const byStream = new Map<number, Meter>();
  for (const meter of meters) {
    if (meter.measures === 'temperature' || meter.measures === 'pressure' || meter.measures === 'power' || meter.measures === 'fuel') continue; // see thermometers.ts, pressureMeters.ts, powerMeters.ts
    if (!ends.has(meter.unit)) {
      issues.push(meter.issueAt('unit', 'meter-no-stream', `meter ${meter.tag} names "${meter.unit}", which no stream of the plant starts or ends at; expected the id of a unit, header, flash tank or "deaerator"`));
      continue;
    }
    const touching = network.streams.map((stream, index) => ({ stream, index })).filter(({ stream }) => stream.from === meter.unit || stream.to === meter.unit);
    let candidates = touching.filter(({ stream }) => KINDS[meter.measures as MeteredFlow].includes(stream.kind));
    if (meter.to !== null) candidates = candidates.filter(({ stream }) => otherEnd(stream, meter.unit) === meter.to);
    // A unit's steam is its inlet where it has one (a letdown, a turbine, a user), else its outlet (a boiler).
    if (candidates.length > 1 && meter.measures === 'steam') {
      const inlets = candidates.filter(({ stream }) => stream.to === meter.unit);
      if (inlets.length > 0) candidates = inlets;
    }
    if (candidates.length === 0) {
      const kinds = [...new Set(touching.map(({ stream }) => describe(stream, meter.unit)))].join(', ');
      const where = meter.to === null ? '' : ` to or from "${meter.to}"`;
      issues.push(meter.issueAt(meter.to === null ? 'measures' : 'to', 'meter-no-stream', `meter ${meter.tag}: ${meter.unit} has no ${meter.measures} stream${where}; its streams are ${kinds || 'none'}`));
      continue;
    }
    if (candidates.length > 1) {
      const choices = candidates.map(({ stream }) => `"${otherEnd(stream, meter.unit)}"`).join(', ');
      issues.push(meter.issueAt('measures', 'meter-ambiguous', `meter ${meter.tag}: ${meter.unit} has ${candidates.length} ${meter.measures} streams; add "to:" with one of ${choices}`));
      continue;
    }
    const index = candidates[0].index;
    const other = byStream.get(index);
    if (other) {
      issues.push(meter.issueAt('unit', 'meter-same-stream', `meters ${other.tag} and ${meter.tag} both measure ${network.streams[index].id}; keep one, or combine their readings`));
      continue;
    }
    byStream.set(index, meter);
    metered.push({ meter, stream: index });
  }
  return { metered, issues };
}

function otherEnd(stream: NetworkStream, unit: string): string {
  return stream.from === unit ? stream.to : stream.from;
}

function describe(stream: NetworkStream, unit: string): string {
  return stream.from === unit ? `${stream.kind} to ${stream.to}` : `${stream.kind} from ${stream.from}`;
}
