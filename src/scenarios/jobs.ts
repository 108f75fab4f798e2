// What one solve in a batch is: a scenario, a project on a scenario, or one
// step of a sweep. Each names its plant; the outcome is plain data that
// crosses a worker boundary unchanged.
import type { CaseVariants, Objective, Plant } from '../model/index.js';
import type { PassPoint, PlantResult } from '../plant/index.js';

export type Job =
  | { kind: 'scenario'; scenario: string }
  | { kind: 'project'; project: string; scenario: string }
  | { kind: 'sweep'; sweep: string; step: number };

export type JobOutcome =
  | { ok: true; result: PlantResult; start?: PassPoint }
  | { ok: false; reason: string; message: string };

export interface JobOptions {
  objective?: Objective;
  backend?: 'highs' | 'jslp';
  /** another solve's integer decisions (the base scenario's, for a project), tried as a candidate */
  commitment?: Record<string, number>;
  /** that solve's converged point, to start the candidate from (Maps cross a worker boundary intact) */
  start?: PassPoint;
  /** measure marginal values by probes (default true); savings compares costs only and leaves them out */
  probeMarginalValues?: boolean;
}

/** The plant a job solves; throws for a job that names nothing in the variants (a programming error). */
export function plantOfJob(variants: CaseVariants, job: Job): Plant {
  if (job.kind === 'scenario') {
    const scenario = variants.scenarios.find((entry) => entry.id === job.scenario);
    if (scenario) return scenario.plant;
  } else if (job.kind === 'project') {
    const plant = variants.projects.find((entry) => entry.id === job.project)?.plants.find((entry) => entry.scenario === job.scenario)?.plant;
    if (plant) return plant;
  } else {
    const step = variants.sweeps.find((entry) => entry.id === job.sweep)?.steps[job.step];
    if (step) return step.plant;
  }
  throw new Error(`no plant for job ${JSON.stringify(job)}`);
}

/** A short label for progress lines and messages. */
export function jobLabel(variants: CaseVariants, job: Job): string {
  if (job.kind === 'scenario') return `scenario "${job.scenario}"`;
  if (job.kind === 'project') return `project "${job.project}" on scenario "${job.scenario}"`;
  const sweep = variants.sweeps.find((entry) => entry.id === job.sweep);
  return `sweep "${job.sweep}" at ${sweep?.steps[job.step]?.value ?? job.step}`;
}
