// The year's charts as inline SVG, drawn from the result and its period
// records: load-duration curves (steam demand, power import), each header's
// marginal value through the year, supply by source per month (stacked), and
// unit running hours. Self-contained, no script; text from the case escaped.
import type { PeriodRecord, YearResult } from '../year/index.js';
import { barChartSvg } from './barChart.js';
import { steamValueNumber, type DisplayFormat, type SteamValueUnit } from './displayFormat.js';
import { escapeMarkup } from './escape.js';
import { SAFETY_CAUTION } from './safety.js';
import type { ReportTable } from './reportTables.js';
import { yearHeadline, yearReportTables, yearText } from './yearTables.js';

const WIDTH = 640;
const HEIGHT = 240;
const LEFT = 60;
const TOP = 30;
const PLOT_W = WIDTH - LEFT - 20;
const PLOT_H = HEIGHT - TOP - 56;
const MOST_POINTS = 800;
const COLOURS = ['#23303b', '#7d98ab', '#b8860b', '#6b8e23', '#8b4513', '#708090', '#4682b4', '#a0522d'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

function f(value: number): string {
  return (Math.round(value * 10) / 10).toString();
}

/** At most MOST_POINTS points: each the mean of its share of the values. */
function thin(values: number[]): number[] {
  if (values.length <= MOST_POINTS) return values;
  const step = values.length / MOST_POINTS;
  return Array.from({ length: MOST_POINTS }, (_, at) => {
    const slice = values.slice(Math.floor(at * step), Math.max(Math.floor(at * step) + 1, Math.floor((at + 1) * step)));
    return slice.reduce((sum, value) => sum + value, 0) / slice.length;
  });
}

/** A legend entry below the plot: a swatch and the label, four to a row. */
function legend(index: number, label: string): string {
  const x = LEFT + (index % 4) * 140;
  const y = HEIGHT - 14 + Math.floor(index / 4) * 14;
  return `<rect x="${x}" y="${y - 9}" width="10" height="10" fill="${COLOURS[index % COLOURS.length]}"/><text x="${x + 14}" y="${y}">${escapeMarkup(label)}</text>`;
}

function frame(id: string, title: string, low: number, high: number, unit: string, xWords: string): string[] {
  const tick = (value: number): string => (Math.abs(high - low) >= 100 ? value.toFixed(0) : value.toFixed(1));
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart" id="${escapeMarkup(id)}" width="${WIDTH}" height="${HEIGHT}" viewBox="0 0 ${WIDTH} ${HEIGHT}" role="img" aria-label="${escapeMarkup(title)}" font-family="'DejaVu Sans', Verdana, sans-serif" font-size="11">`,
    `<text x="0" y="16" font-weight="bold" font-size="13">${escapeMarkup(title)}</text>`,
    `<rect x="${LEFT}" y="${TOP}" width="${PLOT_W}" height="${PLOT_H}" fill="none" stroke="#d5d2ca"/>`,
    `<text x="${LEFT - 6}" y="${TOP + 10}" text-anchor="end">${escapeMarkup(tick(high))}</text>`,
    `<text x="${LEFT - 6}" y="${TOP + PLOT_H}" text-anchor="end">${escapeMarkup(tick(low))}</text>`,
    `<text x="${LEFT - 6}" y="${TOP + PLOT_H / 2}" text-anchor="end">${escapeMarkup(unit)}</text>`,
    `<text x="${LEFT + PLOT_W}" y="${TOP + PLOT_H + 30}" text-anchor="end">${escapeMarkup(xWords)}</text>`,
  ];
}

/** Lines over a common x axis (0 to 1); each series thinned to at most MOST_POINTS points. */
export function lineChartSvg(id: string, title: string, unit: string, xWords: string, series: { label: string; values: number[] }[]): string {
  const thinned = series.map((entry) => ({ label: entry.label, values: thin(entry.values) }));
  const all = thinned.flatMap((entry) => entry.values);
  const low = Math.min(0, ...all);
  const high = Math.max(low + 1e-9, ...all);
  const parts = frame(id, title, low, high, unit, xWords);
  thinned.forEach((entry, index) => {
    const count = entry.values.length;
    const points = entry.values.map((value, at) => `${f(LEFT + (count > 1 ? (at / (count - 1)) * PLOT_W : 0))},${f(TOP + PLOT_H - ((value - low) / (high - low)) * PLOT_H)}`).join(' ');
    const colour = COLOURS[index % COLOURS.length];
    parts.push(`<polyline fill="none" stroke="${colour}" stroke-width="1.2" points="${points}"><title>${escapeMarkup(entry.label)}</title></polyline>`);
    parts.push(legend(index, entry.label));
  });
  parts.push('</svg>');
  return parts.join('\n');
}

/** Stacked columns: one per category, one layer per source. */
export function stackedColumnsSvg(id: string, title: string, unit: string, categories: string[], layers: { label: string; values: number[] }[]): string {
  const totals = categories.map((_, at) => layers.reduce((sum, layer) => sum + Math.max(0, layer.values[at] ?? 0), 0));
  const high = Math.max(1e-9, ...totals);
  const parts = frame(id, title, 0, high, unit, 'month');
  const column = PLOT_W / Math.max(1, categories.length);
  categories.forEach((category, at) => {
    let base = 0;
    layers.forEach((layer, index) => {
      const value = Math.max(0, layer.values[at] ?? 0);
      const height = (value / high) * PLOT_H;
      const y = TOP + PLOT_H - ((base + value) / high) * PLOT_H;
      parts.push(`<rect x="${f(LEFT + at * column + 2)}" y="${f(y)}" width="${f(column - 4)}" height="${f(height)}" fill="${COLOURS[index % COLOURS.length]}"><title>${escapeMarkup(`${layer.label}, ${category}: ${value.toFixed(0)} ${unit}`)}</title></rect>`);
      base += value;
    });
    parts.push(`<text x="${f(LEFT + (at + 0.5) * column)}" y="${TOP + PLOT_H + 14}" text-anchor="middle">${escapeMarkup(category)}</text>`);
  });
  layers.forEach((layer, index) => parts.push(legend(index, layer.label)));
  parts.push('</svg>');
  return parts.join('\n');
}

/** Every chart of the year, in the order the page shows them. */
export function yearChartsSvg(result: YearResult, records: readonly PeriodRecord[], format: DisplayFormat): string[] {
  const solved = records.filter((record): record is Extract<PeriodRecord, { ok: true }> => record.ok);
  // Load-duration: each period's value repeated by its hours would weight them; hourly rows are 1 h each.
  const duration = (values: number[]): number[] => values.slice().sort((a, b) => b - a);
  const charts = [
    lineChartSvg('year-steam-duration', 'Load-duration curve: process steam demand', format.flowUnit, 'share of periods, highest first', [{ label: 'process steam', values: duration(solved.map((record) => format.flowValue(record.process_steam_kg_s))) }]),
    lineChartSvg('year-import-duration', 'Load-duration curve: power import', 'kW', 'share of periods, highest first', [{ label: 'power import', values: duration(solved.map((record) => record.power_imported_kW)) }]),
    lineChartSvg(
      'year-marginal-values',
      'Marginal value of steam through the year',
      format.valueUnit(result.marginal_value_unit as SteamValueUnit),
      'periods in order',
      result.headers.map((header, slot) => ({ label: header.id, values: solved.map((record) => record.marginal_per_t[slot]).filter((value): value is number => value !== null).map((value) => steamValueNumber(value, result.marginal_value_unit as SteamValueUnit, format.system)) })),
    ),
  ];
  if (result.months.length > 0) {
    const sources = result.units.filter((unit) => unit.kind !== 'turbine' && unit.kind !== 'letdown');
    const mass = (t: number): number => (format.system === 'si' ? t : t / 0.45359237);
    charts.push(stackedColumnsSvg('year-supply-by-month', 'Steam supplied by source, month by month', format.system === 'si' ? 't' : 'klb', result.months.map((month) => MONTHS[month.month - 1]), sources.map((unit) => ({ label: unit.id, values: result.months.map((month) => mass(month.supply_t[unit.id] ?? 0)) }))));
  }
  charts.push(barChartSvg('year-running-hours', 'Hours running', result.units.map((unit) => ({ label: unit.id, value: unit.hours_running, text: `${unit.hours_running.toFixed(0)} h` }))));
  return charts;
}

/** A self-contained page: the charts, then the text tables. */
export function yearHtml(result: YearResult, records: readonly PeriodRecord[], format: DisplayFormat): string {
  const charts = yearChartsSvg(result, records, format);
  return [
    '<!DOCTYPE html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<title>${escapeMarkup(result.plant)}: the year</title>`,
    '<style>body{font-family:"DejaVu Sans",Verdana,sans-serif;margin:2em;color:#1f2328;background:#fcfbf8}svg.chart{display:block;margin:1.5em 0}pre{font-size:12px;overflow-x:auto}.caution{border-left:4px solid #a4301c;padding-left:1em}</style>',
    '</head><body>',
    `<h1>${escapeMarkup(result.plant)}: the year</h1>`,
    `<p class="caution">${escapeMarkup(SAFETY_CAUTION)}</p>`,
    ...charts,
    `<pre>${escapeMarkup(yearText(result, format))}</pre>`,
    '</body></html>',
    '',
  ].join('\n');
}

/** The HTML report's year section (`report --year`): how the year was solved, its charts, then its tables. */
export function yearSectionHtml(result: YearResult, records: readonly PeriodRecord[], format: DisplayFormat, tableHtml: (table: ReportTable, prefix?: string) => string): string {
  return [
    '<section id="year"><h2>The year</h2>',
    ...yearHeadline(result).map((line) => `<p>${escapeMarkup(line)}</p>`),
    `<div class="charts">${yearChartsSvg(result, records, format).join('')}</div>`,
    ...yearReportTables(result, format).map((entry) => tableHtml(entry, 'year')),
    '</section>',
  ].join('\n');
}
