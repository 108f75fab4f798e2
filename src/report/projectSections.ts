// Projects in the HTML report: what each saves by component, its payback,
// NPV and IRR, and its physical changes per scenario, from the same
// evaluation `evaluate` prints (each project solved on every scenario).
import type { ProjectEvaluation } from '../scenarios/index.js';
import { barChartSvg } from './barChart.js';
import type { DisplayFormat } from './displayFormat.js';
import type { ReportTable } from './reportTables.js';

const KG_S_PER_T_H = 1 / 3.6;
const COMPONENTS = ['fuel', 'power', 'steam', 'water', 'carbon'] as const;

function fixed(value: number, digits: number): string {
  if (Math.abs(value) < 0.5 * 10 ** -digits) value = 0; // no "-0.0"
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** One row per project: capital, annual saving by component, net, payback, NPV, IRR. */
export function projectSummaryTable(projects: ProjectEvaluation[], format: DisplayFormat): ReportTable {
  const money = format.money;
  return {
    id: 'projects',
    title: 'Projects, each against the plant without it, over every scenario weighted by its hours',
    headings: ['project', 'name', 'capital', ...COMPONENTS.map((component) => `${component} saved per year`), 'saving per year', 'fixed O&M per year', 'net per year', 'simple payback', 'NPV', 'IRR'],
    rows: projects.map((project) => {
      if (!project.ok) {
        const why = project.failed.map((failure) => `${failure.scenario} (${failure.which}): ${failure.message}`).join('; ');
        return [project.id, project.name, money(project.capitalCost), ...COMPONENTS.map(() => '-'), `NOT EVALUATED: ${why}`, money(project.fixedOmPerYear), '-', '-', '-', '-'];
      }
      return [
        project.id,
        project.name,
        money(project.capitalCost),
        ...COMPONENTS.map((component) => money(project.annual_saving_by_component[component] ?? 0)),
        money(project.annual_saving),
        money(project.fixedOmPerYear),
        money(project.net_annual_saving),
        project.simple_payback_years === null ? 'never (no net saving)' : `${fixed(project.simple_payback_years, 1)} years`,
        `${money(project.npv)} at ${fixed(project.discountRate * 100, 1)} %`,
        project.irr === null ? 'none (no sign change)' : `${fixed(project.irr * 100, 1)} %`,
      ];
    }),
  };
}

/** Per project and scenario: the saving and the physical changes, in the case's units. */
export function projectScenarioTable(projects: ProjectEvaluation[], format: DisplayFormat): ReportTable {
  const flow = (t_h: number): string => format.flow(t_h * KG_S_PER_T_H);
  const rows: string[][] = [];
  for (const project of projects) {
    if (!project.ok) continue;
    for (const change of project.scenarios) {
      rows.push([project.id, change.scenario, `${fixed(change.hours, 0)} h`, `${format.money(change.saving_per_h)} per hour`, flow(change.vented_less_t_per_h), flow(change.let_down_less_t_per_h), format.power(change.generated_more_MW * 1000), format.fuelRate(change.fuel_less_MW * 1000)]);
    }
  }
  return {
    id: 'project-scenarios',
    title: 'What each project changes, scenario by scenario',
    headings: ['project', 'scenario', 'hours', 'saving', 'vented less', 'let down less', 'generated more', 'fuel less'],
    rows,
  };
}

/** Net annual saving and NPV of each evaluated project, as bars. */
export function projectChart(projects: ProjectEvaluation[], format: DisplayFormat): string {
  const bars = projects.flatMap((project) => (project.ok ? [{ label: project.id, value: project.npv, text: `NPV ${format.money(project.npv)}` }] : []));
  return barChartSvg('chart-project-npv', `NPV of each project (${format.currency})`, bars);
}
