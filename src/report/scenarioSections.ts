// Scenarios side by side: a comparison table, annual cost charts, and one
// diagram with its tables per scenario. Takes plain solved plants, so it does
// not depend on how the scenarios layer solved them.
import type { Plant } from '../model/index.js';
import type { PlantResult } from '../plant/index.js';
import { barChartSvg } from './barChart.js';
import { balanceDiagram } from './balanceDiagram.js';
import type { TitleBlock } from './diagram/index.js';
import { displayFormat, type DisplayFormat } from './displayFormat.js';
import { escapeMarkup } from './escape.js';
import { reportTables, type ReportTable } from './reportTables.js';

export interface ScenarioSection {
  id: string;
  name: string;
  /** operating hours a year */
  hours: number;
  plant: Plant;
  result: PlantResult;
}

/** A scenario that could not be solved: the report marks it with its diagnosis. */
export interface FailedScenario {
  id: string;
  name: string;
  hours: number;
  reason: string;
  /** what failed and why, in plant terms (the diagnosis) */
  message: string;
}

const COMPONENTS = ['fuel', 'power', 'steam', 'water', 'carbon'] as const;

/** The scenarios that could not be solved, each with its diagnosis, and what the totals leave out. */
export function failedScenariosHtml(failed: FailedScenario[]): string {
  const e = escapeMarkup;
  return [
    '<section id="failed-scenarios" class="failed"><h2>Scenarios that could not be solved</h2>',
    `<p class="caution">${failed.length === 1 ? 'This scenario has' : `These ${failed.length} scenarios have`} no balance. The scenario table, the charts and the annual total cover the solved scenarios only (${failed.reduce((total, scenario) => total + scenario.hours, 0)} h a year left out).</p>`,
    '<ul>',
    ...failed.map((scenario) => `<li><strong>${e(scenario.id)}</strong> (${e(scenario.name)}, ${scenario.hours} h a year): ${e(scenario.reason)}. ${e(scenario.message)}</li>`),
    '</ul>',
    '</section>',
  ].join('\n');
}

function formatOf(plant: Plant): DisplayFormat {
  return displayFormat(plant.site.unitSystem, plant.site.currency, plant.site.atmosphericPressure);
}

/** One row per scenario: hours, cost per hour and per year, fuel, power, vents and the marginal value at every header. */
export function comparisonTable(sections: ScenarioSection[]): ReportTable {
  const format = formatOf(sections[0].plant);
  const headerIds = [...sections[0].result.headers].sort((a, b) => b.pressure_MPa - a.pressure_MPa).map((header) => header.id);
  const rows = sections.map((section) => {
    const totals = section.result.totals;
    const value = (id: string): string => format.valuePerMass(section.result.headers.find((header) => header.id === id)?.marginal_value_per_t ?? null, section.result.marginal_value_unit);
    return [
      section.id,
      section.name,
      `${section.hours} h`,
      format.money(totals.cost_per_h),
      format.money(totals.cost_per_h * section.hours),
      format.fuelRate(totals.fuel_kW),
      format.power(totals.power_generated_kW),
      format.power(totals.power_imported_kW),
      format.flow(totals.vented_kg_s),
      format.flow(totals.let_down_kg_s),
      ...headerIds.map(value),
    ];
  });
  const hours = sections.reduce((total, section) => total + section.hours, 0);
  const annual = sections.reduce((total, section) => total + section.hours * section.result.totals.cost_per_h, 0);
  rows.push(['year', 'all scenarios', `${hours} h`, '-', format.money(annual), '-', '-', '-', '-', '-', ...headerIds.map(() => '-')]);
  return {
    id: 'scenarios',
    title: 'Scenarios side by side',
    headings: ['scenario', 'name', 'hours', 'cost per hour', 'cost per year', 'fuel', 'power made', 'power bought', 'vented', 'let down', ...headerIds.map((id) => `${id} steam value`)],
    rows,
  };
}

export function annualCostChart(sections: ScenarioSection[]): string {
  const format = formatOf(sections[0].plant);
  const bars = COMPONENTS.map((component) => {
    const value = sections.reduce((total, section) => total + section.hours * section.result.totals.cost_by_component_per_h[component], 0);
    return { label: component, value, text: `${format.money(value)}/yr` };
  });
  return barChartSvg('chart-annual-cost', `Annual cost by component, all scenarios (${format.currency} per year)`, bars);
}

export function scenarioCostChart(sections: ScenarioSection[]): string {
  const format = formatOf(sections[0].plant);
  const bars = sections.map((section) => ({ label: section.id, value: section.hours * section.result.totals.cost_per_h, text: `${format.money(section.hours * section.result.totals.cost_per_h)}/yr` }));
  return barChartSvg('chart-scenario-cost', `Annual cost by scenario (${format.currency} per year)`, bars);
}

/** Diagram and tables of one scenario; `tableHtml` renders tables the same way as the main report. */
export function scenarioSectionHtml(section: ScenarioSection, tableHtml: (table: ReportTable, prefix: string) => string, block: TitleBlock | null = null): string {
  const format = formatOf(section.plant);
  const e = escapeMarkup;
  const prefix = `scenario-${section.id}`;
  const tables = reportTables(section.result, format).filter((table) => table.id !== 'audit' && table.id !== 'independent-audit');
  const audit = section.result.audit;
  return [
    `<section id="${e(prefix)}" class="scenario"><h2>Scenario ${e(section.id)}: ${e(section.name)}</h2>`,
    `<p class="facts">${section.hours} h a year · ${format.money(section.result.totals.cost_per_h)} per hour · audit: largest mass residual ${format.massResidual(audit.max_mass_residual_kg_s)}, energy ${format.heatResidual(audit.max_energy_residual_kW)}; independent audit: ${audit.independent.ok ? 'every unit passes' : 'FAILS'}</p>`,
    `<div class="diagram-wrap fit">${balanceDiagram(section.result, format, block)}</div>`,
    `<details><summary>Tables of scenario ${e(section.id)}</summary>`,
    ...tables.map((table) => tableHtml(table, prefix)),
    '</details>',
    '</section>',
  ].join('\n');
}
