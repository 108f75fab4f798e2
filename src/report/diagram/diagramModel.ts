// What the balance diagram shows, before any geometry: headers by pressure,
// the items that feed them from above, hang below them or cross between
// them, and the nodes of the water side at the bottom. Every figure is
// already formatted in the case's units, so the layout only measures text.
import type { PlantResult, StreamResult } from '../../plant/index.js';
import type { UnitReport } from '../../plant/index.js';
import type { DisplayFormat } from '../displayFormat.js';

export type Glyph = 'boiler' | 'heatRecovery' | 'import' | 'flashVapour' | 'spray' | 'user' | 'heatingSteam' | 'vent' | 'turbine' | 'letdown' | 'other';

export interface DiagramHeader {
  id: string;
  /** label lines: title, state, flow and marginal value */
  lines: string[];
  throughput_kg_s: number;
}

/** Where an item sits: feeding a header from above, hanging below one, or crossing down between headers. */
export type Placement =
  | { kind: 'feeds'; header: number }
  | { kind: 'hangs'; header: number }
  | { kind: 'crosses'; from: number; to: number[] };

export interface DiagramItem {
  /** unit id, or a made-up id such as "lp.vent" for things that are not units */
  id: string;
  glyph: Glyph;
  placement: Placement;
  /** main flow drawn by the item's line, kg/s */
  flow_kg_s: number;
  /** flows into each exit header of a crossing, in the order of placement.to */
  exitFlows_kg_s: number[];
  lines: string[];
  /** drawn as a warning: a vent */
  alarm: boolean;
  /** lines drawn in the warning style when the item itself is not one (a note added to it, such as a suspect meter) */
  alarmLines?: number[];
  /** a unit that is off or carries no flow: drawn greyed */
  idle?: boolean;
  /** fed from the feedwater rail: its column is kept clear up to the top */
  feedwater?: boolean;
  /** a turbine's exhaust to its condenser, kg/s: its line runs on down to the water side */
  toCondenser_kg_s?: number;
}

/** What an engineering drawing carries in its corner: what, which case, when, by what. */
export interface TitleBlock {
  /** e.g. "scenario winter: Winter, full production" or "plant as written" */
  scenario?: string;
  /** the day it was drawn, YYYY-MM-DD */
  date?: string;
  /** tool version */
  version?: string;
  /** short hash of the case file */
  caseHash?: string;
}

export interface BottomNode {
  id: string;
  kind: 'deaerator' | 'flashTank' | 'machine' | 'power' | 'condensate' | 'condenser';
  lines: string[];
  /** lines of the node that are vents (drawn in the vent style) */
  alarmLines: number[];
}

export interface DiagramModel {
  title: string;
  /** the title block's lines, or null when none was asked for */
  titleBlock: string[] | null;
  /** feedwater from the deaerator, and the items (by id) it feeds: boilers and spray */
  feedwater: { flow_kg_s: number; to: string[]; label: string } | null;
  headers: DiagramHeader[];
  items: DiagramItem[];
  bottom: BottomNode[];
  /** largest flow anywhere, kg/s: the scale of line widths */
  maxFlow_kg_s: number;
}

const SOURCE_GLYPHS: Record<string, Glyph> = { boiler: 'boiler', heatRecoveryBoiler: 'heatRecovery', steamImport: 'import' };
const TINY = 1e-7;

/** The diagram's content from a solved plant. `names` maps header ids to their display names. */
export function diagramModel(result: PlantResult, format: DisplayFormat, block: TitleBlock | null = null): DiagramModel {
  const headers = [...result.headers].sort((a, b) => b.pressure_MPa - a.pressure_MPa);
  const headerIndex = new Map(headers.map((header, index) => [header.id, index]));
  const units = new Map(result.units.map((unit) => [unit.id, unit]));
  const kindOf = (id: string): string => units.get(id)?.kind ?? id;
  const isCrossing = (id: string): boolean => kindOf(id) === 'turbine' || kindOf(id) === 'letdown';
  const flowSum = (streams: StreamResult[]): number => streams.reduce((total, stream) => total + stream.mass_kg_s, 0);
  const { flow } = format;

  const diagramHeaders: DiagramHeader[] = headers.map((header) => ({
    id: header.id,
    lines: [
      header.name && header.name !== header.id ? `${header.id} · ${header.name}` : header.id,
      `${format.pressure(header.pressure_MPa)} · ${format.temperature(header.T_K)}`,
      `flow ${flow(header.inflow_kg_s)}`,
      `steam value ${format.valuePerMass(header.marginal_value_per_t, result.marginal_value_unit)}`,
    ],
    throughput_kg_s: header.inflow_kg_s,
  }));

  const items: DiagramItem[] = [];
  headers.forEach((header, index) => {
    // Inflows not from a turbine or letdown: sources, flash vapour, spray water.
    const feeders = groupBy(result.streams.filter((stream) => stream.to === header.id && !isCrossing(stream.from)), (stream) => stream.from);
    for (const [from, streams] of feeders) {
      const unit = units.get(from);
      const mass = flowSum(streams);
      const glyph: Glyph = SOURCE_GLYPHS[kindOf(from)] ?? (kindOf(from) === 'flashTank' ? 'flashVapour' : from === 'deaerator' ? 'spray' : 'other');
      items.push({
        // A flash tank whose vapour feeds a header is drawn here, once, with its liquid side in its label.
        id: glyph === 'spray' ? `${header.id}.spray` : from,
        glyph,
        placement: { kind: 'feeds', header: index },
        flow_kg_s: mass,
        exitFlows_kg_s: [],
        lines: glyph === 'flashVapour' ? flashLines(from, unit, result, format) : feederLines(from, glyph, mass, unit, format),
        alarm: false,
        idle: unit !== undefined && (unit.values.running === false || mass <= TINY),
      });
    }
    // Outflows not to a turbine or letdown: users, deaerator steam, vents.
    const draws = groupBy(result.streams.filter((stream) => stream.from === header.id && !isCrossing(stream.to)), (stream) => stream.to);
    for (const [to, streams] of draws) {
      const mass = flowSum(streams);
      if (to === 'atmosphere') {
        if (mass <= TINY) continue;
        items.push({ id: `${header.id}.vent`, glyph: 'vent', placement: { kind: 'hangs', header: index }, flow_kg_s: mass, exitFlows_kg_s: [], lines: ['VENT', `${flow(mass)} to air`], alarm: true });
        continue;
      }
      const unit = units.get(to);
      if (unit?.kind === 'user') {
        items.push({
          id: to,
          glyph: 'user',
          placement: { kind: 'hangs', header: index },
          flow_kg_s: mass,
          exitFlows_kg_s: [],
          lines: [to, `${flow(mass)} · ${format.heatRate(num(unit, 'heat_kW'))}`, `returned ${flow(num(unit, 'condensate_returned_kg_s'))}`],
          alarm: false,
          idle: mass <= TINY,
        });
      } else if (to === 'deaerator') {
        items.push({ id: `${header.id}.deaerator`, glyph: 'heatingSteam', placement: { kind: 'hangs', header: index }, flow_kg_s: mass, exitFlows_kg_s: [], lines: ['to deaerator', flow(mass)], alarm: false });
      } else {
        items.push({ id: `${header.id}.${to}`, glyph: 'other', placement: { kind: 'hangs', header: index }, flow_kg_s: mass, exitFlows_kg_s: [], lines: [`to ${to}`, flow(mass)], alarm: false });
      }
    }
  });

  // Turbines and letdowns, in the case's order.
  for (const unit of result.units.filter((candidate) => candidate.kind === 'turbine' || candidate.kind === 'letdown')) {
    const inlet = result.streams.find((stream) => stream.to === unit.id && headerIndex.has(stream.from));
    if (!inlet) continue;
    const exits = groupBy(result.streams.filter((stream) => stream.from === unit.id), (stream) => stream.to);
    const to: number[] = [];
    const exitFlows: number[] = [];
    const exitLines: string[] = [];
    let condensed = 0;
    for (const [target, streams] of exits) {
      const mass = flowSum(streams);
      const index = headerIndex.get(target);
      if (index !== undefined) {
        to.push(index);
        exitFlows.push(mass);
        exitLines.push(`→ ${target} ${flow(mass)}`);
      } else {
        exitLines.push(`→ condenser ${flow(mass)}`);
        condensed += mass;
      }
    }
    const order = to.map((_, position) => position).sort((a, b) => to[a] - to[b]);
    const from = headerIndex.get(inlet.from) as number;
    const inletFlow = inlet.mass_kg_s;
    const off = unit.values.running === false;
    const first =
      unit.kind === 'turbine'
        ? off ? 'off' : `${flow(inletFlow)} in · ${format.power(num(unit, 'power_kW'))}`
        : num(unit, 'spray_kg_s') > TINY ? `${flow(inletFlow)} + spray ${flow(num(unit, 'spray_kg_s'))}` : `${flow(inletFlow)}`;
    items.push({
      id: unit.id,
      glyph: unit.kind === 'turbine' ? 'turbine' : 'letdown',
      placement: { kind: 'crosses', from, to: order.map((position) => to[position]) },
      flow_kg_s: inletFlow,
      exitFlows_kg_s: order.map((position) => exitFlows[position]),
      lines: [unit.id, first, ...exitLines],
      alarm: false,
      idle: off || inletFlow <= TINY,
      ...(unit.kind === 'turbine' && exits.size > to.length ? { toCondenser_kg_s: condensed } : {}),
    });
  }

  const drawn = new Set(items.map((item) => item.id));
  const bottom = bottomNodes(result, format).filter((node) => node.kind !== 'flashTank' || !drawn.has(node.id));
  const condensers = items.filter((item) => item.toCondenser_kg_s !== undefined);
  if (condensers.length > 0) {
    const condensateTo = (id: string): string => result.streams.find((stream) => stream.from === id && stream.kind === 'condensate')?.to ?? 'drain';
    const lines = ['condenser', ...condensers.map((item) => `${item.id} ${flow(item.toCondenser_kg_s ?? 0)} → ${condensateTo(item.id)}`)];
    bottom.splice(1, 0, { id: 'condenser', kind: 'condenser', lines, alarmLines: [] });
  }
  // Feedwater: from the deaerator up to every boiler and the spray it feeds.
  const feedStreams = result.streams.filter((stream) => stream.from === 'deaerator' && stream.kind === 'feedwater' && stream.mass_kg_s > TINY);
  const fed = [...new Set(feedStreams.map((stream) => stream.to))].filter((id) => drawn.has(id));
  const feedFlow = sum(feedStreams);
  for (const item of items) if (fed.includes(item.id)) item.feedwater = true;
  const feedwater = fed.length > 0 ? { flow_kg_s: feedFlow, to: fed, label: `boiler feedwater ${flow(feedFlow)}` } : null;
  const model: DiagramModel = { title: result.plant, titleBlock: block ? titleBlockLines(result, format, block) : null, feedwater, headers: diagramHeaders, items, bottom, maxFlow_kg_s: maxFlow(result) };
  return withDegreeSigns(model);
}

function titleBlockLines(result: PlantResult, format: DisplayFormat, block: TitleBlock): string[] {
  const objective: Record<string, string> = { minimumCost: 'minimum cost', minimumFuel: 'minimum fuel', maximumPower: 'maximum on-site power', minimumCo2: 'minimum CO2' };
  return [
    result.plant,
    block.scenario ?? 'plant as written',
    `objective: ${objective[result.objective] ?? result.objective} · ${format.money(result.totals.cost_per_h)} per hour`,
    [block.date ? `drawn ${block.date}` : null, `steamwright ${block.version ?? ''}`.trim(), block.caseHash ? `case ${block.caseHash}` : null].filter((part) => part !== null).join(' · '),
  ];
}

/** Degrees as a drawing writes them: °C and °F. */
function withDegreeSigns(model: DiagramModel): DiagramModel {
  const degrees = (lines: string[]): string[] => lines.map((line) => line.replace(/ deg([CF])\b/g, ' °$1'));
  return {
    ...model,
    headers: model.headers.map((header) => ({ ...header, lines: degrees(header.lines) })),
    items: model.items.map((item) => ({ ...item, lines: degrees(item.lines) })),
    bottom: model.bottom.map((node) => ({ ...node, lines: degrees(node.lines) })),
    titleBlock: model.titleBlock ? degrees(model.titleBlock) : null,
  };
}

/** A flash tank drawn where its vapour feeds a header: what comes in, and where vapour and liquid go. */
function flashLines(id: string, unit: UnitReport | undefined, result: PlantResult, format: DisplayFormat): string[] {
  const { flow } = format;
  const vapour = result.streams.find((stream) => stream.from === id && stream.kind === 'flashVapour');
  const liquid = result.streams.find((stream) => stream.from === id && stream.kind === 'flashLiquid');
  return [id, `in ${flow(num(unit, 'inflow_kg_s'))}`, `vapour → ${vapour?.to ?? '-'} ${flow(num(unit, 'vapour_kg_s'))}`, `liquid → ${liquid?.to ?? '-'} ${flow(num(unit, 'liquid_kg_s'))}`];
}

function feederLines(from: string, glyph: Glyph, mass: number, unit: UnitReport | undefined, format: DisplayFormat): string[] {
  if (glyph === 'spray') return ['spray water', format.flow(mass)];
  const lines = [from];
  if (unit?.values.running === false) lines.push('off');
  else lines.push(format.flow(mass));
  const fuel = num(unit, 'fuel_kW');
  if (fuel > TINY) lines.push(`fuel ${format.fuelRate(fuel)}`);
  return lines;
}

function bottomNodes(result: PlantResult, format: DisplayFormat): BottomNode[] {
  const { flow } = format;
  const nodes: BottomNode[] = [];
  const returned = result.streams.filter((stream) => stream.kind === 'condensate' && stream.to !== 'drain');
  const drained = result.streams.filter((stream) => stream.to === 'drain');
  nodes.push({
    id: 'condensate',
    kind: 'condensate',
    lines: ['condensate return', `back ${flow(sum(returned))}`, `to drain ${flow(sum(drained))}`],
    alarmLines: [],
  });
  for (const unit of result.units) {
    if (unit.kind === 'deaerator') {
      const vent = num(unit, 'vent_kg_s');
      const lines = ['deaerator', `feedwater ${flow(num(unit, 'feedwater_kg_s'))}`, `makeup ${flow(num(unit, 'makeup_kg_s'))}`, `steam ${flow(num(unit, 'heating_steam_kg_s'))}`];
      if (vent > TINY) lines.push(`VENT ${flow(vent)}`);
      nodes.push({ id: unit.id, kind: 'deaerator', lines, alarmLines: vent > TINY ? [lines.length - 1] : [] });
    } else if (unit.kind === 'flashTank') {
      const vapour = result.streams.find((stream) => stream.from === unit.id && stream.kind === 'flashVapour');
      const liquid = result.streams.find((stream) => stream.from === unit.id && stream.kind === 'flashLiquid');
      const vented = vapour?.to === 'atmosphere';
      const lines = [unit.id, `in ${flow(num(unit, 'inflow_kg_s'))}`, `${vented ? 'VENT' : `vapour → ${vapour?.to ?? '-'}`} ${flow(num(unit, 'vapour_kg_s'))}`, `liquid → ${liquid?.to ?? '-'} ${flow(num(unit, 'liquid_kg_s'))}`];
      nodes.push({ id: unit.id, kind: 'flashTank', lines, alarmLines: vented && num(unit, 'vapour_kg_s') > TINY ? [2] : [] });
    } else if (unit.kind === 'machine') {
      const lines = [unit.id, ...Object.entries(unit.values).filter(([, value]) => typeof value === 'number' || typeof value === 'string').slice(0, 2).map(([key, value]) => `${key.replace(/_/g, ' ')} ${typeof value === 'number' ? value.toFixed(1) : value}`)];
      nodes.push({ id: unit.id, kind: 'machine', lines, alarmLines: [] });
    } else if (unit.kind === 'grid') {
      nodes.push({
        id: unit.id,
        kind: 'power',
        lines: ['power', `made ${format.power(num(unit, 'generated_kW'))}`, `bought ${format.power(num(unit, 'import_kW'))}`, `sold ${format.power(num(unit, 'export_kW'))}`],
        alarmLines: [],
      });
    }
  }
  return nodes;
}

function maxFlow(result: PlantResult): number {
  let largest = 0;
  for (const header of result.headers) largest = Math.max(largest, header.inflow_kg_s);
  for (const stream of result.streams) largest = Math.max(largest, stream.mass_kg_s);
  return largest;
}

function num(unit: UnitReport | undefined, key: string): number {
  const value = unit?.values[key];
  return typeof value === 'number' ? value : 0;
}

function sum(streams: StreamResult[]): number {
  return streams.reduce((total, stream) => total + stream.mass_kg_s, 0);
}

function groupBy<T>(values: T[], key: (value: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const value of values) {
    const name = key(value);
    const group = groups.get(name);
    if (group) group.push(value);
    else groups.set(name, [value]);
  }
  return groups;
}

/**
 * Notes added to the drawing in the warning style, each under the item or
 * water-side node it names (a suspect meter under its unit). Returns the ids
 * that name nothing drawn, so a caller can say so in words.
 */
export function markDiagram(model: DiagramModel, marks: ReadonlyMap<string, string[]>): string[] {
  const missing: string[] = [];
  for (const [id, notes] of marks) {
    const item = model.items.find((candidate) => candidate.id === id);
    const node = item ? undefined : model.bottom.find((candidate) => candidate.id === id);
    const target = item ?? node;
    if (!target) {
      missing.push(id);
      continue;
    }
    const first = target.lines.length;
    target.lines.push(...notes);
    const added = notes.map((_, offset) => first + offset);
    if (item) item.alarmLines = [...(item.alarmLines ?? []), ...added];
    else if (node) node.alarmLines = [...node.alarmLines, ...added];
  }
  return missing;
}
