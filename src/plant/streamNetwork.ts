// The plant's streams as a flow network for meter reconciliation: every
// stream one edge, every header, flash tank, the deaerator and every unit that
// conserves mass one node, and the terminals (atmosphere, drain, makeup,
// process) together one environment node that is not balanced.
import type { Plant } from '../model/index.js';
import { buildPass } from './buildPass.js';
import { contributionsOf } from './contributions.js';
import { ATMOSPHERE, DRAIN, MAKEUP, PROCESS, type StreamKind } from './network.js';
import { initialHeaderEnthalpy } from './solvePlant.js';

export const ENVIRONMENT = 'environment';

export interface NetworkStream {
  /** `from->to:kind`, with a count where two streams share it */
  id: string;
  from: string;
  to: string;
  kind: StreamKind;
  /** pressure the stream is at, MPa */
  p: number;
  /** specific enthalpy at the design point, kJ/kg */
  h: number;
  /** heat with no mass (a makeup preheater's duty into the deaerator): in no mass balance, and no meter can name it */
  heatOnly?: boolean;
}

export interface StreamNetwork {
  streams: NetworkStream[];
  /** nodes whose mass balance holds: headers, flash tanks, the deaerator, units */
  nodes: string[];
  /** units whose streams do not conserve mass in the model (taken as open to the environment) */
  openUnits: string[];
  /**
   * Each turbine's power, kW, running, as a linear function of its streams'
   * flows (index into `streams`) at the design point's states: for a power
   * meter. An isentropic stage's drop is taken at the case's header states,
   * so on a header whose temperature floats the relation is the design
   * point's, not the day's.
   */
  power: Map<string, { terms: Map<number, number>; constant: number }>;
  /**
   * Each fired boiler's fuel, kW on its fuel's heating-value basis, against
   * its steam stream's flow (index into `streams`), running: the case's
   * efficiency table at the design point's heat per kg; for a fuel meter.
   */
  fuel: Map<string, { steam: number; fuel: (steam: number) => number }>;
}

const TERMINALS = new Set([ATMOSPHERE, DRAIN, MAKEUP, PROCESS]);

/**
 * Each stream's id, "from->to:kind", with "#2", "#3" ... for a repeat: the
 * same for the network and for a solve's `streams[]`, which list the streams
 * in the same order.
 */
export function streamIds(streams: readonly { from: string; to: string; kind: string }[]): string[] {
  const seen = new Map<string, number>();
  return streams.map((stream) => {
    const base = `${stream.from}->${stream.to}:${stream.kind}`;
    const count = (seen.get(base) ?? 0) + 1;
    seen.set(base, count);
    return count === 1 ? base : `${base}#${count}`;
  });
}

/** The streams of the plant's first pass (no solve needed: the topology does not depend on the point). */
export function streamNetwork(plant: Plant): StreamNetwork {
  const contributions = contributionsOf(plant);
  const pass = buildPass(plant, contributions, { headerEnthalpy: initialHeaderEnthalpy(plant), previous: null, trust: new Map() }, plant.objective);
  const context = pass.context;
  const balance = new Set(context.nodes.keys());
  const ids = streamIds(context.streams);
  const streams: NetworkStream[] = context.streams.map((stream, at) => ({
    id: ids[at],
    from: TERMINALS.has(stream.from) ? ENVIRONMENT : stream.from,
    to: TERMINALS.has(stream.to) ? ENVIRONMENT : stream.to,
    kind: stream.kind,
    p: stream.p,
    h: stream.h,
    ...(stream.flow.terms.size === 0 && stream.flow.constant === 0 ? { heatOnly: true } : {}),
  }));

  // A unit conserves mass when its inflows less its outflows vanish term by term.
  const units = new Set<string>();
  for (const stream of context.streams) for (const end of [stream.from, stream.to]) if (!TERMINALS.has(end) && !balance.has(end)) units.add(end);
  const nodes = [...balance];
  const openUnits: string[] = [];
  for (const unit of units) {
    const net = new Map<unknown, number>();
    let constant = 0;
    let scale = 0;
    for (const stream of context.streams) {
      const sign = stream.to === unit ? 1 : stream.from === unit ? -1 : 0;
      if (sign === 0) continue;
      for (const [variable, coefficient] of stream.flow.terms) {
        net.set(variable, (net.get(variable) ?? 0) + sign * coefficient);
        scale = Math.max(scale, Math.abs(coefficient));
      }
      constant += sign * stream.flow.constant;
      scale = Math.max(scale, Math.abs(stream.flow.constant));
    }
    const residual = Math.max(Math.abs(constant), ...[...net.values()].map(Math.abs));
    if (residual <= 1e-9 * Math.max(1, scale)) nodes.push(unit);
    else openUnits.push(unit);
  }
  const power = new Map<string, { terms: Map<number, number>; constant: number }>();
  for (const unit of contributions) {
    const relation = unit.powerInFlows?.();
    if (!relation) continue;
    const terms = new Map<number, number>();
    for (const { stream, coefficient } of relation.terms) {
      const index = context.streams.indexOf(stream);
      if (index < 0) throw new Error(`unit ${unit.id} gave its power in a stream it did not declare`);
      terms.set(index, (terms.get(index) ?? 0) + coefficient);
    }
    power.set(unit.id, { terms, constant: relation.constant });
  }
  const fuel = new Map<string, { steam: number; fuel: (steam: number) => number }>();
  for (const unit of contributions) {
    const curve = unit.fuelOfSteam?.();
    if (curve) fuel.set(unit.id, { steam: context.streams.indexOf(curve.stream), fuel: curve.fuel });
  }
  return { streams, nodes, openUnits, power, fuel };
}
