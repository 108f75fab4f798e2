// Project evaluation and the letdown-to-power screen as text tables, in the
// case's unit system (flows in t/h or klb/h, fuel in MW or MMBtu/h, enthalpy
// in kJ/kg or Btu/lb, steam values per t or per klb).
import type { LetdownScreenRow, ProjectEvaluation } from '../scenarios/index.js';
import { perMassValue, type DisplayFormat } from './displayFormat.js';
import { table } from './table.js';

const KG_S_PER_T_H = 1 / 3.6;

function money(value: number): string {
  return fixed(value, 0);
}

function fixed(value: number, digits: number): string {
  if (Math.abs(value) < 0.5 * 10 ** -digits) value = 0; // no "-0.000"
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

export function projectsText(projects: ProjectEvaluation[], format: DisplayFormat): string {
  const { currency, flowUnit } = format;
  // The evaluation's physical changes are in t/h and MW.
  const flowOfTH = (t_h: number): string => fixed(format.flowValue(t_h * KG_S_PER_T_H), 3);
  const fuelOfMW = (MW: number): string => fixed(format.fuelRateValue(MW * 1000), 3);
  const sections = projects.map((project) => {
    const head = `${project.id}: ${project.name}\n  capital ${money(project.capitalCost)} ${currency}, life ${project.lifeYears} years, discount rate ${fixed(project.discountRate * 100, 1)} %, fixed O&M ${money(project.fixedOmPerYear)} ${currency}/yr`;
    if (!project.ok) return `${head}\n  NOT EVALUATED:\n${project.failed.map((failure) => `    ${failure.scenario} (${failure.which}): ${failure.message}`).join('\n')}`;
    const perScenario = table(
      ['scenario', 'hours', `saving ${currency}/h`, `vented less ${flowUnit}`, `let down less ${flowUnit}`, 'generated more MW', `fuel less ${format.fuelRateUnit}`],
      project.scenarios.map((change) => [change.scenario, fixed(change.hours, 0), fixed(change.saving_per_h, 2), flowOfTH(change.vented_less_t_per_h), flowOfTH(change.let_down_less_t_per_h), fixed(change.generated_more_MW, 3), fuelOfMW(change.fuel_less_MW)]),
    );
    const components = Object.entries(project.annual_saving_by_component).map(([component, value]) => `${component} ${money(value)}`).join(', ');
    const payback = project.simple_payback_years === null ? 'never (no net saving)' : `${fixed(project.simple_payback_years, 1)} years`;
    const irr = project.irr === null ? 'no IRR (the cash flows do not change sign)' : `${fixed(project.irr * 100, 1)} %`;
    return [
      head,
      perScenario,
      `  over the year (hours-weighted): ${flowOfTH(project.average.vented_less_t_per_h)} ${flowUnit} less vented, ${flowOfTH(project.average.let_down_less_t_per_h)} ${flowUnit} less let down, ${fixed(project.average.generated_more_MW, 3)} MW more generated`,
      `  annual saving ${money(project.annual_saving)} ${currency}/yr (${components})`,
      `  net of fixed O&M ${money(project.net_annual_saving)} ${currency}/yr; simple payback ${payback}`,
      `  NPV ${money(project.npv)} ${currency} at ${fixed(project.discountRate * 100, 1)} %; IRR ${irr}`,
    ].join('\n');
  });
  return `Projects (each against the plant without it, over every scenario weighted by its hours)\n\n${sections.join('\n\n')}\n`;
}

export function screenText(rows: LetdownScreenRow[], format: DisplayFormat, efficiency: number, generator: number): string {
  const { currency, flowUnit } = format;
  const heading = `Letdown-to-power screen: a back-pressure turbine beside each letdown carrying flow, sized for that flow, at ${fixed(efficiency * 100, 0)} % isentropic and ${fixed(generator * 100, 0)} % gearbox and generator efficiency`;
  if (rows.length === 0) return `${heading}\n  no letdown carries flow\n`;
  const body = table(
    ['scenario', 'letdown', `steam ${flowUnit}`, 'power kW', `power ${currency}/yr`, `exhaust - outlet ${format.enthalpyUnit}`, `steam lost ${flowUnit}`, `downstream ${format.valueUnit()}`, `first order ${currency}/h`, `solved ${currency}/h`, `net ${currency}/yr`],
    rows.map((row) => [
      row.scenario, row.letdown, fixed(format.flowValue(row.steam_kg_s), 2), fixed(row.power_kW, 0), money(row.power_value_per_year),
      `${fixed(format.enthalpyValue(row.downstream_h_change_kJ_kg), 1)}${row.exhaust_quality !== null ? ` (wet, x ${fixed(row.exhaust_quality, 3)})` : ''}`,
      fixed(format.flowValue(row.steam_equivalent_lost_t_per_h * KG_S_PER_T_H), 2),
      row.downstream_marginal_value_per_t === null ? '-' : fixed(perMassValue(row.downstream_marginal_value_per_t, format.system), 2),
      row.first_order_net_per_h === null ? '-' : fixed(row.first_order_net_per_h, 2),
      row.solved_saving_per_h === null ? `not solved: ${row.note ?? ''}` : fixed(row.solved_saving_per_h, 2),
      row.net_benefit_per_year === null ? '-' : money(row.net_benefit_per_year),
    ]),
  );
  return `${heading}\n\n${body}\n  "solved" is the scenario solved again with the turbine beside the letdown (sized for its flow); "first order" prices its power and the energy it takes out at the marginal values, which hold for small changes only.\n`;
}
