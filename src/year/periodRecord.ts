// One period's solve as a compact record: plain numbers in internal units,
// small enough that a year of them can be kept, sent between threads and
// written to a shard's part file. Everything the year's totals need, nothing
// more; the full result of a period is `steamwright solve` on its plant.
import type { Plant } from '../model/index.js';
import { plantResult, type PlantOutcome } from '../plant/index.js';

export const COMPONENTS = ['fuel', 'power', 'steam', 'water', 'carbon'] as const;
export type Component = (typeof COMPONENTS)[number];

/** The units a year follows, in the base plant's order. */
export interface TrackedUnit {
  id: string;
  kind: 'boiler' | 'heat recovery boiler' | 'steam import' | 'turbine' | 'letdown';
}

export function trackedUnits(plant: Plant): TrackedUnit[] {
  return [
    ...plant.boilers.map((unit) => ({ id: unit.id, kind: 'boiler' as const })),
    ...plant.heatRecoveryBoilers.map((unit) => ({ id: unit.id, kind: 'heat recovery boiler' as const })),
    ...plant.steamImports.map((unit) => ({ id: unit.id, kind: 'steam import' as const })),
    ...plant.turbines.map((unit) => ({ id: unit.id, kind: 'turbine' as const })),
    ...plant.letdowns.map((unit) => ({ id: unit.id, kind: 'letdown' as const })),
  ];
}

export interface UnitState {
  /** 0 stopped or out of service, 1 running */
  running: 0 | 1;
  /** out of service in this period (the profile's availability) */
  out: boolean;
  /** steam raised, passed or let down, kg/s */
  steam_kg_s: number;
  /** fuel fired, kW */
  fuel_kW: number;
  /** electric or shaft power, kW */
  power_kW: number;
  /** limits it sits at, in words */
  limits: string[];
}

interface PeriodHead {
  /** 0-based period index in the profile */
  index: number;
  label: string;
  hours: number;
  month: number;
}

export type PeriodRecord =
  | (PeriodHead & {
      ok: true;
      cost_per_h: number;
      cost_by_component_per_h: Record<Component, number>;
      fuel_GJ_per_h: number;
      steam_raised_kg_s: number;
      process_steam_kg_s: number;
      process_heat_kW: number;
      power_generated_kW: number;
      power_imported_kW: number;
      power_exported_kW: number;
      site_demand_kW: number;
      vented_kg_s: number;
      let_down_kg_s: number;
      makeup_kg_s: number;
      co2_kg_per_h: number;
      /** marginal value per t of steam at each header (base plant order), objective units */
      marginal_per_t: (number | null)[];
      /** the tracked units' states (trackedUnits order) */
      units: UnitState[];
      /** passes of the kept commitment's convergence */
      passes: number;
      /** start costs of the units with switching rules that start in this period (a year solved as rolling windows), currency */
      start_up_cost?: number;
      /** how the period was solved: from its neighbour's decisions, a full search, or a copy of an identical period */
      how: 'neighbour' | 'full' | 'same as an earlier period';
    })
  | (PeriodHead & { ok: false; reason: string; message: string });

const STOPPED = new Set(['switched off', 'stopped']);

function numberOf(value: unknown): number {
  return typeof value === 'number' && Number.isFinite(value) ? value : 0;
}

export function periodRecord(head: PeriodHead, base: Plant, tracked: readonly TrackedUnit[], outcome: PlantOutcome): PeriodRecord {
  if (!outcome.ok) {
    const message = outcome.diagnosis?.summary ?? outcome.message;
    return { ...head, ok: false, reason: outcome.reason, message };
  }
  const result = plantResult(outcome);
  const totals = result.totals;
  const reports = new Map(result.units.map((unit) => [unit.id, unit]));
  const byHeader = new Map(result.headers.map((header) => [header.id, header.marginal_value_per_t]));
  const units: UnitState[] = tracked.map((unit) => {
    const report = reports.get(unit.id);
    if (!report) return { running: 0, out: true, steam_kg_s: 0, fuel_kW: 0, power_kW: 0, limits: [] };
    const values = report.values;
    const steam = unit.kind === 'turbine' ? numberOf(values.inlet_kg_s) : numberOf(values.steam_kg_s);
    const running = typeof values.running === 'boolean' ? values.running : steam > 1e-9;
    return {
      running: running ? 1 : 0,
      out: false,
      steam_kg_s: steam,
      fuel_kW: numberOf(values.fuel_kW),
      power_kW: numberOf(values.power_kW),
      limits: report.binding.filter((limit) => !STOPPED.has(limit)),
    };
  });
  const byComponent = {} as Record<Component, number>;
  for (const component of COMPONENTS) byComponent[component] = totals.cost_by_component_per_h[component] ?? 0;
  return {
    ...head,
    ok: true,
    cost_per_h: totals.cost_per_h,
    cost_by_component_per_h: byComponent,
    fuel_GJ_per_h: totals.fuel_GJ_per_h,
    steam_raised_kg_s: totals.steam_raised_kg_s,
    process_steam_kg_s: totals.process_steam_kg_s,
    process_heat_kW: totals.process_heat_kW,
    power_generated_kW: totals.power_generated_kW,
    power_imported_kW: totals.power_imported_kW,
    power_exported_kW: totals.power_exported_kW,
    site_demand_kW: totals.site_demand_kW,
    vented_kg_s: totals.vented_kg_s,
    let_down_kg_s: totals.let_down_kg_s,
    makeup_kg_s: totals.makeup_kg_s,
    co2_kg_per_h: totals.co2_kg_per_h,
    marginal_per_t: base.headers.map((header) => byHeader.get(header.id) ?? null),
    units,
    passes: outcome.passes.length,
    how: outcome.commitments.some((entry) => entry.source === 'neighbour') ? 'neighbour' : 'full',
  };
}
