// The self-contained HTML report: diagram, tables, charts, audit,
// assumptions and cautions in one file that fetches nothing. Every text from
// the case goes through escapeMarkup.
import type { Plant } from '../model/index.js';
import type { PlantResult } from '../plant/index.js';
import { barChartSvg } from './barChart.js';
import { balanceDiagram } from './balanceDiagram.js';
import type { TitleBlock } from './diagram/index.js';
import type { ProjectEvaluation } from '../scenarios/index.js';
import { projectChart, projectScenarioTable, projectSummaryTable } from './projectSections.js';
import { displayFormat, steamValueNumber, type DisplayFormat } from './displayFormat.js';
import { escapeMarkup } from './escape.js';
import { reportTables, type ReportTable } from './reportTables.js';
import { reportAssumptions } from './assumptions.js';
import { createHash } from 'node:crypto';
import { basename } from 'node:path';
import { REPORT_SCRIPT, REPORT_STYLE } from './htmlAssets.js';
import { SAFETY_CAUTION } from './safety.js';
import type { SavingsResult } from '../savings/index.js';
import { savingsSectionHtml } from './savingsTables.js';
import type { PeriodRecord, YearResult } from '../year/index.js';
import { yearSectionHtml } from './yearCharts.js';
import type { ReconcileOutcome } from '../reconcile/index.js';
import { reconcileSectionHtml } from './reconcileReport.js';
import { reconciledDiagram } from './reconciledDiagram.js';

/** CSP source for the inline script: sha256 of its exact text (CSP Level 2, hash-source). */
const SCRIPT_HASH = `sha256-${createHash('sha256').update(REPORT_SCRIPT, 'utf8').digest('base64')}`;
import { annualCostChart, comparisonTable, failedScenariosHtml, scenarioCostChart, scenarioSectionHtml, type FailedScenario, type ScenarioSection } from './scenarioSections.js';

export interface ReportOptions {
  /** e.g. the scenario shown; printed under the title */
  subtitle?: string;
  /** when the report was made (ISO text); left out for reproducible files */
  generatedAt?: string;
  /** the case's scenarios, solved: compared side by side, each with its own diagram */
  scenarios?: ScenarioSection[];
  /** the case's projects, evaluated over the scenarios */
  projects?: ProjectEvaluation[];
  /** scenarios that could not be solved: marked, with their diagnosis */
  failedScenarios?: FailedScenario[];
  /** the diagrams' title block (date, version, case hash); the scenario is filled in per diagram */
  titleBlock?: TitleBlock;
  /** the savings found (`report --savings`): ranked measures, the roadmap and their charts */
  savings?: SavingsResult;
  /** the year of the case's profile (`report --year`): its charts and tables */
  year?: { result: YearResult; records: readonly PeriodRecord[] };
  /** the meters reconciled (`report --readings`): tests, diagram of reconciled flows, tables */
  reconciled?: { outcome: ReconcileOutcome; readingsFile: string };
}

/** The display format of a plant's own unit system, currency and atmosphere. */
export function plantDisplayFormat(plant: Plant): DisplayFormat {
  return displayFormat(plant.site.unitSystem, plant.site.currency, plant.site.atmosphericPressure);
}

export function htmlReport(plant: Plant, result: PlantResult, options: ReportOptions = {}): string {
  const format = plantDisplayFormat(plant);
  const tables = reportTables(result, format);
  const e = escapeMarkup;
  const body: string[] = [];
  body.push(`<header><h1>${e(result.plant)}</h1>`);
  if (options.subtitle) body.push(`<p class="subtitle">${e(options.subtitle)}</p>`);
  if (plant.description) body.push(`<p class="description">${e(plant.description)}</p>`);
  body.push(
    `<p class="facts">${e(objectiveWords(result.objective))} balance · ${format.money(result.totals.cost_per_h)} per hour · ${e(format.fuelRate(result.totals.fuel_kW))} fuel · ${result.passes.length} passes (${e(result.backend)})${options.generatedAt ? ` · made ${e(options.generatedAt)}` : ''}</p>`,
    '</header>',
  );
  const scenarios = options.scenarios ?? [];
  const failed = options.failedScenarios ?? [];
  const projects = options.projects ?? [];
  if (failed.length > 0) body.splice(body.length - 1, 0, `<p class="caution failed">${failed.length} scenario${failed.length === 1 ? '' : 's'} could not be solved: ${failed.map((scenario) => e(scenario.id)).join(', ')}. See <a href="#failed-scenarios">the diagnosis</a>.</p>`);
  body.push(
    `<nav><a href="#diagram">Diagram</a> <a href="#tables">Tables</a> <a href="#charts">Charts</a>${scenarios.length > 0 ? ' <a href="#scenarios">Scenarios</a>' : ''}${failed.length > 0 ? ' <a href="#failed-scenarios">Failed scenarios</a>' : ''}${projects.length > 0 ? ' <a href="#projects">Projects</a>' : ''}${options.savings ? ' <a href="#savings">Savings</a>' : ''}${options.year ? ' <a href="#year">Year</a>' : ''}${options.reconciled ? ' <a href="#reconciliation">Meters</a>' : ''} <a href="#audit">Audit</a> <a href="#assumptions">Assumptions</a> <a href="#safety">Safety</a></nav>`,
  );
  body.push(
    `<section id="diagram"><h2>Steam balance${scenarios.length > 0 ? ', plant as written' : ''}</h2>`,
    '<p class="hint">Headers from the highest pressure at the top; sources feed them from above, users hang below, turbines and letdowns join them. Click a unit to find its row in the tables. <button type="button" id="fit-toggle">Actual size</button></p>',
    `<div class="diagram-wrap fit">${balanceDiagram(result, format, options.titleBlock ? { ...options.titleBlock, scenario: options.titleBlock.scenario ?? (scenarios.length > 0 ? 'plant as written' : undefined) } : null)}</div></section>`,
  );
  body.push('<section id="tables"><h2>Tables</h2>');
  for (const table of tables.filter((candidate) => candidate.id !== 'audit' && candidate.id !== 'independent-audit')) body.push(tableHtml(table));
  body.push('</section>');
  body.push('<section id="charts"><h2>Charts</h2><div class="charts">', costChart(result, format), valueChart(result, format), '</div></section>');
  if (failed.length > 0) body.push(failedScenariosHtml(failed));
  if (scenarios.length > 0) {
    body.push(
      '<section id="scenarios"><h2>Scenarios</h2>',
      tableHtml(comparisonTable(scenarios)),
      `<div class="charts">${annualCostChart(scenarios)}${scenarioCostChart(scenarios)}</div>`,
      '</section>',
      ...scenarios.map((section) => scenarioSectionHtml(section, tableHtml, options.titleBlock ? { ...options.titleBlock, scenario: `scenario ${section.id}: ${section.name}` } : null)),
    );
  }
  if (projects.length > 0) {
    body.push(
      '<section id="projects"><h2>Projects</h2>',
      tableHtml(projectSummaryTable(projects, format)),
      tableHtml(projectScenarioTable(projects, format)),
      `<div class="charts">${projectChart(projects, format)}</div>`,
      '<p class="hint">Savings are differences of two solves of the whole plant, scenario by scenario, weighted by hours; capital and O&amp;M are as the case states them.</p>',
      '</section>',
    );
  }
  if (options.savings) body.push(savingsSectionHtml(options.savings, format, tableHtml, e));
  if (options.year) body.push(yearSectionHtml(options.year.result, options.year.records, format, tableHtml));
  if (options.reconciled) {
    const { outcome } = options.reconciled;
    const block = options.titleBlock ? { ...options.titleBlock, scenario: `reconciled meters (${basename(options.reconciled.readingsFile)})` } : null;
    const { svg, drawing } = reconciledDiagram(result, outcome, format, block);
    const caption = [
      `The balance with the reconciled flows: every stream the meters make observable carries its estimate, and each header's flow is the sum of what enters it${outcome.suspects.length > 0 ? '; suspect meters are noted under their units' : ''}.`,
      drawing.modelled.length > 0 ? `Not observable from the meters, so drawn at the model's solve of the case: ${drawing.modelled.join(', ')}.` : 'Every flowing stream is observable from the meters.',
      ...(drawing.atZero.length > 0 ? [`Held at zero by the fit (flows are zero or more): ${drawing.atZero.join(', ')}.`] : []),
      'Powers, heat duties, temperatures and steam values are the model\'s.',
    ];
    const figure = `<div class="diagram-wrap fit">${svg}</div><p class="hint">${e(caption.join(' '))}</p>`;
    body.push(reconcileSectionHtml(outcome, format.system, options.reconciled.readingsFile, tableHtml, e, figure));
  }
  const audit = result.audit;
  body.push(
    '<section id="audit"><h2>Audit</h2>',
    `<p>Every balance recomputed from the final flows and states. Largest mass residual ${format.massResidual(audit.max_mass_residual_kg_s)}, largest energy residual ${format.heatResidual(audit.max_energy_residual_kW)}; worst: ${e(audit.worst)}.</p>`,
    tableHtml(tables.find((table) => table.id === 'audit') as ReportTable),
    `<p>Independent audit: every stream state and unit relation worked out again from the case with IAPWS-IF97, and the solve's flows put through them; entropy generation must not be negative. Result: ${e(audit.independent.summary)}.</p>`,
    tableHtml(tables.find((table) => table.id === 'independent-audit') as ReportTable),
    '</section>',
  );
  const assumptions = reportAssumptions(plant);
  body.push('<section id="assumptions"><h2>Assumptions</h2><ul>', ...assumptions.general.map((line) => `<li>${e(line)}</li>`), '</ul>');
  if (assumptions.defaults.length > 0) {
    body.push('<h3>Defaults applied (keys the case left out)</h3>', tableHtml({ id: 'defaults', title: '', headings: ['where', 'value used', 'why'], rows: assumptions.defaults }));
  } else {
    body.push('<p>No defaults were applied: the case states every key that changes the physics or the cost.</p>');
  }
  body.push('</section>');
  body.push(`<section id="safety"><h2>Safety</h2><p class="caution">${e(SAFETY_CAUTION.replace(/\n/g, ' '))}</p></section>`);

  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    // Nothing may be fetched: inline style, and only the report's own script
    // (by its hash), so no script that reached the page by any other road runs.
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; script-src '${SCRIPT_HASH}'; img-src data:">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${e(result.plant)}: steam balance report</title>`,
    `<style>${REPORT_STYLE}</style>`,
    '</head>',
    '<body>',
    ...body,
    `<script>${REPORT_SCRIPT}</script>`,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

function tableHtml(table: ReportTable, prefix = 'table'): string {
  const e = escapeMarkup;
  const parts: string[] = [];
  if (table.title) parts.push(`<h3 id="${e(prefix)}-${e(table.id)}">${e(table.title)}</h3>`);
  if (table.rows.length === 0) return `${parts.join('')}<p class="none">none</p>`;
  const numeric = table.headings.map((_, column) => column > 0 && table.rows.every((row) => /^[-+]?[\d.]/.test(row[column] ?? '') || row[column] === '-'));
  parts.push(`<table class="data" data-table="${e(table.id)}"><thead><tr>${table.headings.map((heading) => `<th>${e(heading)}</th>`).join('')}</tr></thead><tbody>`);
  table.rows.forEach((row, index) => {
    const alarm = table.alarmRows?.includes(index) ? ' class="vent"' : '';
    parts.push(`<tr data-id="${e(row[0] ?? '')}"${alarm}>${row.map((cell, column) => `<td${numeric[column] ? ' class="num"' : ''}>${e(cell)}</td>`).join('')}</tr>`);
  });
  parts.push('</tbody></table>');
  return parts.join('');
}

function costChart(result: PlantResult, format: DisplayFormat): string {
  const cost = result.totals.cost_by_component_per_h;
  const bars = (['fuel', 'power', 'steam', 'water', 'carbon'] as const).map((key) => ({ label: key, value: cost[key], text: `${format.money(cost[key])}/h` }));
  return barChartSvg('chart-cost', `Hourly cost by component (${format.currency} per hour)`, bars);
}

function valueChart(result: PlantResult, format: DisplayFormat): string {
  const headers = [...result.headers].sort((a, b) => b.pressure_MPa - a.pressure_MPa);
  const bars = headers.map((header) => ({
    label: header.id,
    value: header.marginal_value_per_t === null ? 0 : steamValueNumber(header.marginal_value_per_t, result.marginal_value_unit, format.system),
    text: format.valuePerMass(header.marginal_value_per_t, result.marginal_value_unit),
  }));
  return barChartSvg('chart-value', `Marginal steam value per header (${format.valueUnit(result.marginal_value_unit)})`, bars);
}

export function objectiveWords(objective: string): string {
  if (objective === 'minimumCost') return 'Minimum-cost';
  if (objective === 'minimumFuel') return 'Minimum-fuel';
  if (objective === 'minimumCo2') return 'Minimum-CO2';
  return 'Maximum-power';
}
