// What a report shows, solved: the plant as written (or one scenario) and,
// for a case with scenarios, each scenario beside it. Shared by `report` and
// `watch`; failures are CliErrors that say where and what.
import { getBackend, type BackendName } from '../lp/index.js';
import { plantResult, solvePlant, type PlantResult } from '../plant/index.js';
import type { Objective, Plant } from '../model/index.js';
import { htmlReport, type FailedScenario, type ReportOptions, type ScenarioSection } from '../report/index.js';
import { compareScenarios, evaluateProjects, type ProjectEvaluation, type ScenarioRun } from '../scenarios/index.js';
import { CliError, EXIT_USAGE } from './errors.js';
import type { LoadedCase } from './loadCaseOrFail.js';
import { solveFailure } from './solveFailure.js';

export interface ReportRequest {
  scenario?: string;
  objective?: Objective;
  solver: BackendName;
  /** worker threads for the scenarios (1: in this process) */
  workers?: number;
}

export interface SolvedReport {
  plant: Plant;
  result: PlantResult;
  subtitle?: string;
  sections: ScenarioSection[];
  /** scenarios that could not be solved, with the diagnosis: the report marks them, the caller exits 1 */
  failed: FailedScenario[];
  /** the case's projects, each solved on every scenario (empty with --scenario or no projects) */
  projects: ProjectEvaluation[];
}

export async function solveForReport(casePath: string, loaded: LoadedCase, request: ReportRequest): Promise<SolvedReport> {
  const variants = loaded.variants;
  let plant = loaded.plant;
  let subtitle: string | undefined;
  if (request.scenario !== undefined) {
    const scenario = variants.implicitBase ? undefined : variants.scenarios.find((entry) => entry.id === request.scenario);
    if (!scenario) {
      const known = variants.implicitBase ? 'the case has no scenarios' : `known: ${variants.scenarios.map((entry) => entry.id).join(', ')}`;
      throw new CliError(`--scenario: no scenario "${request.scenario}" in ${casePath}; ${known}`, EXIT_USAGE);
    }
    plant = scenario.plant;
    subtitle = `Scenario ${scenario.id}: ${scenario.name} (${scenario.hours} h a year)`;
  }
  const outcome = await solvePlant(plant, { objective: request.objective, backend: getBackend(request.solver) });
  if (!outcome.ok) throw solveFailure(casePath, request.scenario, outcome, request.solver);
  const result = plantResult(outcome);
  // Without a scenario named, a case with scenarios reports them all side by side.
  const sections: ScenarioSection[] = [];
  const failed: FailedScenario[] = [];
  let projects: ProjectEvaluation[] = [];
  if (request.scenario === undefined && (!variants.implicitBase || variants.projects.length > 0)) {
    const options = { objective: request.objective, backend: request.solver, workers: request.workers };
    // With projects, their evaluation solves the scenarios too: one batch for both.
    let runs: ScenarioRun[];
    if (variants.projects.length > 0) {
      const evaluation = await evaluateProjects(variants, [], options);
      runs = evaluation.base;
      projects = evaluation.projects;
    } else {
      runs = (await compareScenarios(variants, [], options)).runs;
    }
    if (!variants.implicitBase) {
      for (const [index, run] of runs.entries()) {
        if (run.ok) sections.push({ id: run.id, name: run.name, hours: run.hours, plant: variants.scenarios[index].plant, result: run.result });
        else failed.push({ id: run.id, name: run.name, hours: run.hours, reason: run.reason, message: run.message });
      }
    }
  }
  return { plant, result, subtitle, sections, failed, projects };
}

/** The self-contained HTML report of a solved report. */
/** The report's optional sections: the year and the reconciled meters. */
export type ReportSections = Pick<ReportOptions, 'year' | 'reconciled'>;

export function reportHtml(solved: SolvedReport, sections: ReportSections = {}): string {
  return htmlReport(solved.plant, solved.result, { subtitle: solved.subtitle, scenarios: solved.sections, failedScenarios: solved.failed, projects: solved.projects, ...sections });
}
