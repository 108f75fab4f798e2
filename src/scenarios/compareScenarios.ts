// Solving scenarios (or a sweep's steps) side by side.
import { HOURS_PER_YEAR, type CaseVariants, type Plant, type ScenarioPlant } from '../model/index.js';
import { annualTotals, scenarioRun, type AnnualTotals, type ScenarioRun } from './annual.js';
import { solvePlants, type PoolOptions } from './solvePool.js';

export interface Comparison {
  runs: ScenarioRun[];
  annual: AnnualTotals;
}

/** The id that names the plant as written among scenario ids, as sweeps and scenario bases name it. */
export const AS_WRITTEN = 'plant';

/**
 * The named scenarios (all when ids is empty), in the order asked; unknown
 * ids throw a ScenarioLookupError. With `asWritten`, the id "plant" is the
 * plant as written: a column for a whole year beside the scenarios, an
 * alternative to them, so it is left out of the annual total.
 */
export async function compareScenarios(variants: CaseVariants, ids: string[] = [], options: PoolOptions = {}, asWritten: Plant | null = null): Promise<Comparison> {
  const pick = (id: string): ScenarioPlant =>
    id === AS_WRITTEN && asWritten ? { id: AS_WRITTEN, name: 'the plant as written', hours: HOURS_PER_YEAR, plant: asWritten } : findScenario(variants, id);
  const chosen = ids.length === 0 ? variants.scenarios : ids.map(pick);
  const outcomes = await solvePlants(chosen.map((scenario) => scenario.plant), options);
  const runs = chosen.map((scenario, index) => scenarioRun(scenario.id, scenario.name, scenario.hours, outcomes[index]));
  const counted = runs.filter((_, index) => chosen[index].plant !== asWritten);
  return { runs, annual: annualTotals(counted) };
}

/**
 * Every step of a sweep as a column; the sweep's scenario lends its hours (a
 * sweep of the plant as written, a whole year). The steps are alternatives
 * for the same hours, so their annual total adds up nothing real: callers
 * show each step's cost per year, not the sum.
 */
export async function runSweep(variants: CaseVariants, sweepId: string, options: PoolOptions = {}): Promise<Comparison & { target: string; scenario: string }> {
  const sweep = variants.sweeps.find((entry) => entry.id === sweepId);
  if (!sweep) throw new ScenarioLookupError(`no sweep "${sweepId}" in the case; known: ${variants.sweeps.map((entry) => entry.id).join(', ') || 'none'}`);
  const hours = sweep.scenario === 'plant' ? HOURS_PER_YEAR : variants.scenarios.find((entry) => entry.id === sweep.scenario)?.hours ?? HOURS_PER_YEAR;
  const outcomes = await solvePlants(sweep.steps.map((step) => step.plant), options);
  const runs = sweep.steps.map((step, index) => scenarioRun(step.value, `${sweep.target} = ${step.value}`, hours, outcomes[index]));
  return { runs, annual: annualTotals(runs), target: sweep.target, scenario: sweep.scenario };
}

export class ScenarioLookupError extends Error {}

export function findScenario(variants: CaseVariants, id: string): CaseVariants['scenarios'][number] {
  const scenario = variants.scenarios.find((entry) => entry.id === id);
  if (!scenario) throw new ScenarioLookupError(`no scenario "${id}" in the case; known: ${variants.scenarios.map((entry) => entry.id).join(', ')}, and ${AS_WRITTEN} for the plant as written`);
  return scenario;
}
