// Every measure solved on every scenario (warm from that scenario's own
// solve) and valued against the base: the saving is the base's cost less the
// changed plant's, scenario by scenario, weighted by hours. Never a product
// of marginal values.
import type { CaseVariants, Plant, ProjectDefinition } from '../model/index.js';
import type { PassPoint } from '../plant/index.js';
import { COST_COMPONENTS, evaluateProject, scenarioRun, WorkerPool, type CostComponentName, type JobOutcome, type PoolOptions, type ScenarioRun } from '../scenarios/index.js';

/** Pool options, with a worker pool kept across batches where the caller has one. */
export type SavingsPoolOptions = PoolOptions & { pool?: WorkerPool };

/** Savings compares costs: no solve here needs the marginal-value probes. */
async function solveBatch(plants: Plant[], options: SavingsPoolOptions, warm: Parameters<WorkerPool['solve']>[2] = []): Promise<JobOutcome[]> {
  const quiet = { ...options, probeMarginalValues: false };
  if (options.pool) return options.pool.solve(plants, quiet, warm);
  const pool = WorkerPool.forJobs(plants.length, options);
  try {
    return await pool.solve(plants, quiet, warm);
  } finally {
    await pool.close();
  }
}
import type { MeasurePlants } from './measurePlants.js';

/** Physical change from the base, per hour in one scenario (positive: less loss, more made). */
export interface PhysicalChange {
  vented_less_t_per_h: number;
  generated_more_MW: number;
  imported_less_MW: number;
  fuel_less_MW: number;
  condensate_returned_more_t_per_h: number;
  makeup_less_t_per_h: number;
  trap_steam_less_t_per_h: number;
  absorption_cooling_more_MW: number;
  co2_less_t_per_h: number;
}

export interface SolvedChange {
  ok: true;
  annual_saving: number;
  annual_saving_by_component: Record<CostComponentName, number>;
  net_annual_saving: number;
  co2_avoided_t_per_year: number;
  simple_payback_years: number | null;
  npv: number;
  irr: number | null;
  /** hours-weighted mean of the physical change over the scenarios */
  physical: PhysicalChange;
  scenarios: ({ scenario: string; hours: number; saving_per_h: number } & PhysicalChange)[];
}

export type ChangeOutcome = SolvedChange | { ok: false; reason: string };

const T_PER_H = 3.6;

function sumUnits(run: Extract<ScenarioRun, { ok: true }>, kinds: string[], key: string): number {
  return run.units.filter((unit) => kinds.includes(unit.kind)).reduce((total, unit) => total + (typeof unit.values[key] === 'number' ? (unit.values[key] as number) : 0), 0);
}

export function physicalChange(before: Extract<ScenarioRun, { ok: true }>, after: Extract<ScenarioRun, { ok: true }>): PhysicalChange {
  return {
    vented_less_t_per_h: (before.totals.vented_kg_s - after.totals.vented_kg_s) * T_PER_H,
    generated_more_MW: (after.totals.power_generated_kW - before.totals.power_generated_kW) / 1000,
    imported_less_MW: (before.totals.power_imported_kW - after.totals.power_imported_kW) / 1000,
    fuel_less_MW: (before.totals.fuel_kW - after.totals.fuel_kW) / 1000,
    condensate_returned_more_t_per_h: (sumUnits(after, ['user', 'absorptionChiller'], 'condensate_returned_kg_s') - sumUnits(before, ['user', 'absorptionChiller'], 'condensate_returned_kg_s')) * T_PER_H,
    makeup_less_t_per_h: (before.totals.makeup_kg_s - after.totals.makeup_kg_s) * T_PER_H,
    trap_steam_less_t_per_h: (sumUnits(before, ['trapGroup'], 'steam_lost_kg_s') - sumUnits(after, ['trapGroup'], 'steam_lost_kg_s')) * T_PER_H,
    absorption_cooling_more_MW: (sumUnits(after, ['absorptionChiller'], 'absorption_cooling_kW') - sumUnits(before, ['absorptionChiller'], 'absorption_cooling_kW')) / 1000,
    co2_less_t_per_h: (before.totals.co2_kg_per_h - after.totals.co2_kg_per_h) / 1000,
  };
}

/** The base scenarios solved, with what a changed plant needs to start warm from each. */
export interface BaseSolves {
  runs: ScenarioRun[];
  warm: Map<string, { commitment: Record<string, number>; start?: PassPoint }>;
}

export async function solveBase(variants: CaseVariants, options: SavingsPoolOptions): Promise<BaseSolves> {
  const outcomes = await solveBatch(variants.scenarios.map((scenario) => scenario.plant), options);
  return baseFrom(variants, outcomes);
}

export function baseFrom(variants: CaseVariants, outcomes: JobOutcome[]): BaseSolves {
  const warm = new Map<string, { commitment: Record<string, number>; start?: PassPoint }>();
  const runs = variants.scenarios.map((scenario, index) => {
    const outcome = outcomes[index];
    if (outcome.ok) warm.set(scenario.id, { commitment: outcome.result.commitment, ...(outcome.start ? { start: outcome.start } : {}) });
    return scenarioRun(scenario.id, scenario.name, scenario.hours, outcome);
  });
  return { runs, warm };
}

/** Solves each changed plant on every scenario in one batch (workers share it) and values it against the base. */
export async function evaluateChanges(
  base: BaseSolves,
  changes: { definition: ProjectDefinition; plants: MeasurePlants }[],
  options: SavingsPoolOptions,
): Promise<ChangeOutcome[]> {
  const jobs: { index: number; scenario: string; plant: Plant }[] = [];
  changes.forEach((change, index) => {
    if (change.plants.ok) for (const entry of change.plants.plants) jobs.push({ index, scenario: entry.scenario, plant: entry.plant });
  });
  const outcomes = await solveBatch(jobs.map((job) => job.plant), options, jobs.map((job) => base.warm.get(job.scenario)));
  return changes.map((change, index) => {
    if (!change.plants.ok) return { ok: false, reason: change.plants.reason };
    const runs = jobs.flatMap((job, jobIndex) => {
      if (job.index !== index) return [];
      const scenario = base.runs.find((run) => run.id === job.scenario)!;
      return [scenarioRun(job.scenario, scenario.name, scenario.hours, outcomes[jobIndex])];
    });
    const evaluation = evaluateProject(change.definition, base.runs, runs);
    if (!evaluation.ok) {
      return { ok: false, reason: evaluation.failed.map((failure) => `${failure.which === 'base' ? 'the base' : 'the changed plant'} in scenario "${failure.scenario}" could not be solved: ${failure.message}`).join('; ') };
    }
    const scenarios = base.runs.flatMap((before) => {
      const after = runs.find((run) => run.id === before.id);
      if (!before.ok || !after?.ok) return [];
      return [{ scenario: before.id, hours: before.hours, saving_per_h: before.cost_per_h - after.cost_per_h, ...physicalChange(before, after) }];
    });
    const hours = scenarios.reduce((total, entry) => total + entry.hours, 0);
    const physical = {} as PhysicalChange;
    for (const key of Object.keys(scenarios[0] ?? {}).filter((name) => !['scenario', 'hours', 'saving_per_h'].includes(name)) as (keyof PhysicalChange)[]) {
      physical[key] = hours > 0 ? scenarios.reduce((total, entry) => total + entry.hours * entry[key], 0) / hours : 0;
    }
    const byComponent = {} as Record<CostComponentName, number>;
    for (const component of COST_COMPONENTS) byComponent[component] = evaluation.annual_saving_by_component[component];
    return {
      ok: true,
      annual_saving: evaluation.annual_saving,
      annual_saving_by_component: byComponent,
      net_annual_saving: evaluation.net_annual_saving,
      co2_avoided_t_per_year: scenarios.reduce((total, entry) => total + entry.hours * entry.co2_less_t_per_h, 0),
      simple_payback_years: evaluation.simple_payback_years,
      npv: evaluation.npv,
      irr: evaluation.irr,
      physical,
      scenarios,
    };
  });
}
