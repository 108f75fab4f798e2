// Projects against the base, over every scenario weighted by its hours:
// annual savings by cost component, simple payback, NPV, IRR and the
// physical change. A saving is the base's cost less the project's, so the
// figures equal the difference of the two separate solves.
import type { CaseVariants, ProjectDefinition } from '../model/index.js';
import type { PassPoint } from '../plant/index.js';
import { COST_COMPONENTS, scenarioRun, type CostComponentName, type ScenarioRun } from './annual.js';
import { internalRateOfReturn, netPresentValue, projectCashFlows, simplePayback } from './economics.js';
import { solvePlants, type PoolOptions } from './solvePool.js';

const T_PER_H_PER_KG_S = 3.6;

export interface ProjectScenarioChange {
  scenario: string;
  hours: number;
  /** base cost per hour less the project's */
  saving_per_h: number;
  saving_by_component_per_h: Record<CostComponentName, number>;
  vented_less_t_per_h: number;
  let_down_less_t_per_h: number;
  generated_more_MW: number;
  imported_less_MW: number;
  fuel_less_MW: number;
}

export type ProjectEvaluation = ProjectDefinition & (
  | {
      ok: true;
      scenarios: ProjectScenarioChange[];
      annual_saving: number;
      annual_saving_by_component: Record<CostComponentName, number>;
      net_annual_saving: number;
      simple_payback_years: number | null;
      npv: number;
      /** null: the cash flows never change sign, so there is no IRR */
      irr: number | null;
      /** hours-weighted averages over the year's scenarios */
      average: { vented_less_t_per_h: number; let_down_less_t_per_h: number; generated_more_MW: number };
    }
  | { ok: false; failed: { scenario: string; which: 'base' | 'project'; message: string }[] }
);

export interface ProjectsOutcome {
  base: ScenarioRun[];
  projects: ProjectEvaluation[];
}

/** Solves every scenario and every project on every scenario, in one batch. */
export async function evaluateProjects(variants: CaseVariants, projectIds: string[] = [], options: PoolOptions = {}): Promise<ProjectsOutcome> {
  const projects = projectIds.length === 0 ? variants.projects : projectIds.map((id) => {
    const project = variants.projects.find((entry) => entry.id === id);
    if (!project) throw new ProjectLookupError(`no project "${id}" in the case; known: ${variants.projects.map((entry) => entry.id).join(', ') || 'none'}`);
    return project;
  });
  // The scenarios first: each project on a scenario then also tries that
  // scenario's on/off decisions, so an added option never shows a loss.
  const baseOutcomes = await solvePlants(variants.scenarios.map((scenario) => scenario.plant), options);
  const warmOf = (scenario: string): { commitment: Record<string, number>; start?: PassPoint } | undefined => {
    const outcome = baseOutcomes[variants.scenarios.findIndex((entry) => entry.id === scenario)];
    return outcome?.ok ? { commitment: outcome.result.commitment, ...(outcome.start ? { start: outcome.start } : {}) } : undefined;
  };
  const projectEntries = projects.flatMap((project) => project.plants);
  const outcomes = [...baseOutcomes, ...(await solvePlants(projectEntries.map((entry) => entry.plant), options, projectEntries.map((entry) => warmOf(entry.scenario))))];
  const base = variants.scenarios.map((scenario, index) => scenarioRun(scenario.id, scenario.name, scenario.hours, outcomes[index]));
  let next = variants.scenarios.length;
  const evaluations = projects.map((project) => {
    const runs = project.plants.map((entry) => {
      const scenario = variants.scenarios.find((candidate) => candidate.id === entry.scenario)!;
      return scenarioRun(entry.scenario, scenario.name, scenario.hours, outcomes[next++]);
    });
    const { plants: _plants, ...definition } = project;
    void _plants;
    return evaluateProject(definition, base, runs);
  });
  return { base, projects: evaluations };
}

export class ProjectLookupError extends Error {}

/** One project's figures from solved base and project runs (matched by scenario id). */
export function evaluateProject(project: ProjectDefinition, base: ScenarioRun[], withProject: ScenarioRun[]): ProjectEvaluation {
  const failed: { scenario: string; which: 'base' | 'project'; message: string }[] = [];
  const changes: ProjectScenarioChange[] = [];
  for (const before of base) {
    const after = withProject.find((run) => run.id === before.id);
    if (!before.ok) failed.push({ scenario: before.id, which: 'base', message: before.message });
    if (!after) failed.push({ scenario: before.id, which: 'project', message: 'the project could not be applied to this scenario' });
    else if (!after.ok) failed.push({ scenario: before.id, which: 'project', message: after.message });
    if (!before.ok || !after?.ok) continue;
    const byComponent = {} as Record<CostComponentName, number>;
    for (const component of COST_COMPONENTS) byComponent[component] = before.totals.cost_by_component_per_h[component] - after.totals.cost_by_component_per_h[component];
    changes.push({
      scenario: before.id,
      hours: before.hours,
      saving_per_h: before.cost_per_h - after.cost_per_h,
      saving_by_component_per_h: byComponent,
      vented_less_t_per_h: (before.totals.vented_kg_s - after.totals.vented_kg_s) * T_PER_H_PER_KG_S,
      let_down_less_t_per_h: (before.totals.let_down_kg_s - after.totals.let_down_kg_s) * T_PER_H_PER_KG_S,
      generated_more_MW: (after.totals.power_generated_kW - before.totals.power_generated_kW) / 1000,
      imported_less_MW: (before.totals.power_imported_kW - after.totals.power_imported_kW) / 1000,
      fuel_less_MW: (before.totals.fuel_kW - after.totals.fuel_kW) / 1000,
    });
  }
  if (failed.length > 0) return { ...project, ok: false, failed };
  const annualByComponent = {} as Record<CostComponentName, number>;
  for (const component of COST_COMPONENTS) annualByComponent[component] = changes.reduce((total, change) => total + change.hours * change.saving_by_component_per_h[component], 0);
  const annual = changes.reduce((total, change) => total + change.hours * change.saving_per_h, 0);
  const net = annual - project.fixedOmPerYear;
  const cashFlows = projectCashFlows(project.capitalCost, net, project.lifeYears);
  const hours = changes.reduce((total, change) => total + change.hours, 0);
  const average = (pick: (change: ProjectScenarioChange) => number): number => (hours > 0 ? changes.reduce((total, change) => total + change.hours * pick(change), 0) / hours : 0);
  return {
    ...project,
    ok: true,
    scenarios: changes,
    annual_saving: annual,
    annual_saving_by_component: annualByComponent,
    net_annual_saving: net,
    simple_payback_years: simplePayback(project.capitalCost, net),
    npv: netPresentValue(project.discountRate, cashFlows),
    irr: internalRateOfReturn(cashFlows),
    average: {
      vented_less_t_per_h: average((change) => change.vented_less_t_per_h),
      let_down_less_t_per_h: average((change) => change.let_down_less_t_per_h),
      generated_more_MW: average((change) => change.generated_more_MW),
    },
  };
}
