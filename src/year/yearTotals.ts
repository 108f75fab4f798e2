// The year's totals folded from period records in period order: annual and
// monthly sums, per unit running hours, starts, hours at each limit and
// energy, and per header the marginal value's distribution over the hours.
// Only running sums and one number per hour per header are kept, so memory
// grows with the headers, not with the size of each period's result.
import type { Plant } from '../model/index.js';
import { ruledUnits } from './switchingUnits.js';
import { COMPONENTS, trackedUnits, type Component, type PeriodRecord, type TrackedUnit } from './periodRecord.js';

const T_PER_KG = 1e-3;
const S_PER_H = 3600;
const GJ_PER_KWH = 0.0036;

export interface EnergyTotals {
  hours: number;
  /** every period's cost for its hours, start costs included */
  cost: number;
  /** start costs of units with switching rules (in cost, not in any component), currency */
  start_up_cost: number;
  cost_by_component: Record<Component, number>;
  fuel_GJ: number;
  steam_raised_t: number;
  process_steam_t: number;
  process_heat_GJ: number;
  power_generated_MWh: number;
  power_imported_MWh: number;
  power_exported_MWh: number;
  site_demand_MWh: number;
  vented_t: number;
  let_down_t: number;
  makeup_t: number;
  co2_t: number;
}

export interface MonthTotals extends EnergyTotals {
  month: number;
  /** steam raised by each boiler, waste-heat boiler and import, t */
  supply_t: Record<string, number>;
}

export interface UnitYear {
  id: string;
  kind: TrackedUnit['kind'];
  hours_running: number;
  /** stopped to running between consecutive solved periods */
  starts: number;
  /** starts times the unit's start cost, where it declares one */
  start_up_cost: number;
  hours_out_of_service: number;
  hours_at_limit: Record<string, number>;
  steam_t: number;
  fuel_GJ: number;
  power_MWh: number;
}

export interface HeaderYear {
  id: string;
  name: string;
  /** hours with a value */
  hours: number;
  /** hour-weighted */
  mean_per_t: number | null;
  min_per_t: number | null;
  p10_per_t: number | null;
  median_per_t: number | null;
  p90_per_t: number | null;
  max_per_t: number | null;
}

export interface FailedPeriod {
  index: number;
  label: string;
  hours: number;
  reason: string;
  message: string;
}

export interface YearTotals {
  periods: number;
  hours: number;
  /** hours of the periods that solved; the totals cover these */
  hours_solved: number;
  complete: boolean;
  annual: EnergyTotals;
  months: MonthTotals[];
  units: UnitYear[];
  headers: HeaderYear[];
  failed: FailedPeriod[];
  how: { neighbour: number; full: number; same_as_earlier: number; one_pass: number };
}

function emptyEnergy(): EnergyTotals {
  return {
    hours: 0, cost: 0, start_up_cost: 0, cost_by_component: Object.fromEntries(COMPONENTS.map((component) => [component, 0])) as Record<Component, number>,
    fuel_GJ: 0, steam_raised_t: 0, process_steam_t: 0, process_heat_GJ: 0, power_generated_MWh: 0, power_imported_MWh: 0,
    power_exported_MWh: 0, site_demand_MWh: 0, vented_t: 0, let_down_t: 0, makeup_t: 0, co2_t: 0,
  };
}

function addEnergy(totals: EnergyTotals, record: Extract<PeriodRecord, { ok: true }>): void {
  const hours = record.hours;
  const tonnes = (kg_s: number): number => kg_s * S_PER_H * T_PER_KG * hours;
  totals.hours += hours;
  totals.cost += record.cost_per_h * hours + (record.start_up_cost ?? 0);
  totals.start_up_cost += record.start_up_cost ?? 0;
  for (const component of COMPONENTS) totals.cost_by_component[component] += record.cost_by_component_per_h[component] * hours;
  totals.fuel_GJ += record.fuel_GJ_per_h * hours;
  totals.steam_raised_t += tonnes(record.steam_raised_kg_s);
  totals.process_steam_t += tonnes(record.process_steam_kg_s);
  totals.process_heat_GJ += record.process_heat_kW * GJ_PER_KWH * hours;
  totals.power_generated_MWh += (record.power_generated_kW * hours) / 1000;
  totals.power_imported_MWh += (record.power_imported_kW * hours) / 1000;
  totals.power_exported_MWh += (record.power_exported_kW * hours) / 1000;
  totals.site_demand_MWh += (record.site_demand_kW * hours) / 1000;
  totals.vented_t += tonnes(record.vented_kg_s);
  totals.let_down_t += tonnes(record.let_down_kg_s);
  totals.makeup_t += tonnes(record.makeup_kg_s);
  totals.co2_t += (record.co2_kg_per_h * hours) / 1000;
}

/** Hour-weighted quantile of (value, hours) pairs sorted by value. */
function quantile(sorted: { value: number; hours: number }[], total: number, fraction: number): number {
  let running = 0;
  for (const entry of sorted) {
    running += entry.hours;
    if (running >= fraction * total - 1e-9) return entry.value;
  }
  return sorted[sorted.length - 1].value;
}

/** Folds records, which must arrive in period order, into the year's totals. */
export class YearAccumulator {
  private readonly tracked: TrackedUnit[];
  private readonly annual = emptyEnergy();
  private readonly months = new Map<number, MonthTotals>();
  private readonly units: UnitYear[];
  private readonly values: { value: Float64Array; hours: Float64Array; count: number }[];
  private readonly failed: FailedPeriod[] = [];
  private readonly how = { neighbour: 0, full: 0, same_as_earlier: 0, one_pass: 0 };
  private previousRunning: (0 | 1)[] | null = null;
  private readonly startCost: number[];
  private nextIndex = 0;
  private hours = 0;

  constructor(private readonly plant: Plant, periods: number) {
    this.tracked = trackedUnits(plant);
    const rules = new Map(ruledUnits(plant).map((unit) => [unit.id, unit.rules.startCost]));
    this.startCost = this.tracked.map((unit) => rules.get(unit.id) ?? 0);
    this.units = this.tracked.map((unit) => ({ id: unit.id, kind: unit.kind, hours_running: 0, starts: 0, start_up_cost: 0, hours_out_of_service: 0, hours_at_limit: {}, steam_t: 0, fuel_GJ: 0, power_MWh: 0 }));
    this.values = plant.headers.map(() => ({ value: new Float64Array(periods), hours: new Float64Array(periods), count: 0 }));
  }

  add(record: PeriodRecord): void {
    if (record.index !== this.nextIndex) throw new Error(`period ${record.index} arrived where period ${this.nextIndex} was due`);
    this.nextIndex += 1;
    this.hours += record.hours;
    if (!record.ok) {
      this.failed.push({ index: record.index, label: record.label, hours: record.hours, reason: record.reason, message: record.message });
      this.previousRunning = null; // unknown state: no start is counted across a failed period
      return;
    }
    if (record.how === 'neighbour') this.how.neighbour += 1;
    else if (record.how === 'full') this.how.full += 1;
    else this.how.same_as_earlier += 1;
    if (record.how !== 'same as an earlier period' && record.passes === 1) this.how.one_pass += 1;
    addEnergy(this.annual, record);
    if (record.month > 0) {
      let month = this.months.get(record.month);
      if (!month) {
        month = { ...emptyEnergy(), month: record.month, supply_t: {} };
        this.months.set(record.month, month);
      }
      addEnergy(month, record);
      record.units.forEach((state, slot) => {
        const unit = this.tracked[slot];
        if (unit.kind === 'turbine' || unit.kind === 'letdown') return;
        month!.supply_t[unit.id] = (month!.supply_t[unit.id] ?? 0) + state.steam_kg_s * S_PER_H * T_PER_KG * record.hours;
      });
    }
    record.units.forEach((state, slot) => {
      const unit = this.units[slot];
      if (state.out) unit.hours_out_of_service += record.hours;
      if (state.running) unit.hours_running += record.hours;
      if (state.running && this.previousRunning && this.previousRunning[slot] === 0) {
        unit.starts += 1;
        unit.start_up_cost += this.startCost[slot];
      }
      for (const limit of state.limits) unit.hours_at_limit[limit] = (unit.hours_at_limit[limit] ?? 0) + record.hours;
      unit.steam_t += state.steam_kg_s * S_PER_H * T_PER_KG * record.hours;
      unit.fuel_GJ += state.fuel_kW * GJ_PER_KWH * record.hours;
      unit.power_MWh += (state.power_kW * record.hours) / 1000;
    });
    this.previousRunning = record.units.map((state) => state.running);
    record.marginal_per_t.forEach((value, slot) => {
      if (value === null) return;
      const store = this.values[slot];
      store.value[store.count] = value;
      store.hours[store.count] = record.hours;
      store.count += 1;
    });
  }

  totals(): YearTotals {
    const headers = this.plant.headers.map((header, slot): HeaderYear => {
      const store = this.values[slot];
      const pairs = Array.from({ length: store.count }, (_, at) => ({ value: store.value[at], hours: store.hours[at] })).sort((a, b) => a.value - b.value);
      const hours = pairs.reduce((sum, pair) => sum + pair.hours, 0);
      if (pairs.length === 0) return { id: header.id, name: header.name, hours: 0, mean_per_t: null, min_per_t: null, p10_per_t: null, median_per_t: null, p90_per_t: null, max_per_t: null };
      let weighted = 0;
      for (let at = 0; at < store.count; at += 1) weighted += store.value[at] * store.hours[at];
      return {
        id: header.id,
        name: header.name,
        hours,
        mean_per_t: weighted / hours,
        min_per_t: pairs[0].value,
        p10_per_t: quantile(pairs, hours, 0.1),
        median_per_t: quantile(pairs, hours, 0.5),
        p90_per_t: quantile(pairs, hours, 0.9),
        max_per_t: pairs[pairs.length - 1].value,
      };
    });
    return {
      periods: this.nextIndex,
      hours: this.hours,
      hours_solved: this.annual.hours,
      complete: this.failed.length === 0,
      annual: this.annual,
      months: [...this.months.values()].sort((a, b) => a.month - b.month),
      units: this.units,
      headers,
      failed: this.failed,
      how: this.how,
    };
  }
}
