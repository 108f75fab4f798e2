// The solved plant as plain data: headers, streams, units, totals, KPIs and
// the audit, in SI numbers. The report layer formats it; `--json` prints it.
import { statePH } from '../properties/index.js';
import type { Audit } from './audit.js';
import type { IndependentAudit } from './verify/index.js';
import { GJ_PER_KWH, T_PER_H_PER_KG_S, type CostComponent } from './context.js';
import type { UnitReport } from './contribution.js';
import { ATMOSPHERE, DRAIN, solvedEnthalpy } from './network.js';
import type { Objective } from '../model/index.js';
import type { MarginalValue } from './marginalValues.js';
import type { CommitmentTried, PassRecord, PlantOutcome } from './solvePlant.js';
import { explainVents, type VentExplanation } from './explainVents.js';
import { formatQuantity } from '../units/index.js';

export interface StreamResult {
  from: string;
  to: string;
  kind: string;
  mass_kg_s: number;
  h_kJ_kg: number;
  p_MPa: number;
  T_K: number | null;
}

export interface HeaderResult {
  id: string;
  name: string;
  pressure_MPa: number;
  T_K: number;
  h_kJ_kg: number;
  state: 'controlled' | 'floating';
  /** vapour quality x (kg vapour per kg) when the header is wet or just saturated; null when superheated */
  quality: number | null;
  /** T - Tsat, K, when superheated (0 at dry saturation); null when wet */
  superheat_K: number | null;
  /**
   * What one more tonne drawn at this header (and not returned) costs, in the
   * objective's units per t (see `marginal_value_unit`): the converged plant's
   * dual, or where one more and one less differ, the mean of the two
   */
  marginal_value_per_t: number | null;
  /** one more and one less tonne, each measured by re-solving, and what sets each */
  marginal: {
    more_per_t: number | null;
    less_per_t: number | null;
    more_set_by: string[];
    less_set_by: string[];
    /** true where one more and one less tonne differ by more than 1 % (0.05 per t at least) */
    differs: boolean;
  };
  inflow_kg_s: number;
  outflow_kg_s: number;
  inflows: { from: string; kind: string; mass_kg_s: number }[];
  outflows: { to: string; kind: string; mass_kg_s: number }[];
  vent_kg_s: number;
  heat_loss_kW?: number;
}

export interface Totals {
  cost_per_h: number;
  cost_by_component_per_h: Record<CostComponent, number>;
  fuel_kW: number;
  fuel_GJ_per_h: number;
  power_generated_kW: number;
  power_imported_kW: number;
  power_exported_kW: number;
  site_demand_kW: number;
  modelled_loads_kW: number;
  makeup_kg_s: number;
  vented_kg_s: number;
  let_down_kg_s: number;
  steam_raised_kg_s: number;
  process_steam_kg_s: number;
  process_heat_kW: number;
  co2_kg_per_h: number;
}

export interface Kpis {
  /** heat absorbed by fired boilers (and duct firing) over their fuel */
  boiler_fuel_to_steam_efficiency: number | null;
  /** condensate returned (to the deaerator or a flash tank, not to drain) over process steam used */
  condensate_return_fraction: number | null;
  /** of the steam stepped down in pressure, the share through letdown valves rather than turbines */
  let_down_fraction: number | null;
  /** steam vented (headers, flash tanks, deaerator) over steam raised */
  vented_fraction: number | null;
  /** turbine power per tonne of throttle steam, kWh/t */
  power_per_throttle_t_kWh: number | null;
  /** fuel to replace the heat the turbines take from the steam (work and condenser), at boiler efficiency, per kWh generated: kJ/kWh */
  fuel_chargeable_to_power_kJ_per_kWh: number | null;
  /** (useful process heat + net power) / fuel energy; waste heat is not fuel, so this can pass 100 % */
  site_useful_energy_efficiency: number | null;
  /** (useful process heat + net power) / (fuel + recovered waste heat + imported steam energy) */
  site_useful_energy_efficiency_all_inputs: number | null;
}

export interface PlantResult {
  plant: string;
  objective: string;
  backend: string;
  currency: string;
  unit_system: 'si' | 'us';
  headers: HeaderResult[];
  streams: StreamResult[];
  units: UnitReport[];
  totals: Totals;
  kpis: Kpis;
  audit: {
    max_mass_residual_kg_s: number;
    max_energy_residual_kW: number;
    worst_relative: number;
    worst: string;
    balances: Audit['balances'];
    site_energy_balance: Audit['site'];
    /** every stream and unit worked out again from the case with IF97: per unit mass, energy, entropy generation */
    independent: IndependentAudit;
  };
  passes: PassRecord[];
  marginal_power_value_per_kWh: number | null;
  /** the unit marginal steam values are counted in, per t of steam */
  marginal_value_unit: (typeof MARGINAL_VALUE_UNIT)[Objective];
  /** on/off decisions tried, each converged on its own */
  commitments: CommitmentTried[];
  /** the integer decisions kept (on/off, 1 running, and load segments of non-convex fuel curves), by variable name */
  commitment: Record<string, number>;
  /** every vented flow and why that steam has no better use, its flows in the case's units */
  vents: VentExplanation[];
}

export function plantResult(outcome: Extract<PlantOutcome, { ok: true }>): PlantResult {
  const { plant, pass, solution, audit } = outcome;
  const context = pass.context;
  const units = outcome.contributions.map((unit) => unit.report(solution));
  const byId = new Map(units.map((unit) => [unit.id, unit]));
  const num = (unit: UnitReport | undefined, key: string): number => {
    const value = unit?.values[key];
    return typeof value === 'number' ? value : 0;
  };

  const streams: StreamResult[] = context.streams.map((stream) => {
    let temperature: number | null = null;
    const h = solvedEnthalpy(stream, solution);
    try {
      temperature = statePH(stream.p, h).T;
    } catch {
      temperature = null;
    }
    return { from: stream.from, to: stream.to, kind: stream.kind, mass_kg_s: solution.evaluate(stream.flow), h_kJ_kg: h, p_MPa: stream.p, T_K: temperature };
  });

  const headers: HeaderResult[] = plant.headers.map((header) => {
    const h = outcome.headerEnthalpy.get(header.id) ?? context.h(header.id);
    const steam = statePH(header.pressure, h);
    const inflows = streams.filter((stream) => stream.to === header.id);
    const outflows = streams.filter((stream) => stream.from === header.id);
    const value = outcome.marginalValues.find((entry) => entry.header === header.id);
    const marginal = marginalOf(value, outcome.objective);
    const result: HeaderResult = {
      id: header.id,
      name: header.name,
      pressure_MPa: header.pressure,
      T_K: steam.T,
      quality: steam.x ?? (steam.superheat === 0 ? 1 : null),
      superheat_K: steam.x !== null ? (steam.x >= 1 ? 0 : null) : steam.superheat,
      h_kJ_kg: h,
      state: header.state.kind,
      marginal_value_per_t: marginal.headline,
      marginal: marginal.sides,
      inflow_kg_s: inflows.reduce((total, stream) => total + stream.mass_kg_s, 0),
      outflow_kg_s: outflows.reduce((total, stream) => total + stream.mass_kg_s, 0),
      inflows: inflows.map((stream) => ({ from: stream.from, kind: stream.kind, mass_kg_s: stream.mass_kg_s })),
      outflows: outflows.map((stream) => ({ to: stream.to, kind: stream.kind, mass_kg_s: stream.mass_kg_s })),
      vent_kg_s: outflows.filter((stream) => stream.to === ATMOSPHERE).reduce((total, stream) => total + stream.mass_kg_s, 0),
    };
    if (header.heatLoss > 0) result.heat_loss_kW = result.inflow_kg_s > 1e-9 ? header.heatLoss : 0;
    return result;
  });

  const cost = {} as Record<CostComponent, number>;
  for (const component of ['fuel', 'power', 'steam', 'water', 'carbon'] as CostComponent[]) {
    const ledger = context.cost.get(component);
    cost[component] = ledger ? solution.evaluate(ledger) : 0;
  }
  let fuel = 0;
  for (const fired of context.fuel.values()) fuel += solution.evaluate(fired);
  const grid = byId.get('grid');
  const sum = (kind: string, key: string): number => units.filter((unit) => unit.kind === kind).reduce((total, unit) => total + num(unit, key), 0);
  const vented = streams.filter((stream) => stream.to === ATMOSPHERE).reduce((total, stream) => total + stream.mass_kg_s, 0);
  const steamRaised = sum('boiler', 'steam_kg_s') + sum('heatRecoveryBoiler', 'steam_kg_s') + sum('steamImport', 'steam_kg_s');
  const processSteam = sum('user', 'steam_kg_s');
  const userIds = new Set(plant.users.map((user) => user.id));
  const processHeat = sum('user', 'heat_kW');
  const generated = num(grid, 'generated_kW');
  const loads = num(grid, 'modelled_loads_kW');
  const totals: Totals = {
    cost_per_h: Object.values(cost).reduce((total, value) => total + value, 0),
    cost_by_component_per_h: cost,
    fuel_kW: fuel,
    fuel_GJ_per_h: fuel * GJ_PER_KWH,
    power_generated_kW: generated,
    power_imported_kW: num(grid, 'import_kW'),
    power_exported_kW: num(grid, 'export_kW'),
    site_demand_kW: plant.power.siteDemand,
    modelled_loads_kW: loads,
    makeup_kg_s: streams.filter((stream) => stream.from === 'makeup').reduce((total, stream) => total + stream.mass_kg_s, 0),
    vented_kg_s: vented,
    let_down_kg_s: sum('letdown', 'steam_kg_s'),
    steam_raised_kg_s: steamRaised,
    process_steam_kg_s: processSteam,
    process_heat_kW: processHeat,
    co2_kg_per_h: solution.evaluate(context.co2),
  };

  const firedHeat = sum('boiler', 'heat_absorbed_kW');
  const firedFuel = sum('boiler', 'fuel_kW');
  const boilerEfficiency = firedFuel > 0 ? firedHeat / firedFuel : null;
  const throttle = sum('turbine', 'inlet_kg_s');
  const turbinePower = sum('turbine', 'power_kW');
  const ratio = (a: number, b: number): number | null => (b > 1e-12 ? a / b : null);
  const kpis: Kpis = {
    boiler_fuel_to_steam_efficiency: boilerEfficiency,
    // Condensate a user collects but sends to drain is lost like any other: only what reaches the deaerator or a flash tank counts.
    condensate_return_fraction: ratio(
      streams.filter((stream) => stream.kind === 'condensate' && userIds.has(stream.from) && stream.to !== DRAIN).reduce((total, stream) => total + stream.mass_kg_s, 0),
      processSteam,
    ),
    let_down_fraction: ratio(totals.let_down_kg_s, totals.let_down_kg_s + throttle),
    vented_fraction: ratio(vented, steamRaised),
    power_per_throttle_t_kWh: ratio(turbinePower, throttle * T_PER_H_PER_KG_S),
    // Common practice, no single source: the heat the turbines take out of the steam
    // (shaft work plus condenser duty) must be raised again by the boilers.
    fuel_chargeable_to_power_kJ_per_kWh:
      boilerEfficiency && generated > 0 ? (((audit.site.turbine_work_kW + audit.site.condenser_kW) / boilerEfficiency) * 3600) / generated : null,
    site_useful_energy_efficiency: ratio(processHeat + generated - loads, fuel),
    site_useful_energy_efficiency_all_inputs: ratio(processHeat + generated - loads, fuel + audit.site.waste_heat_kW + audit.site.imported_steam_kW),
  };

  return {
    plant: plant.name,
    objective: outcome.objective,
    backend: outcome.backend,
    currency: plant.site.currency,
    unit_system: plant.site.unitSystem,
    headers,
    streams,
    units,
    totals,
    kpis,
    audit: {
      max_mass_residual_kg_s: audit.maxMassResidual,
      max_energy_residual_kW: audit.maxEnergyResidual,
      worst_relative: audit.worstRelative,
      worst: audit.worstDescription,
      balances: audit.balances,
      site_energy_balance: audit.site,
      independent: outcome.independentAudit,
    },
    passes: outcome.passes,
    marginal_power_value_per_kWh: solution.shadowPrice('site.power'),
    marginal_value_unit: MARGINAL_VALUE_UNIT[outcome.objective],
    commitments: outcome.commitments,
    commitment: Object.fromEntries(outcome.commitment),
    vents: explainVents({ headers, streams, units }, ventWords(plant.site.unitSystem)),
  };
}

/** Flows and temperatures in a vent's sentence, as the report shows them: in the case's unit system. */
function ventWords(system: 'si' | 'us'): { flow(kg_s: number): string; temperature(K: number): string } {
  return {
    flow: (kg_s) => formatQuantity(Math.abs(kg_s) < 1e-7 ? 0 : kg_s, 'massFlow', system),
    temperature: (K) => formatQuantity(K, 'temperature', system),
  };
}

/** What a marginal steam value is counted in, per objective (per t of steam). */
export const MARGINAL_VALUE_UNIT = { minimumCost: 'currency', minimumFuel: 'GJ', minimumCo2: 'kg CO2', maximumPower: 'kWh' } as const;

/**
 * Per tonne, as a cost of one more tonne in the objective's units: a maximum-power
 * objective's values are the power given up, so its sign turns.
 */
function marginalOf(value: MarginalValue | undefined, objective: Objective): { headline: number | null; sides: HeaderResult['marginal'] } {
  const sign = objective === 'maximumPower' ? -1 : 1;
  const perT = (perKgS: number | null | undefined): number | null => (perKgS === null || perKgS === undefined ? null : (sign * perKgS) / T_PER_H_PER_KG_S);
  const dual = perT(value?.dual);
  const more = perT(value?.more);
  const less = perT(value?.less);
  const differs = more !== null && less !== null && Math.abs(more - less) > Math.max(0.05, 0.01 * Math.max(Math.abs(more), Math.abs(less)));
  let headline = dual;
  if (more !== null && less !== null) {
    const low = Math.min(more, less);
    const high = Math.max(more, less);
    const slack = Math.max(0.05, 0.01 * Math.abs(high));
    if (headline === null || headline < low - slack || headline > high + slack) headline = (more + less) / 2;
    if (!differs) headline = dual !== null && Math.abs(dual - (more + less) / 2) <= slack ? dual : (more + less) / 2;
  }
  return { headline, sides: { more_per_t: more, less_per_t: less, more_set_by: value?.moreSetBy ?? [], less_set_by: value?.lessSetBy ?? [], differs } };
}
