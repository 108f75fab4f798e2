// The tables of the balance report as plain text cells, in the case's units:
// the HTML report, Markdown and CSV all print these same tables.
import type { PlantResult } from '../plant/index.js';
import type { UnitReport } from '../plant/index.js';
import { displayUnit, fromSI } from '../units/index.js';
import type { DisplayFormat } from './displayFormat.js';
import { steamQualityCell, steamQualityWarnings } from './steamQuality.js';

export interface ReportTable {
  /** stable id, used for anchors and CSV section names */
  id: string;
  title: string;
  headings: string[];
  rows: string[][];
  /** cells of these row indices are drawn as vents */
  alarmRows?: number[];
}

const TINY = 1e-9;

export function reportTables(result: PlantResult, format: DisplayFormat): ReportTable[] {
  const { flow, power } = format;
  const headerNames = new Map(result.headers.map((header) => [header.id, header.name]));
  const number = (unit: UnitReport, key: string): number => (typeof unit.values[key] === 'number' ? (unit.values[key] as number) : 0);
  const limits = (unit: UnitReport): string => unit.binding.join(', ') || '-';
  const ofKind = (...kinds: string[]): UnitReport[] => result.units.filter((unit) => kinds.includes(unit.kind));
  const inletOf = (id: string): string => result.streams.find((stream) => stream.to === id && headerNames.has(stream.from))?.from ?? '-';
  const exitsOf = (id: string): string =>
    result.streams
      .filter((stream) => stream.from === id && stream.kind !== 'spray')
      .map((stream) => `${headerNames.has(stream.to) ? stream.to : stream.to === 'deaerator' ? 'condenser' : stream.to} ${flow(stream.mass_kg_s)}`)
      .join('; ');
  const tables: ReportTable[] = [];

  const headers = [...result.headers].sort((a, b) => b.pressure_MPa - a.pressure_MPa);
  tables.push({
    id: 'headers',
    title: 'Headers',
    headings: ['header', 'name', 'pressure', 'temperature', 'steam', 'enthalpy', 'in', 'out', 'vent', 'heat loss', 'marginal steam value'],
    rows: headers.map((header) => [
      header.id,
      header.name,
      format.pressure(header.pressure_MPa),
      format.temperature(header.T_K),
      steamQualityCell(header, format),
      format.enthalpy(header.h_kJ_kg),
      flow(header.inflow_kg_s),
      flow(header.outflow_kg_s),
      header.vent_kg_s > TINY ? flow(header.vent_kg_s) : '-',
      header.heat_loss_kW !== undefined ? format.heatRate(header.heat_loss_kW) : '-',
      format.valuePerMass(header.marginal_value_per_t, result.marginal_value_unit),
    ]),
  });

  // Both sides of each marginal value, measured by re-solving, and what sets them.
  tables.push({
    id: 'marginal-values',
    title: 'Marginal steam values: one tonne more or less drawn at each header',
    headings: ['header', 'one more costs', 'set by', 'one less saves', 'set by', 'switching point'],
    rows: headers.map((header) => [
      header.id,
      header.marginal.more_per_t === null ? 'no more with the units running' : format.valuePerMass(header.marginal.more_per_t, result.marginal_value_unit),
      header.marginal.more_set_by.join(', ') || '-',
      header.marginal.less_per_t === null ? 'cannot take less' : format.valuePerMass(header.marginal.less_per_t, result.marginal_value_unit),
      header.marginal.less_set_by.join(', ') || '-',
      header.marginal.differs ? 'yes: the two sides differ' : '-',
    ]),
  });

  const warnings = steamQualityWarnings(headers, format);
  if (warnings.length > 0) {
    tables.push({ id: 'steam-quality', title: 'Steam quality warnings', headings: ['warning'], rows: warnings.map((warning) => [warning]), alarmRows: warnings.map((_, index) => index) });
  }

  tables.push({
    id: 'sources',
    title: 'Sources',
    headings: ['unit', 'kind', 'header', 'steam', 'load', 'fuel', 'efficiency', 'limits'],
    rows: ofKind('boiler', 'heatRecoveryBoiler', 'steamImport').map((unit) => [
      unit.id,
      kindWords(unit.kind),
      result.streams.find((stream) => stream.from === unit.id && headerNames.has(stream.to))?.to ?? '-',
      flow(number(unit, 'steam_kg_s')),
      typeof unit.values.load === 'number' ? `${(unit.values.load * 100).toFixed(0)} %` : '-',
      typeof unit.values.fuel_kW === 'number' ? format.fuelRate(unit.values.fuel_kW) : '-',
      typeof unit.values.efficiency === 'number' ? `${(unit.values.efficiency * 100).toFixed(1)} %` : '-',
      limits(unit),
    ]),
  });

  tables.push({
    id: 'turbines',
    title: 'Turbines',
    headings: ['unit', 'inlet', 'throttle', 'power', 'steam rate', 'exhaust and extraction', 'limits'],
    rows: ofKind('turbine').map((unit) => [
      unit.id,
      inletOf(unit.id),
      flow(number(unit, 'inlet_kg_s')),
      power(number(unit, 'power_kW')),
      typeof unit.values.steam_rate_kg_kWh === 'number' ? format.steamRate(unit.values.steam_rate_kg_kWh) : '-',
      exitsOf(unit.id) || '-',
      limits(unit),
    ]),
  });

  tables.push({
    id: 'letdowns',
    title: 'Letdowns',
    headings: ['unit', 'from', 'to', 'steam', 'spray water', 'outlet', 'limits'],
    rows: ofKind('letdown').map((unit) => [
      unit.id,
      inletOf(unit.id),
      result.streams.find((stream) => stream.from === unit.id && headerNames.has(stream.to))?.to ?? '-',
      flow(number(unit, 'steam_kg_s')),
      flow(number(unit, 'spray_kg_s')),
      flow(number(unit, 'outlet_kg_s')),
      limits(unit),
    ]),
  });

  // Vents first: venting is usually the largest avoidable loss. Then drains.
  // Each vent says why its steam has no better use.
  const why = (from: string): string => {
    const reasons = result.vents.filter((vent) => vent.where === from).map((vent) => vent.reason);
    if (reasons.length > 0) return reasons.join(' ');
    return from === 'deaerator' ? 'its design share of the feedwater' : '-';
  };
  const losses: string[][] = [];
  const alarmRows: number[] = [];
  for (const terminal of ['atmosphere', 'drain']) {
    const byKind = new Map<string, { from: string; mass: number }>();
    for (const stream of result.streams.filter((candidate) => candidate.to === terminal)) {
      const label = terminal === 'atmosphere' ? `vent from ${stream.from}` : `${kindWords(stream.kind)} from ${stream.from} to drain`;
      byKind.set(label, { from: stream.from, mass: (byKind.get(label)?.mass ?? 0) + stream.mass_kg_s });
    }
    for (const [label, { from, mass }] of byKind) {
      if (mass <= TINY) continue;
      if (terminal === 'atmosphere') alarmRows.push(losses.length);
      losses.push([label, flow(mass), terminal === 'atmosphere' ? why(from) : '-']);
    }
  }
  tables.push({ id: 'vents', title: 'Vents and losses', headings: ['where', 'flow', 'why'], rows: losses, alarmRows });

  tables.push({
    id: 'users',
    title: 'Users',
    headings: ['unit', 'header', 'steam', 'heat', 'condensate returned', 'condensate lost'],
    rows: ofKind('user').map((unit) => [
      unit.id,
      inletOf(unit.id),
      flow(number(unit, 'steam_kg_s')),
      format.heatRate(number(unit, 'heat_kW')),
      flow(number(unit, 'condensate_returned_kg_s')),
      flow(number(unit, 'condensate_lost_kg_s')),
    ]),
  });

  tables.push({
    id: 'water-side',
    title: 'Deaerator and flash tanks',
    headings: ['unit', 'in', 'steam or vapour', 'liquid or feedwater', 'vent'],
    rows: ofKind('deaerator', 'flashTank').map((unit) =>
      unit.kind === 'deaerator'
        ? [unit.id, `makeup ${flow(number(unit, 'makeup_kg_s'))}`, `heating ${flow(number(unit, 'heating_steam_kg_s'))}`, `feedwater ${flow(number(unit, 'feedwater_kg_s'))}`, flow(number(unit, 'vent_kg_s'))]
        : [unit.id, flow(number(unit, 'inflow_kg_s')), flow(number(unit, 'vapour_kg_s')), flow(number(unit, 'liquid_kg_s')), '-'],
    ),
  });

  const totals = result.totals;
  const cost = totals.cost_by_component_per_h;
  tables.push({
    id: 'totals',
    title: 'Totals',
    headings: ['item', 'value'],
    rows: [
      ['cost per hour', format.money(totals.cost_per_h)],
      ...(['fuel', 'power', 'steam', 'water', 'carbon'] as const).map((key) => [`  ${key}`, format.money(cost[key])]),
      ['fuel fired', format.fuelRate(totals.fuel_kW)],
      ['power made', power(totals.power_generated_kW)],
      ['power bought', power(totals.power_imported_kW)],
      ['power sold', power(totals.power_exported_kW)],
      ['steam raised', flow(totals.steam_raised_kg_s)],
      ['steam let down', flow(totals.let_down_kg_s)],
      ['steam vented', flow(totals.vented_kg_s)],
      ['makeup water', flow(totals.makeup_kg_s)],
      ['CO2', format.co2Rate(totals.co2_kg_per_h)],
    ],
  });

  const kpis = result.kpis;
  tables.push({
    id: 'key-figures',
    title: 'Key figures',
    headings: ['figure', 'value'],
    rows: [
      ['boiler fuel-to-steam efficiency', format.percent(kpis.boiler_fuel_to_steam_efficiency)],
      ['condensate return', format.percent(kpis.condensate_return_fraction)],
      ['steam let down', format.percent(kpis.let_down_fraction)],
      ['steam vented', format.percent(kpis.vented_fraction)],
      ['site useful-energy efficiency', format.percent(kpis.site_useful_energy_efficiency)],
    ],
  });

  const massUnit = displayUnit('massFlow', format.system);
  tables.push({
    id: 'audit',
    title: 'Audit residuals',
    headings: ['balance', 'kind', 'mass residual', 'energy residual', 'relative (mass / energy)'],
    rows: result.audit.balances.map((balance) => [
      balance.id,
      balance.kind,
      `${fromSI(balance.mass, 'massFlow', massUnit).toExponential(2)} ${massUnit}`,
      balance.energy === null ? '-' : format.heatResidual(balance.energy),
      `${balance.massRelative.toExponential(1)} / ${balance.energyRelative === null ? '-' : balance.energyRelative.toExponential(1)}`,
    ]),
  });
  tables.push(independentAuditTable(result, format));
  return tables;
}

/** The independent audit per unit and node: residuals, entropy generation, the unit's own relations. */
export function independentAuditTable(result: PlantResult, format: DisplayFormat): ReportTable {
  const audit = result.audit.independent;
  const rows = audit.units.map((unit) => {
    const worst = unit.checks.reduce<(typeof unit.checks)[number] | null>((found, check) => (found === null || check.relative > found.relative ? check : found), null);
    return [
      unit.id,
      kindWords(unit.kind),
      unit.mass_relative.toExponential(1),
      unit.energy_relative === null ? '-' : unit.energy_relative.toExponential(1),
      unit.entropy_generation_kW_K === null ? '-' : format.entropyRate(unit.entropy_generation_kW_K),
      worst ? `${worst.what} ${worst.relative.toExponential(1)}` : '-',
      unit.problems.length === 0 ? 'passes' : `FAILS: ${unit.problems.join('; ')}`,
    ];
  });
  return {
    id: 'independent-audit',
    title: 'Independent audit (states and relations recomputed with IF97)',
    headings: ['unit', 'kind', 'mass (relative)', 'energy (relative)', 'entropy generation', 'largest relation difference', 'result'],
    rows,
    alarmRows: audit.units.flatMap((unit, index) => (unit.problems.length > 0 ? [index] : [])),
  };
}

/** "heatRecoveryBoiler" -> "heat recovery boiler". */
export function kindWords(kind: string): string {
  return kind.replace(/([a-z])([A-Z])/g, (_, lower: string, upper: string) => `${lower} ${upper.toLowerCase()}`);
}
