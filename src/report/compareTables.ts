// Scenarios side by side: one row per figure, one column per scenario, and
// each later column's difference against the first. Text, CSV and Markdown
// come from the same rows, in the case's unit system (flows in t/h or klb/h,
// fuel in MW or MMBtu/h, steam values per t or per klb); power in kW, money
// in the currency.
import { csvCell, markdownCell } from './safeCells.js';
import type { ScenarioRun } from '../scenarios/index.js';
import { perMassValue, steamValueNumber, type DisplayFormat } from './displayFormat.js';
import { steamQualityWarnings } from './steamQuality.js';
import { table } from './table.js';

interface FigureRow {
  label: string;
  values: (number | null)[];
  digits: number;
}

function rowsOf(runs: ScenarioRun[], format: DisplayFormat): FigureRow[] {
  const { currency, flowUnit, flowValue } = format;
  const solved = runs.flatMap((run) => (run.ok ? [run] : []));
  const pick = (label: string, digits: number, value: (run: Extract<ScenarioRun, { ok: true }>) => number | null): FigureRow => ({
    label, digits, values: runs.map((run) => (run.ok ? value(run) : null)),
  });
  const rows: FigureRow[] = [
    { label: 'hours per year', digits: 0, values: runs.map((run) => run.hours) },
    pick(`cost per hour, ${currency}`, 2, (run) => run.cost_per_h),
    pick(`cost per year, ${currency}`, 0, (run) => run.cost_per_year),
    ...(['fuel', 'power', 'steam', 'water', 'carbon'] as const).map((component) => pick(`  ${component}, ${currency}/h`, 2, (run) => run.totals.cost_by_component_per_h[component])),
    pick(`fuel, ${format.fuelRateUnit}`, format.system === 'si' ? 3 : 2, (run) => format.fuelRateValue(run.totals.fuel_kW)),
    pick('power generated, kW', 0, (run) => run.totals.power_generated_kW),
    pick('power imported, kW', 0, (run) => run.totals.power_imported_kW),
    pick('power exported, kW', 0, (run) => run.totals.power_exported_kW),
    pick(`steam raised, ${flowUnit}`, 2, (run) => flowValue(run.totals.steam_raised_kg_s)),
    pick(`let down, ${flowUnit}`, 2, (run) => flowValue(run.totals.let_down_kg_s)),
    pick(`vented, ${flowUnit}`, 3, (run) => flowValue(run.totals.vented_kg_s)),
    pick(`makeup, ${flowUnit}`, 2, (run) => flowValue(run.totals.makeup_kg_s)),
    pick(`CO2, ${format.co2RateUnit}`, 3, (run) => format.co2RateValue(run.totals.co2_kg_per_h)),
  ];
  const unitIds = [...new Set(solved.flatMap((run) => run.units.map((unit) => `${unit.kind}:${unit.id}`)))];
  for (const key of unitIds) {
    const [kind, id] = key.split(':');
    const isTurbine = kind === 'turbine';
    if (!isTurbine && !['boiler', 'heatRecoveryBoiler', 'steamImport', 'letdown'].includes(kind)) continue;
    const field = isTurbine ? 'power_kW' : 'steam_kg_s';
    rows.push(pick(`${id} (${isTurbine ? 'power' : kind === 'letdown' ? 'letdown' : 'steam'}), ${isTurbine ? 'kW' : flowUnit}`, isTurbine ? 0 : 2, (run) => {
      const value = run.units.find((entry) => entry.id === id)?.values[field];
      if (typeof value !== 'number') return 0;
      return isTurbine ? value : flowValue(value);
    }));
  }
  const headerIds = [...new Set(solved.flatMap((run) => run.headers.map((header) => header.id)))];
  for (const id of headerIds) {
    const valueUnit = solved[0]?.result.marginal_value_unit ?? 'currency';
    rows.push(pick(`${id} marginal steam value, ${format.valueUnit(valueUnit)}`, 2, (run) => {
      const value = run.headers.find((header) => header.id === id)?.marginal_value_per_t ?? null;
      return value === null ? null : steamValueNumber(value, valueUnit, format.system);
    }));
    rows.push(pick(`${id} vent, ${flowUnit}`, 3, (run) => flowValue(run.headers.find((header) => header.id === id)?.vent_kg_s ?? 0)));
    const steamOf = (run: Extract<ScenarioRun, { ok: true }>) => run.headers.find((header) => header.id === id);
    rows.push(pick(`${id} superheat, ${format.system === 'si' ? 'K' : 'degF'}`, 1, (run) => {
      const superheat = steamOf(run)?.superheat_K;
      return superheat === null || superheat === undefined ? null : format.system === 'si' ? superheat : superheat * 1.8;
    }));
    rows.push(pick(`${id} moisture, %`, 1, (run) => {
      const quality = steamOf(run)?.quality;
      return quality === null || quality === undefined ? 0 : (1 - quality) * 100;
    }));
  }
  const percent = (value: number | null): number | null => (value === null ? null : value * 100);
  rows.push(
    pick('boiler efficiency, %', 1, (run) => percent(run.kpis.boiler_fuel_to_steam_efficiency)),
    pick('condensate return, %', 1, (run) => percent(run.kpis.condensate_return_fraction)),
    pick('stepped down through letdowns, %', 1, (run) => percent(run.kpis.let_down_fraction)),
    pick('vented / raised, %', 2, (run) => percent(run.kpis.vented_fraction)),
    pick(`power per ${format.perMass} of throttle steam, kWh/${format.perMass}`, 1, (run) => {
      const value = run.kpis.power_per_throttle_t_kWh;
      return value === null ? null : perMassValue(value, format.system);
    }),
    pick(`fuel chargeable to power, ${format.fuelPerPowerUnit}`, format.system === 'si' ? 2 : 0, (run) => {
      const value = run.kpis.fuel_chargeable_to_power_kJ_per_kWh;
      return value === null ? null : format.fuelPerPowerValue(value);
    }),
    pick('site useful-energy efficiency, %', 1, (run) => percent(run.kpis.site_useful_energy_efficiency)),
  );
  return rows;
}

function cell(value: number | null, digits: number): string {
  if (value === null) return '-';
  if (Math.abs(value) < 0.5 * 10 ** -digits) value = 0; // no "-0"
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

function difference(value: number | null, first: number | null, digits: number): string {
  if (value === null || first === null) return '-';
  const change = value - first;
  const text = cell(Math.abs(change), digits);
  return /^[0.,]*$/.test(text) ? '0' : `${change < 0 ? '-' : '+'}${text}`;
}

/** Headings then rows of cells; columns after the first scenario carry their difference. */
function grid(runs: ScenarioRun[], format: DisplayFormat): { headings: string[]; rows: string[][] } {
  const headings = ['figure', runs[0]?.id ?? '', ...runs.slice(1).flatMap((run) => [run.id, `vs ${runs[0].id}`])];
  const rows = rowsOf(runs, format).map((row) => [
    row.label,
    cell(row.values[0], row.digits),
    ...row.values.slice(1).flatMap((value) => [cell(value, row.digits), difference(value, row.values[0], row.digits)]),
  ]);
  return { headings, rows };
}

/** Steam-quality warnings of every solved scenario, one line each. */
function qualityWarnings(runs: ScenarioRun[], format: DisplayFormat): string {
  const lines = runs.flatMap((run) => (run.ok ? steamQualityWarnings(run.headers, format).map((warning) => `  ${run.id}: ${warning}`) : []));
  return lines.length === 0 ? '' : `\nSteam quality warnings\n${lines.join('\n')}\n`;
}

function failures(runs: ScenarioRun[]): string {
  const failed = runs.flatMap((run) => (run.ok ? [] : [`  ${run.id}: NOT SOLVED: ${run.message}`]));
  return failed.length === 0 ? '' : `\nScenarios that could not be solved\n${failed.join('\n')}\n`;
}

/**
 * The side-by-side table with the annual total under it; `annual` is null for
 * a sweep, whose steps are alternatives for the same hours and have no total.
 */
export function compareText(title: string, runs: ScenarioRun[], format: DisplayFormat, annual: { cost_per_year: number | null; hours: number } | null): string {
  const { headings, rows } = grid(runs, format);
  let footer: string;
  if (annual === null) {
    footer = `Each step is the same ${cell(runs[0]?.hours ?? 0, 0)} h a year; cost per year is per step (the steps are alternatives, not added up).`;
  } else {
    const total = annual.cost_per_year === null ? 'not available (a scenario failed)' : `${cell(annual.cost_per_year, 0)} ${format.currency}`;
    footer = `Annual cost over ${cell(annual.hours, 0)} h: ${total}`;
  }
  return `${title}\n\n${table(headings, rows)}\n\n${footer}\n${qualityWarnings(runs, format)}${failures(runs)}`;
}

const csvField = csvCell;

export function compareCsv(runs: ScenarioRun[], format: DisplayFormat): string {
  const { headings, rows } = grid(runs, format);
  // Thousands separators out of the numbers only; a label keeps its commas (quoted).
  const plain = rows.map((row) => row.map((text, column) => (column === 0 ? text : text.replace(/,/g, ''))));
  return [headings, ...plain].map((row) => row.map(csvField).join(',')).join('\n') + '\n';
}

export function compareMarkdown(runs: ScenarioRun[], format: DisplayFormat): string {
  const { headings, rows } = grid(runs, format);
  const line = (row: string[]): string => `| ${row.map(markdownCell).join(' | ')} |`;
  const rule = `|${headings.map((_, index) => (index === 0 ? ' --- ' : ' ---: ')).join('|')}|`;
  return [line(headings), rule, ...rows.map(line)].join('\n') + '\n' + failures(runs);
}
