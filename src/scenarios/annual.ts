// Annual figures: hours x hourly figures, summed over scenarios.
import type { HeaderResult, Kpis, PlantResult, Totals } from '../plant/index.js';
import type { UnitReport } from '../plant/index.js';
import type { JobOutcome } from './jobs.js';

export const COST_COMPONENTS = ['fuel', 'power', 'steam', 'water', 'carbon'] as const;
export type CostComponentName = (typeof COST_COMPONENTS)[number];

/** One solved (or failed) scenario with its hours and annual cost. */
export type ScenarioRun =
  | {
      id: string;
      name: string;
      hours: number;
      ok: true;
      cost_per_h: number;
      cost_per_year: number;
      cost_by_component_per_year: Record<CostComponentName, number>;
      totals: Totals;
      headers: HeaderResult[];
      units: UnitReport[];
      kpis: Kpis;
      marginal_power_value_per_kWh: number | null;
      result: PlantResult;
    }
  | { id: string; name: string; hours: number; ok: false; reason: string; message: string };

export function scenarioRun(id: string, name: string, hours: number, outcome: JobOutcome): ScenarioRun {
  if (!outcome.ok) return { id, name, hours, ok: false, reason: outcome.reason, message: outcome.message };
  const { result } = outcome;
  const byComponent = {} as Record<CostComponentName, number>;
  for (const component of COST_COMPONENTS) byComponent[component] = hours * (result.totals.cost_by_component_per_h[component] ?? 0);
  return {
    id, name, hours, ok: true,
    cost_per_h: result.totals.cost_per_h,
    cost_per_year: hours * result.totals.cost_per_h,
    cost_by_component_per_year: byComponent,
    totals: result.totals,
    headers: result.headers,
    units: result.units,
    kpis: result.kpis,
    marginal_power_value_per_kWh: result.marginal_power_value_per_kWh,
    result,
  };
}

export interface AnnualTotals {
  hours: number;
  /** null when any scenario failed: an annual total without it would mislead */
  cost_per_year: number | null;
  cost_by_component_per_year: Record<CostComponentName, number> | null;
  failed: string[];
}

export function annualTotals(runs: ScenarioRun[]): AnnualTotals {
  const failed = runs.filter((run) => !run.ok).map((run) => run.id);
  const hours = runs.reduce((total, run) => total + run.hours, 0);
  if (failed.length > 0) return { hours, cost_per_year: null, cost_by_component_per_year: null, failed };
  const byComponent = {} as Record<CostComponentName, number>;
  for (const component of COST_COMPONENTS) byComponent[component] = runs.reduce((total, run) => total + (run.ok ? run.cost_by_component_per_year[component] : 0), 0);
  return { hours, cost_per_year: runs.reduce((total, run) => total + (run.ok ? run.cost_per_year : 0), 0), cost_by_component_per_year: byComponent, failed };
}
