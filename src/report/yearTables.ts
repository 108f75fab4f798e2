// The year as text (annual totals, months, units, headers, failed periods)
// and as CSV with one row per period, in the case's units. Only formatting:
// every figure comes from the YearResult and the period records.
import type { PeriodRecord, YearResult } from '../year/index.js';
import { COMPONENTS } from '../year/index.js';
import { steamValueNumber, type DisplayFormat, type SteamValueUnit } from './displayFormat.js';
import { csvCell } from './safeCells.js';
import { SAFETY_CAUTION } from './safety.js';
import type { ReportTable } from './reportTables.js';
import { table } from './table.js';

const KG_PER_LB = 0.45359237; // exact, by definition of the pound
const KJ_PER_BTU = 1.05505585262; // International Table Btu
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

function whole(value: number): string {
  return (Math.abs(value) < 0.5 ? 0 : value).toLocaleString('en-US', { maximumFractionDigits: 0 });
}

/** Masses in t (SI) or klb (US); energies in GJ (SI) or MMBtu (US). */
function totalsIn(format: DisplayFormat): { mass: (t: number) => number; massUnit: string; energy: (GJ: number) => number; energyUnit: string } {
  const si = format.system === 'si';
  return {
    mass: (t) => (si ? t : t / KG_PER_LB),
    massUnit: si ? 't' : 'klb',
    energy: (GJ) => (si ? GJ : GJ / KJ_PER_BTU),
    energyUnit: si ? 'GJ' : 'MMBtu',
  };
}

/** The year's figures as tables (annual cost and energy, months, units, limits, headers, failures), shared by the text and the HTML report. */
export function yearReportTables(result: YearResult, format: DisplayFormat): ReportTable[] {
  const units = totalsIn(format);
  const valueUnit = result.marginal_value_unit as SteamValueUnit;
  const value = (perT: number | null): string => (perT === null ? 'n/a' : steamValueNumber(perT, valueUnit, format.system).toFixed(2));
  const a = result.annual;
  const tables: ReportTable[] = [];
  const rolling = result.mode === 'rolling windows';
  const startRow = rolling ? [['start-ups', whole(a.start_up_cost), a.cost > 0 ? `${((a.start_up_cost / a.cost) * 100).toFixed(1)} %` : '-']] : [];
  tables.push({ id: 'year-cost', title: `Annual cost: ${format.money(a.cost)}`, headings: ['component', `cost (${format.currency})`, 'share'], rows: [...COMPONENTS.map((component) => [component, whole(a.cost_by_component[component]), a.cost > 0 ? `${((a.cost_by_component[component] / a.cost) * 100).toFixed(1)} %` : '-']), ...startRow] });
  tables.push({
    id: 'year-energy',
    title: 'Annual energy',
    headings: ['quantity', 'total', 'unit'],
    rows: [
      ['fuel fired', whole(units.energy(a.fuel_GJ)), units.energyUnit],
      ['steam raised', whole(units.mass(a.steam_raised_t)), units.massUnit],
      ['process steam', whole(units.mass(a.process_steam_t)), units.massUnit],
      ['steam let down', whole(units.mass(a.let_down_t)), units.massUnit],
      ['steam vented', whole(units.mass(a.vented_t)), units.massUnit],
      ['makeup water', whole(units.mass(a.makeup_t)), units.massUnit],
      ['power generated', whole(a.power_generated_MWh), 'MWh'],
      ['power imported', whole(a.power_imported_MWh), 'MWh'],
      ['power exported', whole(a.power_exported_MWh), 'MWh'],
      ['CO2 emitted', whole(format.system === 'si' ? a.co2_t : a.co2_t / KG_PER_LB), format.system === 'si' ? 't' : 'klb'],
    ],
  });
  if (result.months.length > 0) {
    tables.push({
      id: 'year-months',
      title: 'Month by month',
      headings: ['month', 'hours', `cost (${format.currency})`, `fuel (${units.energyUnit})`, `steam raised (${units.massUnit})`, 'imported (MWh)', 'exported (MWh)', `vented (${units.massUnit})`],
      rows: result.months.map((month) => [MONTHS[month.month - 1], whole(month.hours), whole(month.cost), whole(units.energy(month.fuel_GJ)), whole(units.mass(month.steam_raised_t)), whole(month.power_imported_MWh), whole(month.power_exported_MWh), whole(units.mass(month.vented_t))]),
    });
  }
  tables.push({
    id: 'year-units',
    title: 'Units over the year',
    headings: ['unit', 'kind', 'hours running', 'starts', ...(rolling ? [`start costs (${format.currency})`] : []), 'hours out of service', `steam (${units.massUnit})`, `fuel (${units.energyUnit})`, 'power (MWh)'],
    rows: result.units.map((unit) => [unit.id, unit.kind, whole(unit.hours_running), String(unit.starts), ...(rolling ? [whole(unit.start_up_cost)] : []), whole(unit.hours_out_of_service), whole(units.mass(unit.steam_t)), whole(units.energy(unit.fuel_GJ)), whole(unit.power_MWh)]),
  });
  const limits = result.units.flatMap((unit) => Object.entries(unit.hours_at_limit).map(([limit, hours]) => [unit.id, limit, whole(hours)]));
  if (limits.length > 0) tables.push({ id: 'year-limits', title: 'Hours at each limit', headings: ['unit', 'limit', 'hours'], rows: limits });
  tables.push({
    id: 'year-headers',
    title: `Marginal value of steam by header (${format.valueUnit(valueUnit)}, weighted by hours)`,
    headings: ['header', 'mean', 'min', '10 %', 'median', '90 %', 'max'],
    rows: result.headers.map((header) => [header.id, value(header.mean_per_t), value(header.min_per_t), value(header.p10_per_t), value(header.median_per_t), value(header.p90_per_t), value(header.max_per_t)]),
  });
  if (result.failed.length > 0) tables.push({ id: 'year-failed', title: `Periods that could not be solved (${result.failed.length})`, headings: ['period', 'reason', 'diagnosis'], rows: result.failed.map((period) => [period.label, period.reason, period.message]) });
  return tables;
}

/** The year's opening lines: where from, how on/off was chosen, how the periods were solved. */
export function yearHeadline(result: YearResult): string[] {
  const lines = [`${result.plant}: the year from ${result.profile.file} (${result.periods} ${result.profile.kind === 'hourly' ? 'hourly periods' : 'periods'}, ${whole(result.hours)} h)`];
  lines.push(`On/off across periods: ${result.mode}; ${result.mode_note}.`);
  const solved = result.periods - result.failed.length;
  lines.push(`Solved ${solved} of ${result.periods} periods: ${result.how.full} by a full search, ${result.how.neighbour} from the period before's on/off choices and point, ${result.how.same_as_earlier} identical to an earlier period; ${result.how.one_pass} settled in one pass.`);
  for (const window of result.unscheduled_windows ?? []) {
    lines.push(`Warning: the rolling window's program found no schedule (${window.status}) for ${window.from} to ${window.to} (${window.periods} periods): each keeps its own optimum, so the start costs and minimum running and stopped hours may not hold there.`);
  }
  if (!result.complete) lines.push(`Totals cover the ${whole(result.hours_solved)} h that solved, not the ${whole(result.hours)} h of the profile: ${result.failed.length} periods failed (listed below).`);
  return lines;
}

export function yearText(result: YearResult, format: DisplayFormat): string {
  const lines: string[] = [...yearHeadline(result)];
  for (const entry of yearReportTables(result, format)) {
    lines.push('');
    lines.push(entry.title);
    lines.push(table(entry.headings, entry.rows));
  }
  lines.push('');
  lines.push(SAFETY_CAUTION);
  return `${lines.join('\n')}\n`;
}

/** One row per period in the case's units; failed periods keep their row with the reason. */
export function yearCsv(result: YearResult, records: Iterable<PeriodRecord>, format: DisplayFormat): string {
  const flow = format.flowUnit;
  const valueUnit = result.marginal_value_unit as SteamValueUnit;
  const rolling = result.mode === 'rolling windows';
  const heading = [
    'period', 'hours', 'month', 'status', 'solved', `cost [${format.currency}/h]`,
    ...COMPONENTS.map((component) => `${component} cost [${format.currency}/h]`),
    ...(rolling ? [`start-up cost [${format.currency}]`] : []),
    `fuel [${format.fuelRateUnit}]`, `steam raised [${flow}]`, `process steam [${flow}]`, `let down [${flow}]`, `vented [${flow}]`, `makeup [${flow}]`,
    'power generated [kW]', 'power imported [kW]', 'power exported [kW]', 'site demand [kW]', `CO2 [${format.co2RateUnit}]`,
    ...result.headers.map((header) => `${header.id} marginal value [${format.valueUnit(valueUnit)}]`),
    ...result.units.flatMap((unit) => [`${unit.id} running`, unit.kind === 'turbine' ? `${unit.id} power [kW]` : `${unit.id} steam [${flow}]`]),
  ];
  const lines = [heading.map(csvCell).join(',')];
  // Full precision (the shortest text that reads back to the same double), so sums over rows match the totals.
  const number = (value: number): string => String(Math.abs(value) < 1e-12 ? 0 : value);
  for (const record of records) {
    const head = [record.label, number(record.hours), record.month > 0 ? String(record.month) : ''];
    if (!record.ok) {
      lines.push([...head, 'failed', `${record.reason}: ${record.message}`].map(csvCell).join(','));
      continue;
    }
    const kW_of_GJ_per_h = record.fuel_GJ_per_h / 0.0036;
    const cells = [
      ...head, 'solved', record.how, number(record.cost_per_h),
      ...COMPONENTS.map((component) => number(record.cost_by_component_per_h[component])),
      ...(rolling ? [number(record.start_up_cost ?? 0)] : []),
      number(format.fuelRateValue(kW_of_GJ_per_h)), number(format.flowValue(record.steam_raised_kg_s)), number(format.flowValue(record.process_steam_kg_s)),
      number(format.flowValue(record.let_down_kg_s)), number(format.flowValue(record.vented_kg_s)), number(format.flowValue(record.makeup_kg_s)),
      number(record.power_generated_kW), number(record.power_imported_kW), number(record.power_exported_kW), number(record.site_demand_kW), number(format.co2RateValue(record.co2_kg_per_h)),
      ...record.marginal_per_t.map((perT) => (perT === null ? '' : number(steamValueNumber(perT, valueUnit, format.system)))),
      ...record.units.flatMap((state, slot) => [String(state.running), number(result.units[slot].kind === 'turbine' ? state.power_kW : format.flowValue(state.steam_kg_s))]),
    ];
    lines.push(cells.map(csvCell).join(','));
  }
  return `${lines.join('\n')}\n`;
}
