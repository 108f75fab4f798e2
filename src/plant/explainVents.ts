// Why each vented flow has no better use, read from the solved plant: what
// flows into the venting header that cannot be turned down (and the limit that
// holds it), and what its outlets are doing. For the deaerator's vent above its
// design share: the returns that bring more heat than the feedwater can take.
// Plain data, and one sentence each whose flows the caller's formatter writes
// in the case's units.
import type { UnitReport } from './contribution.js';
import { ATMOSPHERE, MAKEUP } from './network.js';

/** Flows below this, kg/s, are solver round-off. */
const TINY = 1e-6;

/** How the sentence writes figures: the case's unit system. */
export interface VentWords {
  flow(kg_s: number): string;
  temperature(K: number): string;
}

/** The parts of a solved stream the explanation reads. */
export interface SolvedStream {
  from: string;
  to: string;
  kind: string;
  mass_kg_s: number;
  h_kJ_kg: number;
  T_K: number | null;
}

export interface VentInflow {
  /** the unit (or, for spray, the header) the flow comes from */
  from: string;
  /** what it is: "steam", "waste-heat steam", "bought steam", "exhaust", "extraction", "letdown", "spray water", "flash vapour", or a return's kind */
  what: string;
  flow_kg_s: number;
  /** why it cannot be turned down; null where it could be */
  held: string | null;
  /** a letdown's upstream header; a return's temperature */
  upstream?: string;
  spray_kg_s?: number;
  T_K?: number | null;
}

export interface VentOutlet {
  /** "users", "deaerator", or the letdown or turbine id */
  to: string;
  what: 'users' | 'deaerator' | 'letdown' | 'turbine';
  flow_kg_s: number;
  /** the limit or state that stops it taking more, e.g. "closed", "at capacity", "stopped" */
  state: string | null;
  /** a letdown's lower header */
  toHeader?: string;
}

export interface VentExplanation {
  /** the header, "deaerator" or the flash tank that vents */
  where: string;
  kind: 'header' | 'deaerator excess' | 'flash vapour';
  /** the flow this sentence explains, kg/s (for the deaerator, only what is above its design share) */
  flow_kg_s: number;
  inflows: VentInflow[];
  outlets: VentOutlet[];
  reason: string;
}

export interface VentInputs {
  headers: readonly { id: string; vent_kg_s: number }[];
  streams: readonly SolvedStream[];
  units: readonly UnitReport[];
}

export function explainVents(inputs: VentInputs, words: VentWords): VentExplanation[] {
  const plant = new SolvedPlant(inputs);
  const explained: VentExplanation[] = [];
  for (const header of inputs.headers) {
    if (header.vent_kg_s > TINY) explained.push(plant.header(header.id, header.vent_kg_s, words));
  }
  for (const stream of inputs.streams) {
    if (stream.to === ATMOSPHERE && stream.kind === 'flashVapour' && stream.mass_kg_s > TINY) explained.push(plant.flashVapour(stream, words));
  }
  const deaerator = plant.unit('deaerator');
  const excess = numberOf(deaerator, 'excess_vent_kg_s');
  if (excess > TINY) explained.push(plant.deaeratorExcess(excess, words));
  return explained;
}

/** Lookups over one solved plant. */
class SolvedPlant {
  private readonly byId: Map<string, UnitReport>;
  /** headers with a vent (whether or not it is open) */
  private readonly canVent: Set<string>;
  private readonly venting: Set<string>;

  constructor(private readonly inputs: VentInputs) {
    this.byId = new Map(inputs.units.map((unit) => [unit.id, unit]));
    this.canVent = new Set(inputs.streams.filter((stream) => stream.to === ATMOSPHERE && stream.kind === 'vent').map((stream) => stream.from));
    this.venting = new Set(inputs.headers.filter((header) => header.vent_kg_s > TINY).map((header) => header.id));
  }

  unit(id: string): UnitReport | undefined {
    return this.byId.get(id);
  }

  header(id: string, vent: number, words: VentWords): VentExplanation {
    const inflows = this.inflows(id);
    const outlets = this.outlets(id);
    const { flow } = words;
    const takers = outlets.filter((outlet) => outlet.flow_kg_s > TINY);
    const takerWords = takers.map((outlet) => `${outlet.what === 'users' ? 'its users' : outlet.what === 'deaerator' ? 'the deaerator' : outlet.to} (${flow(outlet.flow_kg_s)})`);
    const singular = takers.length === 1 && takers[0].what !== 'users';
    const opening = takers.length > 0 ? `${id}: ${flow(vent)} more steam than ${list(takerWords)} ${singular ? 'takes' : 'take'}` : `${id}: ${flow(vent)} comes in and nothing draws on it`;
    const held = inflows.filter((inflow) => inflow.held !== null);
    const free = inflows.filter((inflow) => inflow.held === null);
    const heldPhrase = held.length > 0 ? `${list(held.map((inflow) => `${describe(id, inflow)} (${flow(inflow.flow_kg_s)}${spray(inflow, words)}, ${inflow.held})`))} cannot be turned down` : 'no inflow sits at a limit: venting costs less than turning one down';
    const freePhrase = free.length > 0 ? `; also in: ${list(free.map((inflow) => `${describe(id, inflow)} ${flow(inflow.flow_kg_s)}`))}` : '';
    const reason = `${opening}; ${heldPhrase}${freePhrase}${this.upstreamPhrase(id, held, words)}; ${this.outletPhrase(id, outlets)}.`;
    return { where: id, kind: 'header', flow_kg_s: vent, inflows, outlets, reason };
  }

  flashVapour(stream: SolvedStream, words: VentWords): VentExplanation {
    const inflows = this.inputs.streams
      .filter((candidate) => candidate.to === stream.from && candidate.mass_kg_s > TINY)
      .map((candidate) => ({ from: candidate.from, what: kindWords(candidate.kind), flow_kg_s: candidate.mass_kg_s, held: 'returned hot', T_K: candidate.T_K }));
    const reason = `${stream.from}: ${words.flow(stream.mass_kg_s)} of flash vapour goes to atmosphere because the case pipes it there; piping it to a header at or below its pressure would recover it.`;
    return { where: stream.from, kind: 'flash vapour', flow_kg_s: stream.mass_kg_s, inflows, outlets: [], reason };
  }

  /**
   * The deaerator vents above its design share when what comes into it brings
   * more heat than the feedwater can take: returns hotter than the feedwater,
   * or heating steam from a header that has no other way to shed its surplus.
   */
  deaeratorExcess(excess: number, words: VentWords): VentExplanation {
    const { flow, temperature } = words;
    const streams = this.inputs.streams;
    const feedwater = streams.find((stream) => stream.from === 'deaerator' && (stream.kind === 'feedwater' || stream.kind === 'spray'));
    const feedwaterH = feedwater?.h_kJ_kg ?? -Infinity;
    const returns = group(streams.filter((stream) => stream.to === 'deaerator' && stream.from !== MAKEUP && stream.kind !== 'heatingSteam' && stream.mass_kg_s > TINY));
    const hot = returns.filter((stream) => stream.h_kJ_kg > feedwaterH + 1e-6);
    const inflows: VentInflow[] = hot.map((stream) => ({ from: stream.from, what: kindWords(stream.kind), flow_kg_s: stream.mass_kg_s, held: 'hotter than the feedwater', T_K: stream.T_K }));
    const makeup = streams.filter((stream) => stream.from === MAKEUP && stream.to === 'deaerator').reduce((total, stream) => total + stream.mass_kg_s, 0);
    const heating = streams.filter((stream) => stream.to === 'deaerator' && stream.kind === 'heatingSteam');
    const heatingFlow = heating.reduce((total, stream) => total + stream.mass_kg_s, 0);
    const parts: string[] = [];
    if (hot.length > 0) {
      const named = list(hot.map((stream) => `${stream.from}'s ${kindWords(stream.kind)} (${flow(stream.mass_kg_s)}${stream.T_K !== null ? ` at ${temperature(stream.T_K)}` : ''})`));
      const fw = feedwater && feedwater.T_K !== null ? ` (${temperature(feedwater.T_K)})` : '';
      parts.push(`${named} ${hot.length > 1 ? 'come' : 'comes'} back hotter than the feedwater${fw} and ${hot.length > 1 ? 'bring' : 'brings'} more heat than the makeup (${flow(makeup)}) and cooler returns can take`);
    }
    const outlets: VentOutlet[] = [];
    for (const stream of heating) {
      if (stream.mass_kg_s > TINY) {
        outlets.push({ to: stream.from, what: 'deaerator', flow_kg_s: stream.mass_kg_s, state: null });
        if (!this.canVent.has(stream.from)) {
          // A header that may not vent sheds its surplus through the deaerator.
          const held = this.inflows(stream.from).filter((inflow) => inflow.held !== null);
          const why = held.length > 0 ? `, where ${list(held.map((inflow) => `${describe(stream.from, inflow)} (${flow(inflow.flow_kg_s)}, ${inflow.held})`))} cannot be turned down` : '';
          parts.push(`it draws ${flow(stream.mass_kg_s)} of heating steam from ${stream.from}, which may not vent, so ${stream.from}'s surplus leaves here${why}`);
        } else {
          parts.push(`it still draws ${flow(stream.mass_kg_s)} of heating steam from ${stream.from}`);
        }
      }
    }
    if (heatingFlow <= TINY && hot.length > 0) parts[parts.length - 1] += ', with no heating steam drawn';
    if (parts.length === 0) parts.push('what comes in brings more heat than the feedwater can take');
    const reason = `deaerator: ${flow(excess)} vented above its design share: ${parts.join('; ')}.`;
    return { where: 'deaerator', kind: 'deaerator excess', flow_kg_s: excess, inflows, outlets, reason };
  }

  /**
   * One level up: where a letdown brings the surplus of a header that may not
   * vent, what holds that header's own inflows (its spray, a unit at a minimum).
   */
  private upstreamPhrase(headerId: string, held: readonly VentInflow[], words: VentWords): string {
    const phrases: string[] = [];
    for (const upstream of new Set(held.filter((inflow) => inflow.what === 'letdown' && inflow.upstream && !this.canVent.has(inflow.upstream)).map((inflow) => inflow.upstream!))) {
      if (upstream === headerId) continue;
      const above = this.inflows(upstream).filter((inflow) => inflow.held !== null && inflow.what !== 'letdown');
      if (above.length > 0) phrases.push(`; at ${upstream}, ${list(above.map((inflow) => `${describe(upstream, inflow)} (${words.flow(inflow.flow_kg_s)}, ${inflow.held})`))} cannot be turned down either`);
    }
    return phrases.join('');
  }

  /** Inflows of a header, one per source and kind, each with what holds it. */
  private inflows(headerId: string): VentInflow[] {
    const into = group(this.inputs.streams.filter((stream) => stream.to === headerId && stream.mass_kg_s > TINY));
    return into.map((stream) => this.classify(headerId, stream));
  }

  private classify(headerId: string, stream: SolvedStream): VentInflow {
    const base = { from: stream.from, flow_kg_s: stream.mass_kg_s };
    if (stream.kind === 'spray') return { ...base, from: headerId, what: 'spray water', held: `holding ${headerId} at its set temperature` };
    const unit = this.byId.get(stream.from);
    const limit = (pattern: RegExp): string | null => unit?.binding.find((entry) => pattern.test(entry)) ?? null;
    switch (unit?.kind) {
      case 'boiler':
        return { ...base, what: 'steam', held: limit(/at minimum/) };
      case 'heatRecoveryBoiler':
        // Waste-heat steam is made by the process; only duct firing above it can be turned down.
        return { ...base, what: 'waste-heat steam', held: numberOf(unit, 'fired_steam_kg_s') > TINY ? null : limit(/minimum|fixed/) };
      case 'steamImport':
        return { ...base, what: 'bought steam', held: limit(/minimum/) };
      case 'turbine':
        return { ...base, what: stream.kind === 'extraction' ? 'extraction' : 'exhaust', held: this.turbineHeld(unit) };
      case 'letdown': {
        const upstream = this.inputs.streams.find((candidate) => candidate.to === stream.from && candidate.kind === 'letdown')?.from;
        const sprayFlow = numberOf(unit, 'spray_kg_s');
        const held = upstream === undefined ? null : !this.canVent.has(upstream) ? `${upstream} may not vent its own surplus` : this.venting.has(upstream) ? `${upstream} vents too` : null;
        return { ...base, what: 'letdown', held, ...(upstream ? { upstream } : {}), ...(sprayFlow > TINY ? { spray_kg_s: sprayFlow } : {}) };
      }
      case 'flashTank':
        return { ...base, what: 'flash vapour', held: 'flashed from hot condensate or blowdown' };
      default:
        return { ...base, what: kindWords(stream.kind), held: null };
    }
  }

  /** Why a turbine passes steam into a header that vents. */
  private turbineHeld(unit: UnitReport): string | null {
    const minimums = unit.binding.filter((entry) => /at minimum/.test(entry));
    if (minimums.length > 0) return minimums.join(', ');
    const machine = unit.values.drives_machine;
    if (typeof machine === 'string') return `driving ${machine}`;
    const grid = this.byId.get('grid');
    if (grid?.binding.includes('import at its limit') && numberOf(unit, 'power_kW') > 0) return 'its power needed, with the import at its limit';
    if (numberOf(unit, 'power_kW') > 0) return 'run for its power';
    return null;
  }

  /** Where steam can leave a header other than its vent. */
  private outlets(headerId: string): VentOutlet[] {
    const outlets: VentOutlet[] = [];
    let users = 0;
    let hasUsers = false;
    let deaerator = 0;
    let hasDeaerator = false;
    for (const stream of this.inputs.streams) {
      if (stream.from !== headerId || stream.to === ATMOSPHERE) continue;
      const unit = this.byId.get(stream.to);
      if (stream.kind === 'process') {
        users += stream.mass_kg_s;
        hasUsers = true;
      } else if (stream.kind === 'heatingSteam') {
        deaerator += stream.mass_kg_s;
        hasDeaerator = true;
      } else if (unit?.kind === 'letdown') {
        const toHeader = this.inputs.streams.find((candidate) => candidate.from === unit.id && candidate.kind === 'letdown')?.to;
        const state = unit.binding.includes('at capacity') ? 'at capacity' : stream.mass_kg_s <= TINY ? 'closed' : null;
        outlets.push({ to: unit.id, what: 'letdown', flow_kg_s: stream.mass_kg_s, state, ...(toHeader ? { toHeader } : {}) });
      } else if (unit?.kind === 'turbine') {
        const state = unit.binding.length > 0 ? unit.binding.join(', ') : stream.mass_kg_s <= TINY ? 'idle' : null;
        outlets.push({ to: unit.id, what: 'turbine', flow_kg_s: stream.mass_kg_s, state });
      }
    }
    if (hasDeaerator) outlets.unshift({ to: 'deaerator', what: 'deaerator', flow_kg_s: deaerator, state: null });
    if (hasUsers) outlets.unshift({ to: 'users', what: 'users', flow_kg_s: users, state: null });
    return outlets;
  }

  private outletPhrase(headerId: string, outlets: VentOutlet[]): string {
    const down = outlets.filter((outlet) => outlet.what === 'letdown' || outlet.what === 'turbine');
    if (down.length === 0) return `nothing takes steam from ${headerId} to a lower pressure`;
    return list(
      down.map((outlet) => {
        if (outlet.what === 'letdown') {
          const lower = outlet.toHeader ?? 'the header below';
          const also = this.venting.has(lower) ? `, and ${lower} vents too` : '';
          if (outlet.state === 'closed') return `letdown ${outlet.to} to ${lower} is closed${also || `: ${lower} needs no more`}`;
          if (outlet.state) return `letdown ${outlet.to} to ${lower} is ${outlet.state}`;
          return `letdown ${outlet.to} passes only what ${lower} can use${also}`;
        }
        if (outlet.state === 'idle') return `${outlet.to} is idle`;
        if (outlet.state) return `${outlet.to} is ${outlet.state}`;
        return `${outlet.to} passes only what its exhausts can use`;
      }),
    );
  }
}

/** Streams of one source and kind added up; the enthalpy is mass weighted, the temperature the first's. */
function group(streams: readonly SolvedStream[]): SolvedStream[] {
  const byKey = new Map<string, SolvedStream & { energy: number }>();
  for (const stream of streams) {
    const key = `${stream.from}\u0000${stream.kind}`;
    const found = byKey.get(key);
    if (found) {
      found.mass_kg_s += stream.mass_kg_s;
      found.energy += stream.mass_kg_s * stream.h_kJ_kg;
      found.h_kJ_kg = found.mass_kg_s > 0 ? found.energy / found.mass_kg_s : found.h_kJ_kg;
    } else {
      byKey.set(key, { ...stream, energy: stream.mass_kg_s * stream.h_kJ_kg });
    }
  }
  return [...byKey.values()].map(({ energy: _energy, ...stream }) => stream);
}

function describe(headerId: string, inflow: VentInflow): string {
  if (inflow.what === 'spray water') return `${headerId}'s spray water`;
  if (inflow.what === 'flash vapour') return `flash vapour from ${inflow.from}`;
  if (inflow.what === 'letdown') return `letdown ${inflow.from}${inflow.upstream ? ` from ${inflow.upstream}` : ''}`;
  return `${inflow.from}'s ${inflow.what}`;
}

function spray(inflow: VentInflow, words: VentWords): string {
  return inflow.spray_kg_s ? ` with ${words.flow(inflow.spray_kg_s)} of desuperheater spray` : '';
}

function numberOf(unit: UnitReport | undefined, key: string): number {
  const value = unit?.values[key];
  return typeof value === 'number' ? value : 0;
}

/** "flashLiquid" -> "flash liquid". */
function kindWords(kind: string): string {
  return kind.replace(/([a-z])([A-Z])/g, (_, lower: string, upper: string) => `${lower} ${upper.toLowerCase()}`);
}

/** "a", "a and b", "a, b and c". */
function list(items: readonly string[]): string {
  if (items.length <= 1) return items[0] ?? '';
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
