// Project evaluation and the letdown-to-power screen as text tables.
import type { LetdownScreenRow, ProjectEvaluation } from '../scenarios/index.js';
import { table } from './table.js';

function money(value: number): string {
  return value.toLocaleString('en-US', { maximumFractionDigits: 0 });
}

function fixed(value: number, digits: number): string {
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

export function projectsText(projects: ProjectEvaluation[], currency: string): string {
  const sections = projects.map((project) => {
    const head = `${project.id}: ${project.name}\n  capital ${money(project.capitalCost)} ${currency}, life ${project.lifeYears} years, discount rate ${fixed(project.discountRate * 100, 1)} %, fixed O&M ${money(project.fixedOmPerYear)} ${currency}/yr`;
    if (!project.ok) return `${head}\n  NOT EVALUATED:\n${project.failed.map((failure) => `    ${failure.scenario} (${failure.which}): ${failure.message}`).join('\n')}`;
    const perScenario = table(
      ['scenario', 'hours', `saving ${currency}/h`, 'vented less t/h', 'let down less t/h', 'generated more MW', 'fuel less MW'],
      project.scenarios.map((change) => [change.scenario, fixed(change.hours, 0), fixed(change.saving_per_h, 2), fixed(change.vented_less_t_per_h, 3), fixed(change.let_down_less_t_per_h, 2), fixed(change.generated_more_MW, 3), fixed(change.fuel_less_MW, 3)]),
    );
    const components = Object.entries(project.annual_saving_by_component).map(([component, value]) => `${component} ${money(value)}`).join(', ');
    const payback = project.simple_payback_years === null ? 'never (no net saving)' : `${fixed(project.simple_payback_years, 1)} years`;
    const irr = project.irr === null ? 'no IRR (the cash flows do not change sign)' : `${fixed(project.irr * 100, 1)} %`;
    return [
      head,
      perScenario,
      `  annual saving ${money(project.annual_saving)} ${currency}/yr (${components})`,
      `  net of fixed O&M ${money(project.net_annual_saving)} ${currency}/yr; simple payback ${payback}`,
      `  NPV ${money(project.npv)} ${currency} at ${fixed(project.discountRate * 100, 1)} %; IRR ${irr}`,
    ].join('\n');
  });
  return `Projects (each against the plant without it, over every scenario weighted by its hours)\n\n${sections.join('\n\n')}\n`;
}

export function screenText(rows: LetdownScreenRow[], currency: string, efficiency: number, generator: number): string {
  const heading = `Letdown-to-power screen: a back-pressure turbine in place of each letdown carrying flow, at ${fixed(efficiency * 100, 0)} % isentropic and ${fixed(generator * 100, 0)} % gearbox and generator efficiency`;
  if (rows.length === 0) return `${heading}\n  no letdown carries flow\n`;
  const body = table(
    ['scenario', 'letdown', 'steam t/h', 'power kW', `power ${currency}/yr`, 'exhaust - outlet kJ/kg', 'steam lost t/h', `downstream ${currency}/t`, `net ${currency}/yr`],
    rows.map((row) => [
      row.scenario, row.letdown, fixed(row.steam_kg_s * 3.6, 2), fixed(row.power_kW, 0), money(row.power_value_per_year),
      `${fixed(row.downstream_h_change_kJ_kg, 1)}${row.exhaust_quality !== null ? ` (wet, x ${fixed(row.exhaust_quality, 3)})` : ''}`,
      fixed(row.steam_equivalent_lost_t_per_h, 2),
      row.downstream_marginal_value_per_t === null ? '-' : fixed(row.downstream_marginal_value_per_t, 2),
      row.net_benefit_per_year === null ? '-' : money(row.net_benefit_per_year),
    ]),
  );
  return `${heading}\n\n${body}\n  Marginal values hold for small changes; add the turbine as a project for the true figure.\n`;
}
