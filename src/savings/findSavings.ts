// `savings`: measures from the solved balance, each solved on every
// scenario, ranked; then the roadmap: the ranked measures that save money
// applied one after another, the plant re-solved at each step, so the
// interactions between measures are counted.
import type { CaseVariants, Plant, ProjectDefinition } from '../model/index.js';
import { WorkerPool, type CostComponentName, type PoolOptions, type ScenarioRun } from '../scenarios/index.js';
import { evaluateChanges, solveBase, type BaseSolves, type ChangeOutcome, type SolvedChange } from './evaluateMeasures.js';
import { generateMeasures } from './generateMeasures.js';
import { resolveMeasurePlants } from './measurePlants.js';
import { measureAsProject, type Measure } from './measureTypes.js';
import { mergeChanges } from './mergeChanges.js';
import { solvedRuns } from './sizing.js';
import type { VentFinding } from './ventMeasures.js';

export const RANK_CRITERIA = ['npv', 'saving', 'payback', 'irr', 'co2'] as const;
export type RankCriterion = (typeof RANK_CRITERIA)[number];

export type MeasureResult = Measure & { result: ChangeOutcome; rank: number | null };

export interface RoadmapStep {
  step: number;
  /** the measure added at this step */
  measure: string;
  /** every measure applied so far, in order */
  applied: string[];
  capital: number;
  result: ChangeOutcome;
  /** this step's saving less the previous step's: what the measure adds once the earlier ones are in */
  incremental_saving: number | null;
  /** the measure's own saving when applied alone */
  standalone_saving: number | null;
}

export interface Interaction {
  measures: string[];
  /** in words */
  how: string;
}

export interface SavingsResult {
  plant: string;
  currency: string;
  criterion: RankCriterion;
  accuracy: string;
  base: ScenarioRun[];
  vents: VentFinding[];
  /** ranked measures first (rank 1 best), then those that could not be solved */
  measures: MeasureResult[];
  roadmap: RoadmapStep[];
  interactions: Interaction[];
}

export interface SavingsOptions extends PoolOptions {
  criterion?: RankCriterion;
}

function definitionOf(measure: Pick<Measure, 'id' | 'title' | 'capital' | 'lifeYears' | 'discountRate' | 'fixedOmPerYear'>): ProjectDefinition {
  return { id: measure.id, name: measure.title, capitalCost: measure.capital, lifeYears: measure.lifeYears, discountRate: measure.discountRate, fixedOmPerYear: measure.fixedOmPerYear };
}

/** Larger is better for every criterion as returned here. */
export function rankKey(result: SolvedChange, criterion: RankCriterion): number {
  switch (criterion) {
    case 'npv': return result.npv;
    case 'saving': return result.net_annual_saving;
    case 'payback': return result.simple_payback_years === null ? -Infinity : -result.simple_payback_years;
    case 'irr': return result.irr ?? -Infinity;
    case 'co2': return result.co2_avoided_t_per_year;
  }
}

/** Within 1 currency unit a year, or 0.5 % of the larger saving: round-off, not an interaction. */
function differs(a: number, b: number): boolean {
  return Math.abs(a - b) > Math.max(1, 0.005 * Math.max(Math.abs(a), Math.abs(b)));
}

export async function findSavings(caseText: string, plant: Plant, variants: CaseVariants, options: SavingsOptions = {}): Promise<SavingsResult> {
  // One pool of workers for the three batches: each loads HiGHS once.
  const pool = WorkerPool.forJobs(Number.MAX_SAFE_INTEGER, options);
  try {
    return await savingsWith(caseText, plant, variants, { ...options, pool });
  } finally {
    await pool.close();
  }
}

async function savingsWith(caseText: string, plant: Plant, variants: CaseVariants, options: SavingsOptions & { pool: WorkerPool }): Promise<SavingsResult> {
  const criterion = options.criterion ?? 'npv';
  const currency = plant.site.currency;
  const base: BaseSolves = await solveBase(variants, options);
  const { measures, vents } = generateMeasures(plant, solvedRuns(base.runs));

  const plants = resolveMeasurePlants(caseText, measures.map((measure) => measureAsProject(measure, currency)));
  const outcomes = await evaluateChanges(base, measures.map((measure) => ({ definition: definitionOf(measure), plants: plants.get(measure.id) ?? { ok: false, reason: 'not resolved' } })), options);
  const results: MeasureResult[] = measures.map((measure, index) => ({ ...measure, result: outcomes[index], rank: null }));
  const solved = results.filter((entry) => entry.result.ok).sort((a, b) => rankKey(b.result as SolvedChange, criterion) - rankKey(a.result as SolvedChange, criterion));
  solved.forEach((entry, index) => (entry.rank = index + 1));
  const ranked = [...solved, ...results.filter((entry) => !entry.result.ok)];

  // The roadmap: measures that save money, in rank order, applied cumulatively;
  // of alternatives (ways to end one vent, a turbine beside or in place of one
  // letdown) only the best ranked.
  const chosen = new Set<string>();
  const steps = solved.filter((entry) => {
    if (!((entry.result as SolvedChange).net_annual_saving > 0)) return false;
    if (entry.alternativeOf === null) return true;
    if (chosen.has(entry.alternativeOf)) return false;
    chosen.add(entry.alternativeOf);
    return true;
  });
  const stepProjects = steps.map((_, index) => {
    const applied = steps.slice(0, index + 1);
    return {
      id: `roadmap_step_${index + 1}`,
      title: `roadmap step ${index + 1}: ${applied.map((entry) => entry.id).join(' + ')}`,
      capital: applied.reduce((total, entry) => total + entry.capital, 0),
      lifeYears: plant.costs!.lifeYears,
      discountRate: plant.costs!.discountRate,
      fixedOmPerYear: applied.reduce((total, entry) => total + entry.fixedOmPerYear, 0),
      changes: mergeChanges(applied.map((entry) => entry.changes)),
    };
  });
  // Step 1 is the first measure alone, the same overlay, capital and terms: its
  // solves are the measure's own, so they are not repeated.
  const later = stepProjects.slice(1);
  const stepPlants = resolveMeasurePlants(caseText, later.map((step) => measureAsProject({ ...step, id: step.id } as unknown as Measure, currency)));
  const laterOutcomes = await evaluateChanges(base, later.map((step) => ({ definition: definitionOf(step), plants: stepPlants.get(step.id) ?? { ok: false, reason: 'not resolved' } })), options);
  const stepOutcomes: ChangeOutcome[] = steps.length > 0 ? [steps[0].result, ...laterOutcomes] : [];
  const roadmap: RoadmapStep[] = steps.map((entry, index) => {
    const result = stepOutcomes[index];
    const previous = index === 0 ? { ok: true as const, annual_saving: 0 } : stepOutcomes[index - 1];
    return {
      step: index + 1,
      measure: entry.id,
      applied: steps.slice(0, index + 1).map((step) => step.id),
      capital: stepProjects[index].capital,
      result,
      incremental_saving: result.ok && previous.ok ? result.annual_saving - previous.annual_saving : null,
      standalone_saving: entry.result.ok ? entry.result.annual_saving : null,
    };
  });
  return { plant: plant.name, currency, criterion, accuracy: plant.costs!.accuracy, base: base.runs, vents, measures: ranked, roadmap, interactions: interactionsOf(ranked, roadmap, currency, plant) };
}

function interactionsOf(measures: MeasureResult[], roadmap: RoadmapStep[], currency: string, plant: Plant): Interaction[] {
  const interactions: Interaction[] = [];
  // Sharing a header or the deaerator is the rule, not news: the roadmap's
  // re-solves measure those interactions. Two overlays on one unit are named.
  const shared = new Set(['deaerator', ...plant.headers.map((header) => header.id)]);
  for (let i = 0; i < measures.length; i++) {
    for (let j = i + 1; j < measures.length; j++) {
      const both = measures[i].touches.filter((id) => !shared.has(id) && measures[j].touches.includes(id));
      const alternatives = measures[i].alternativeOf !== null && measures[i].alternativeOf === measures[j].alternativeOf;
      if (alternatives) interactions.push({ measures: [measures[i].id, measures[j].id], how: `alternatives for the ${measures[i].alternativeOf}: the roadmap takes only the better ranked` });
      else if (both.length > 0) interactions.push({ measures: [measures[i].id, measures[j].id], how: `both change ${both.join(', ')}: applied together, the later one's keys win where they overlap` });
    }
  }
  for (const step of roadmap) {
    if (step.step === 1 || step.incremental_saving === null || step.standalone_saving === null) continue;
    if (differs(step.incremental_saving, step.standalone_saving)) {
      const delta = step.incremental_saving - step.standalone_saving;
      interactions.push({
        measures: step.applied,
        how: `${step.measure} saves ${Math.round(step.incremental_saving).toLocaleString('en')} ${currency}/yr after ${step.applied.slice(0, -1).join(', ')}, ${Math.round(Math.abs(delta)).toLocaleString('en')} ${currency}/yr ${delta < 0 ? 'less' : 'more'} than alone`,
      });
    }
  }
  return interactions;
}

export type { CostComponentName };
