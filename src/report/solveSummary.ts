// The readable summary `steamwright solve` prints, in the case's unit system.
import type { PlantResult } from '../plant/index.js';
import { displayFormat } from './displayFormat.js';
import { SAFETY_CAUTION } from './safety.js';
import { independentAuditTable } from './reportTables.js';
import { steamQualityCell, steamQualityWarnings } from './steamQuality.js';
import { table } from './table.js';

export interface SummaryOptions {
  atmosphericPressure_MPa: number;
}

export function solveSummary(result: PlantResult, options: SummaryOptions): string {
  const format = displayFormat(result.unit_system, result.currency, options.atmosphericPressure_MPa);
  const { flow, power, fuelRate, money, valuePerMass, percent } = format;
  const lines: string[] = [];
  lines.push(`${result.plant}: ${objectiveWords(result.objective)} balance, ${result.passes.length} passes (${result.backend})`);
  for (const pass of result.passes) if (pass.note) lines.push(`  pass ${pass.pass}: ${pass.note}`);
  lines.push('');

  lines.push('Headers');
  lines.push(
    table(
      ['header', 'pressure', 'temperature', 'steam', 'in', 'out', 'vent', 'marginal steam value'],
      result.headers.map((header) => [
        header.id,
        format.pressure(header.pressure_MPa),
        format.temperature(header.T_K),
        steamQualityCell(header, format),
        flow(header.inflow_kg_s),
        flow(header.outflow_kg_s),
        header.vent_kg_s > 1e-9 ? flow(header.vent_kg_s) : '-',
        valuePerMass(header.marginal_value_per_t, result.marginal_value_unit),
      ]),
    ),
  );

  const qualityWarnings = steamQualityWarnings(result.headers, format);
  if (qualityWarnings.length > 0) lines.push(...qualityWarnings.map((warning) => `warning: ${warning}`));
  // Each side of the marginal value, measured by re-solving, and what sets it.
  lines.push('', `Marginal steam values (${objectiveWords(result.objective)}; one tonne drawn at the header and not returned)`);
  for (const header of result.headers) {
    const marginal = header.marginal;
    if (marginal.more_per_t === null && marginal.less_per_t === null) continue;
    const by = (causes: string[]): string => (causes.length > 0 ? ` (${causes.join(', ')})` : '');
    const more = marginal.more_per_t === null ? 'no more can be raised with the units running' : `one more costs ${valuePerMass(marginal.more_per_t, result.marginal_value_unit)}${by(marginal.more_set_by)}`;
    const less = marginal.less_per_t === null ? 'it cannot take less' : `one less saves ${valuePerMass(marginal.less_per_t, result.marginal_value_unit)}${by(marginal.less_set_by)}`;
    lines.push(`  ${header.id}: ${more}; ${less}${marginal.differs ? '  <- a switching point: the two differ' : ''}`);
  }

  // Vents first, then drains; flows of one kind from one unit are added up.
  const losses = new Map<string, number>();
  for (const terminal of ['atmosphere', 'drain']) {
    for (const stream of result.streams) {
      if (stream.to !== terminal) continue;
      const label = terminal === 'atmosphere' ? `vent from ${stream.from}` : `${words(stream.kind)} from ${stream.from} to drain`;
      losses.set(label, (losses.get(label) ?? 0) + stream.mass_kg_s);
    }
  }
  const lossRows = [...losses].filter(([, value]) => value > 1e-9).map(([label, value]) => [label, flow(value)]);
  lines.push('', 'Losses (vents first: venting is usually the largest avoidable loss)');
  lines.push(lossRows.length > 0 ? table(['where', 'flow'], lossRows) : '  none');
  // Why each vented flow has no better use, worded by the plant layer in the case's units.
  if (result.vents.length > 0) {
    lines.push('', '  Why each vent has no better use:');
    for (const vent of result.vents) lines.push(`  - ${vent.reason}`);
  }

  const units = result.units;
  const sources = units.filter((unit) => ['boiler', 'heatRecoveryBoiler', 'steamImport'].includes(unit.kind));
  lines.push('', 'Sources');
  lines.push(
    table(
      ['unit', 'steam', 'load', 'fuel', 'fuel cost', 'efficiency', 'limits'],
      sources.map((unit) => [
        unit.id,
        flow(Number(unit.values.steam_kg_s ?? 0)),
        typeof unit.values.load === 'number' ? `${(unit.values.load * 100).toFixed(0)} %` : '-',
        unit.values.fuel_kW !== undefined ? fuelRate(Number(unit.values.fuel_kW)) : '-',
        typeof unit.values.fuel_cost_per_h === 'number' ? `${money(unit.values.fuel_cost_per_h)}/h` : typeof unit.values.cost_per_h === 'number' ? `${money(unit.values.cost_per_h)}/h` : '-',
        typeof unit.values.efficiency === 'number' ? `${(unit.values.efficiency * 100).toFixed(1)} %` : '-',
        unit.binding.join(', ') || '-',
      ]),
    ),
  );
  const turbines = units.filter((unit) => unit.kind === 'turbine');
  if (turbines.length > 0) {
    lines.push('', 'Turbines');
    lines.push(
      table(
        ['unit', 'throttle', 'power', 'steam rate', 'limits'],
        turbines.map((unit) => [
          unit.id,
          flow(Number(unit.values.inlet_kg_s ?? 0)),
          power(Number(unit.values.power_kW ?? 0)),
          typeof unit.values.steam_rate_kg_kWh === 'number' ? format.steamRate(unit.values.steam_rate_kg_kWh) : '-',
          unit.binding.join(', ') || '-',
        ]),
      ),
    );
  }
  const letdowns = units.filter((unit) => unit.kind === 'letdown');
  if (letdowns.length > 0) {
    lines.push('', 'Letdowns');
    lines.push(
      table(
        ['unit', 'steam', 'spray water', 'limits'],
        letdowns.map((unit) => [unit.id, flow(Number(unit.values.steam_kg_s ?? 0)), flow(Number(unit.values.spray_kg_s ?? 0)), unit.binding.join(', ') || '-']),
      ),
    );
  }
  const users = units.filter((unit) => unit.kind === 'user');
  lines.push('', 'Users');
  lines.push(
    table(
      ['unit', 'steam', 'heat', 'condensate returned'],
      users.map((unit) => [unit.id, flow(Number(unit.values.steam_kg_s)), format.heatRate(Number(unit.values.heat_kW)), flow(Number(unit.values.condensate_returned_kg_s))]),
    ),
  );

  const totals = result.totals;
  lines.push('', 'Totals');
  lines.push(
    table(
      ['', ''],
      [
        ['cost', `${money(totals.cost_per_h)} per hour`],
        ['  fuel / power / steam / water / carbon', ['fuel', 'power', 'steam', 'water', 'carbon'].map((key) => money(totals.cost_by_component_per_h[key as keyof typeof totals.cost_by_component_per_h])).join(' / ')],
        ['fuel fired', fuelRate(totals.fuel_kW)],
        ['power made / bought / sold', `${power(totals.power_generated_kW)} / ${power(totals.power_imported_kW)} / ${power(totals.power_exported_kW)}`],
        ...takeOrPay(result, power),
        ['steam raised', flow(totals.steam_raised_kg_s)],
        ['steam let down', flow(totals.let_down_kg_s)],
        ['steam vented', flow(totals.vented_kg_s)],
        ['makeup water', flow(totals.makeup_kg_s)],
        ['CO2', format.co2Rate(totals.co2_kg_per_h)],
      ],
      false,
    ),
  );
  const kpis = result.kpis;
  lines.push('', 'Key figures');
  lines.push(
    table(
      ['', ''],
      [
        ['boiler fuel-to-steam efficiency', percent(kpis.boiler_fuel_to_steam_efficiency)],
        ['condensate return', percent(kpis.condensate_return_fraction)],
        ['steam stepped down through letdowns', percent(kpis.let_down_fraction)],
        ['steam vented / raised', percent(kpis.vented_fraction)],
        [`power per ${format.perMass} of throttle steam`, format.powerPerMass(kpis.power_per_throttle_t_kWh)],
        ['fuel chargeable to power', format.fuelPerPower(kpis.fuel_chargeable_to_power_kJ_per_kWh)],
        ['site useful-energy efficiency (on fuel)', percent(kpis.site_useful_energy_efficiency)],
        ['  on fuel, waste heat and imported steam', percent(kpis.site_useful_energy_efficiency_all_inputs)],
      ],
      false,
    ),
  );
  const audit = result.audit;
  lines.push(
    '',
    `Audit: largest mass residual ${format.massResidual(audit.max_mass_residual_kg_s)}, largest energy residual ${format.heatResidual(audit.max_energy_residual_kW)} (${inCaseUnits(audit.worst, format)}).`,
  );
  const independent = independentAuditTable(result, format);
  lines.push('', `${independent.title}: ${result.audit.independent.summary}`);
  lines.push(table(independent.headings, independent.rows));
  lines.push('', SAFETY_CAUTION, '');
  return lines.join('\n');
}

/** The take-or-pay shortfall, when import falls below the minimum billed: power billed but not taken. */
function takeOrPay(result: PlantResult, power: (kW: number) => string): string[][] {
  const grid = result.units.find((unit) => unit.kind === 'grid');
  const shortfall = grid?.values.shortfall_kW;
  return typeof shortfall === 'number' && shortfall > 1e-6 ? [['  take-or-pay shortfall (billed, not taken)', power(shortfall)]] : [];
}

/** The audit's description, its kW and kg/s figures restated in the case's units. */
function inCaseUnits(text: string, format: ReturnType<typeof displayFormat>): string {
  if (format.system === 'si') return text;
  return text
    .replace(/(-?\d[\d.e+-]*) kW\b/g, (_, value: string) => format.heatResidual(Number(value)))
    .replace(/(-?\d[\d.e+-]*) kg\/s\b/g, (_, value: string) => format.massResidual(Number(value)));
}

/** "flashLiquid" -> "flash liquid". */
function words(kind: string): string {
  return kind.replace(/([a-z])([A-Z])/g, (_, lower: string, upper: string) => `${lower} ${upper.toLowerCase()}`);
}

function objectiveWords(objective: string): string {
  if (objective === 'minimumCost') return 'minimum-cost';
  if (objective === 'minimumFuel') return 'minimum-fuel';
  if (objective === 'minimumCo2') return 'minimum-CO2';
  return 'maximum-power';
}
