// Scenarios side by side: one row per figure, one column per scenario, and
// each later column's difference against the first. Text, CSV and Markdown
// come from the same rows. Flows in t/h, power in kW, money in the currency.
import type { ScenarioRun } from '../scenarios/index.js';
import { table } from './table.js';

const T_PER_H = 3.6;

interface FigureRow {
  label: string;
  values: (number | null)[];
  digits: number;
}

function rowsOf(runs: ScenarioRun[], currency: string): FigureRow[] {
  const solved = runs.flatMap((run) => (run.ok ? [run] : []));
  const pick = (label: string, digits: number, value: (run: Extract<ScenarioRun, { ok: true }>) => number | null): FigureRow => ({
    label, digits, values: runs.map((run) => (run.ok ? value(run) : null)),
  });
  const rows: FigureRow[] = [
    { label: 'hours per year', digits: 0, values: runs.map((run) => run.hours) },
    pick(`cost per hour, ${currency}`, 2, (run) => run.cost_per_h),
    pick(`cost per year, ${currency}`, 0, (run) => run.cost_per_year),
    ...(['fuel', 'power', 'steam', 'water', 'carbon'] as const).map((component) => pick(`  ${component}, ${currency}/h`, 2, (run) => run.totals.cost_by_component_per_h[component])),
    pick('fuel, MW', 3, (run) => run.totals.fuel_kW / 1000),
    pick('power generated, kW', 0, (run) => run.totals.power_generated_kW),
    pick('power imported, kW', 0, (run) => run.totals.power_imported_kW),
    pick('power exported, kW', 0, (run) => run.totals.power_exported_kW),
    pick('steam raised, t/h', 2, (run) => run.totals.steam_raised_kg_s * T_PER_H),
    pick('let down, t/h', 2, (run) => run.totals.let_down_kg_s * T_PER_H),
    pick('vented, t/h', 3, (run) => run.totals.vented_kg_s * T_PER_H),
    pick('makeup, t/h', 2, (run) => run.totals.makeup_kg_s * T_PER_H),
    pick('CO2, t/h', 3, (run) => run.totals.co2_kg_per_h / 1000),
  ];
  const unitIds = [...new Set(solved.flatMap((run) => run.units.map((unit) => `${unit.kind}:${unit.id}`)))];
  for (const key of unitIds) {
    const [kind, id] = key.split(':');
    const figure = kind === 'turbine' ? ['power_kW', 'kW', 0] : ['boiler', 'heatRecoveryBoiler', 'steamImport', 'letdown'].includes(kind) ? ['steam_kg_s', 't/h', 2] : null;
    if (!figure) continue;
    const [field, unit, digits] = figure as [string, string, number];
    rows.push(pick(`${id} (${kind === 'turbine' ? 'power' : kind === 'letdown' ? 'letdown' : 'steam'}), ${unit}`, digits, (run) => {
      const value = run.units.find((entry) => entry.id === id)?.values[field];
      if (typeof value !== 'number') return 0;
      return unit === 't/h' ? value * T_PER_H : value;
    }));
  }
  const headerIds = [...new Set(solved.flatMap((run) => run.headers.map((header) => header.id)))];
  for (const id of headerIds) {
    rows.push(pick(`${id} marginal steam value, ${currency}/t`, 2, (run) => run.headers.find((header) => header.id === id)?.marginal_value_per_t ?? null));
    rows.push(pick(`${id} vent, t/h`, 3, (run) => (run.headers.find((header) => header.id === id)?.vent_kg_s ?? 0) * T_PER_H));
  }
  const percent = (value: number | null): number | null => (value === null ? null : value * 100);
  rows.push(
    pick('boiler efficiency, %', 1, (run) => percent(run.kpis.boiler_fuel_to_steam_efficiency)),
    pick('condensate return, %', 1, (run) => percent(run.kpis.condensate_return_fraction)),
    pick('let down / raised, %', 1, (run) => percent(run.kpis.let_down_fraction)),
    pick('vented / raised, %', 2, (run) => percent(run.kpis.vented_fraction)),
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
function grid(runs: ScenarioRun[], currency: string): { headings: string[]; rows: string[][] } {
  const headings = ['figure', runs[0]?.id ?? '', ...runs.slice(1).flatMap((run) => [run.id, `vs ${runs[0].id}`])];
  const rows = rowsOf(runs, currency).map((row) => [
    row.label,
    cell(row.values[0], row.digits),
    ...row.values.slice(1).flatMap((value) => [cell(value, row.digits), difference(value, row.values[0], row.digits)]),
  ]);
  return { headings, rows };
}

function failures(runs: ScenarioRun[]): string {
  const failed = runs.flatMap((run) => (run.ok ? [] : [`  ${run.id}: NOT SOLVED: ${run.message}`]));
  return failed.length === 0 ? '' : `\nScenarios that could not be solved\n${failed.join('\n')}\n`;
}

export function compareText(title: string, runs: ScenarioRun[], currency: string, annual: { cost_per_year: number | null; hours: number }): string {
  const { headings, rows } = grid(runs, currency);
  const total = annual.cost_per_year === null ? 'not available (a scenario failed)' : `${cell(annual.cost_per_year, 0)} ${currency}`;
  return `${title}\n\n${table(headings, rows)}\n\nAnnual cost over ${cell(annual.hours, 0)} h: ${total}\n${failures(runs)}`;
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function compareCsv(runs: ScenarioRun[], currency: string): string {
  const { headings, rows } = grid(runs, currency);
  const plain = rows.map((row) => row.map((text) => text.replace(/,/g, '')));
  return [headings, ...plain].map((row) => row.map(csvField).join(',')).join('\n') + '\n';
}

export function compareMarkdown(runs: ScenarioRun[], currency: string): string {
  const { headings, rows } = grid(runs, currency);
  const line = (row: string[]): string => `| ${row.map((text) => text.replace(/\|/g, '\\|')).join(' | ')} |`;
  const rule = `|${headings.map((_, index) => (index === 0 ? ' --- ' : ' ---: ')).join('|')}|`;
  return [line(headings), rule, ...rows.map(line)].join('\n') + '\n' + failures(runs);
}
