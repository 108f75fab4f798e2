// Solving a plant: converge it (converge.ts), judge the on/off decisions at
// their own converged points, measure the marginal values, and audit.
import { highsBackend, type SolveResult, type SolverBackend } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { PropertyRangeError, saturatedVapour } from '../properties/index.js';
import { auditPass, type Audit } from './audit.js';
import { buildPass, type Pass } from './buildPass.js';
import type { PassPoint } from './context.js';
import type { UnitContribution } from './contribution.js';
import { contributionsOf } from './contributions.js';
import { AUDIT_TOLERANCE, converge, integerValues, type Converged, type LoopSettings, type NotConverged, type PassRecord } from './converge.js';
import { diagnose, type Diagnosis } from './diagnose.js';
import { headerDual, marginalValues, type MarginalValue } from './marginalValues.js';
import { passSolution, type PassSolution } from './passSolution.js';
import { PlantPhysicsError } from './units/user.js';
import { auditSolve, type IndependentAudit } from './verify/index.js';

export interface SolvePlantOptions {
  objective?: Objective;
  backend?: SolverBackend;
  /** largest enthalpy change between passes for convergence, kJ/kg (default from the case) */
  enthalpyTolerance?: number;
  maxPasses?: number;
  /**
   * Another plant's integer decisions (a scenario's base, say: on/off and load
   * segments, by variable name), tried as one more candidate, with the units
   * it does not have stopped; from `start`, that plant's converged point, when
   * given, so that a variant that only adds an option reproduces its base.
   */
  commitment?: ReadonlyMap<string, number>;
  start?: PassPoint;
  /** try single flips of each switchable unit when there are at most this many (default 20; 0 for none) */
  maxFlips?: number;
  /** measure each header's one-more and one-less values by re-solving (default true) */
  probeMarginalValues?: boolean;
  /**
   * A neighbouring solve's integer decisions and converged point (the hour
   * before, in a year): converged from first with those decisions held, and
   * kept without the cold first pass and the flips when the MIP at its
   * converged point, every integer free, finds nothing cheaper. Otherwise the
   * full search runs, with the neighbour's decisions as one candidate.
   */
  neighbour?: { commitment: ReadonlyMap<string, number>; start: PassPoint };
}

/** One set of on/off decisions tried, converged on its own, and its converged objective. */
export interface CommitmentTried {
  /** where the candidate came from */
  source: 'first pass' | 'MIP at the converged points' | 'base plant' | 'single flip' | 'boiler swap' | 'neighbour';
  /** on/off of every switchable unit, 1 running */
  onOff: Record<string, number>;
  /** converged objective; null when it could not be met or did not settle */
  objective: number | null;
  note: string | null;
  kept: boolean;
}

export type PlantOutcome =
  | {
      ok: true;
      plant: Plant;
      objective: Objective;
      pass: Pass;
      solution: PassSolution;
      result: SolveResult;
      headerEnthalpy: Map<string, number>;
      contributions: UnitContribution[];
      passes: PassRecord[];
      audit: Audit;
      /** every stream and unit worked out again from the case with IF97 (src/plant/verify) */
      independentAudit: IndependentAudit;
      backend: string;
      marginalValues: MarginalValue[];
      commitments: CommitmentTried[];
      /** integer decisions kept (on/off and load segments), by variable name, for a variant to start from */
      commitment: Map<string, number>;
      /** the converged point, linearised about the kept solution, for a variant to start from */
      start: PassPoint;
    }
  | { ok: false; plant: Plant; reason: 'infeasible' | 'not_converged' | 'physics' | 'audit' | 'solver'; message: string; diagnosis?: Diagnosis; passes: PassRecord[] };

export { AUDIT_TOLERANCE, type PassRecord };

export async function solvePlant(plant: Plant, options: SolvePlantOptions = {}): Promise<PlantOutcome> {
  const objective = options.objective ?? plant.objective;
  const backend = options.backend ?? highsBackend;
  const settings: LoopSettings = {
    plant,
    objective,
    backend,
    tolerance: options.enthalpyTolerance ?? plant.solver.enthalpyTolerance,
    maxPasses: options.maxPasses ?? plant.solver.maxPasses,
    solveOptions: { timeLimitSeconds: plant.solver.timeLimit, mipRelativeGap: plant.solver.mipGap },
  };
  let passes: PassRecord[] = [];
  try {
    const quick = options.neighbour ? await fromNeighbour(settings, options.neighbour) : null;
    if (quick) return await finishSolve(settings, options, quick.best, quick.tried);
    const first = await converge(settings, contributionsOf(plant), initialHeaderEnthalpy(plant), null);
    passes = first.passes;
    if (!first.ok) {
      if (first.reason === 'infeasible') {
        const diagnosis = await diagnose(plant, first.contributions, first.point, objective, backend, settings.solveOptions);
        return { ok: false, plant, reason: 'infeasible', message: diagnosis.summary, diagnosis, passes };
      }
      return { ok: false, plant, reason: first.reason, message: first.message, passes };
    }
    const fallback = options.neighbour && !options.commitment ? { ...options, commitment: options.neighbour.commitment, start: options.neighbour.start } : options;
    const { best, tried } = await chooseCommitment(settings, first, fallback);
    return await finishSolve(settings, options, best, tried);
  } catch (error) {
    if (error instanceof PlantPhysicsError) return { ok: false, plant, reason: 'physics', message: error.message, passes };
    // A state the loop reached outside IF97 (a flow driven to an extreme enthalpy, say) is the case's physics too.
    if (error instanceof PropertyRangeError) return { ok: false, plant, reason: 'physics', message: `a steam state left the range of IF97 while solving: ${error.message}`, passes };
    throw error;
  }
}

/**
 * The neighbour's on/off decisions converged from its point (load segments
 * decided afresh), then each swap of a running boiler for a stopped one from
 * there (a swap can pay on a curved efficiency even where the linear model at
 * the point does not show it). Checked by the MIP at the converged point
 * (every integer free): kept when it chooses the same on/off and is no cheaper
 * beyond its gap; where it chooses other on/off, that choice is converged from
 * the same point and the neighbour's kept when no worse converged (the linear
 * model away from its point misleads more often than not). Null when they
 * cannot be met, do not settle, or the MIP's other choice wins and is not
 * confirmed at its own point: the full search then runs.
 */
async function fromNeighbour(settings: LoopSettings, neighbour: NonNullable<SolvePlantOptions['neighbour']>): Promise<{ best: Converged; tried: CommitmentTried[] } | null> {
  const { plant, objective, backend } = settings;
  const attempt = async (start: PassPoint, commitment: ReadonlyMap<string, number>): Promise<Converged | null> => {
    try {
      const outcome = await converge(settings, contributionsOf(plant), start, commitment);
      return outcome.ok ? outcome : null;
    } catch (error) {
      if (error instanceof PlantPhysicsError || error instanceof PropertyRangeError) return null;
      throw error;
    }
  };
  // Every integer held first (linear passes only); where that cannot be met,
  // the on/off held and the load segments of non-convex fuel curves free.
  let converged = await attempt(neighbour.start, neighbour.commitment);
  let segmentsFree = false;
  if (!converged) {
    converged = await attempt(neighbour.start, onOffOf(neighbour.commitment));
    segmentsFree = true;
  }
  if (!converged) return null;
  let current: Converged = converged;
  const entry = (source: CommitmentTried['source'], outcome: Converged): CommitmentTried => ({ source, onOff: Object.fromEntries(onOffOf(outcome.integers)), objective: outcome.result.objective ?? null, note: null, kept: false });
  const tried: CommitmentTried[] = [entry('neighbour', current)];
  // The MIP at the converged point, every integer free. Where it chooses other
  // on/off, that choice is converged too, from the same point: the neighbour's
  // stands when it is no worse converged; the MIP's choice, when better, is
  // checked the same way at its own point (once; else the full search runs).
  for (let round = 0; round < 2; round += 1) {
    const check = buildPass(plant, contributionsOf(plant), current.point, objective);
    if (!check.context.model.isMip) break;
    const confirmed = await backend.solve(check.context.model, { ...settings.solveOptions, mipDuals: false });
    if (confirmed.status !== 'optimal' || confirmed.objective === null || current.result.objective === null) return null;
    const held = current.result.objective;
    // The MIP's own gap bounds how far below its incumbent the optimum can lie.
    const margin = Math.max(1e-9, settings.solveOptions.mipRelativeGap ?? 0) * Math.max(1, Math.abs(held));
    const better = objective === 'maximumPower' ? confirmed.objective > held + margin : confirmed.objective < held - margin;
    const chosen = integerValues(check, confirmed);
    if (keyOf(onOffOf(chosen)) !== keyOf(onOffOf(current.integers))) {
      if (round > 0) return null;
      const rival = (await attempt(current.point, chosen)) ?? (await attempt(current.point, onOffOf(chosen)));
      if (!rival) return null;
      tried.push(entry('MIP at the converged points', rival));
      if (!improves(rival, current, objective)) break;
      current = rival;
      segmentsFree = false;
      continue;
    }
    if (better) return null;
    // Other load segments: the same on/off converged again with the segments free, the better kept.
    if (!segmentsFree && keyOf(sortedByName(chosen)) !== keyOf(sortedByName(current.integers))) {
      const again = await attempt(current.point, onOffOf(current.integers));
      if (again) {
        tried.push(entry('neighbour', again));
        if (improves(again, current, objective)) current = again;
      }
    }
    break;
  }
  let best: Converged = current;
  const around = onOffOf(current.integers);
  const boilers = new Set(plant.boilers.map((boiler) => `${boiler.id}.on`));
  for (const [running, on] of around) {
    for (const [stopped, off] of around) {
      if (on !== 1 || off !== 0 || !boilers.has(running) || !boilers.has(stopped)) continue;
      let outcome: Converged | NotConverged;
      try {
        outcome = await converge(settings, contributionsOf(plant), current.point, withHeldSegments(new Map(around).set(running, 0).set(stopped, 1), current.integers));
      } catch (error) {
        if (error instanceof PlantPhysicsError || error instanceof PropertyRangeError) continue;
        throw error;
      }
      if (!outcome.ok) continue;
      tried.push(entry('boiler swap', outcome));
      if (improves(outcome, best, objective)) best = outcome;
    }
  }
  for (const item of tried) item.kept = keyOf(new Map(Object.entries(item.onOff))) === keyOf(onOffOf(best.integers)) && item.objective === (best.result.objective ?? null);
  return { best, tried };
}

/** The kept decisions turned into the outcome: marginal values, the kept pass rebuilt, both audits. */
async function finishSolve(settings: LoopSettings, options: SolvePlantOptions, best: Converged, tried: CommitmentTried[]): Promise<PlantOutcome> {
  const { plant, objective, backend } = settings;
  try {
    const probe = options.probeMarginalValues ?? true;
    const values = probe ? await marginalValues(settings, best) : [];
    // The kept pass is built once more, last, so that every unit's report reads
    // the model its solution belongs to (the probes rebuilt the units).
    const kept = buildPass(plant, best.contributions, best.point, objective, { fixedIntegers: best.integers });
    const keptResult = await backend.solve(kept.context.model, settings.solveOptions);
    const useKept = keptResult.status === 'optimal';
    const pass = useKept ? kept : best.pass;
    const result = useKept ? keptResult : best.result;
    const solution = useKept ? passSolution(keptResult) : best.solution;
    const reports = best.contributions.map((unit) => unit.report(solution));
    const audit = useKept ? auditPass(pass, solution, reports) : best.audit;
    if (audit.worstRelative > AUDIT_TOLERANCE) return { ok: false, plant, reason: 'audit', message: `the balance does not close: ${audit.worstDescription}`, passes: best.passes };
    // The independent audit: the solve's flows and header states through the case's own physics.
    const independentAudit = auditSolve(plant, solvedHeaderEnthalpy(pass, solution), reports);
    if (!independentAudit.ok) return { ok: false, plant, reason: 'audit', message: independentAudit.summary, passes: best.passes };
    if (!probe) values.push(...dualValues(pass, result));
    const commitment = new Map(best.integers);
    const start: PassPoint = { headerEnthalpy: solvedHeaderEnthalpy(pass, solution), previous: solutionValues(pass, result), trust: new Map(pass.context.trust) };
    return {
      ok: true,
      plant,
      objective,
      pass,
      solution,
      result,
      headerEnthalpy: solvedHeaderEnthalpy(pass, solution),
      contributions: best.contributions,
      passes: best.passes,
      audit,
      independentAudit,
      backend: result.backend,
      marginalValues: values,
      commitments: tried,
      commitment,
      start,
    };
  } catch (error) {
    const passes = best.passes;
    if (error instanceof PlantPhysicsError) return { ok: false, plant, reason: 'physics', message: error.message, passes };
    // A state the loop reached outside IF97 (a flow driven to an extreme enthalpy, say) is the case's physics too.
    if (error instanceof PropertyRangeError) return { ok: false, plant, reason: 'physics', message: `a steam state left the range of IF97 while solving: ${error.message}`, passes };
    throw error;
  }
}

/**
 * On/off decisions judged at their own converged points: the first pass's
 * MIP, the MIP at the converged points, the base plant's decisions where given,
 * single flips of each switchable unit and swaps of a running boiler for a
 * stopped one, each converged on its own; the
 * lowest converged objective is kept. A unit that may switch off can then never
 * raise the optimum: running it as before is one of the candidates.
 */
async function chooseCommitment(settings: LoopSettings, first: Converged, options: SolvePlantOptions): Promise<{ best: Converged; tried: CommitmentTried[] }> {
  const { plant, objective, backend } = settings;
  let best = first;
  const tried: CommitmentTried[] = [];
  const bestIndex = (): number => tried.findIndex((entry) => entry.kept);
  const seen = new Set<string>();
  const record = (source: CommitmentTried['source'], onOff: Map<string, number>, outcome: Converged | NotConverged | null, note: string | null = null): void => {
    const objectiveValue = outcome?.ok ? (outcome.result.objective ?? null) : null;
    const entry: CommitmentTried = { source, onOff: Object.fromEntries(onOff), objective: objectiveValue, note: outcome && !outcome.ok ? (outcome.reason === 'infeasible' ? 'cannot meet the demand' : outcome.message) : note, kept: false };
    if (outcome?.ok && (outcome === first || improves(outcome, best, objective))) {
      const previous = bestIndex();
      if (previous >= 0) tried[previous].kept = false;
      entry.kept = true;
      best = outcome;
    }
    tried.push(entry);
  };
  const firstOnOff = onOffOf(first.integers);
  seen.add(keyOf(firstOnOff));
  seen.add(keyOf(first.integers));
  record('first pass', firstOnOff, first);

  const attempt = async (source: CommitmentTried['source'], onOff: Map<string, number>): Promise<void> => {
    const key = keyOf(onOff);
    if (seen.has(key)) return;
    seen.add(key);
    // Warm from the best point so far, the load segments of unswitched units
    // held; where that cannot be met, from the cold start with every segment
    // free, since a point far from this commitment's may be unable to reach it
    // within the trust radii.
    let outcome: Converged | NotConverged = await converge(settings, contributionsOf(plant), best.point, withHeldSegments(onOff, best.integers));
    if (!outcome.ok && outcome.reason === 'infeasible') outcome = await converge(settings, contributionsOf(plant), initialHeaderEnthalpy(plant), onOffOf(onOff));
    record(source, onOffOf(onOff), outcome);
  };

  // The MIP at the converged points, with every integer free.
  const check = buildPass(plant, contributionsOf(plant), best.point, objective);
  const confirmed = await backend.solve(check.context.model, { ...settings.solveOptions, mipDuals: false });
  // Its load segments too (non-convex fuel curves), which the first pass decided far from here.
  if (confirmed.status === 'optimal') await attempt('MIP at the converged points', integerValues(check, confirmed));
  if (options.commitment) {
    // The base plant's decisions, with the units it does not have stopped (and
    // their segments empty): the base plant itself, from its own point where
    // given, so an added unit that may stop can never cost more.
    const base = new Map([...first.integers].map(([name]) => [name, options.commitment!.get(name) ?? 0]));
    const key = keyOf(base);
    // From the base's own point it may reach a better point than the same
    // decisions reached from the cold start, so it is tried even if seen.
    if (!seen.has(key) || options.start) {
      seen.add(key);
      let outcome: Converged | NotConverged = await converge(settings, contributionsOf(plant), options.start ?? best.point, base);
      if (!outcome.ok && outcome.reason === 'infeasible') outcome = await converge(settings, contributionsOf(plant), initialHeaderEnthalpy(plant), onOffOf(base));
      record('base plant', onOffOf(base), outcome);
    }
  }
  const maxFlips = options.maxFlips ?? 20;
  const boilers = new Set(plant.boilers.map((boiler) => `${boiler.id}.on`));
  // Flips of the best so far, and swaps of a running boiler for a stopped one
  // (which boiler carries the load); once more if one of them found a better one.
  for (let round = 0; round < 2 && firstOnOff.size > 0 && firstOnOff.size <= maxFlips; round += 1) {
    const around = onOffOf(best.integers);
    const before = best;
    for (const name of around.keys()) {
      const flipped = new Map(around);
      flipped.set(name, 1 - around.get(name)!);
      await attempt('single flip', flipped);
    }
    for (const [running, on] of around) {
      for (const [stopped, off] of around) {
        if (on !== 1 || off !== 0 || !boilers.has(running) || !boilers.has(stopped)) continue;
        await attempt('boiler swap', new Map(around).set(running, 0).set(stopped, 1));
      }
    }
    if (best === before) break;
  }
  return { best, tried };
}

/**
 * On/off decisions to try, with the best's other integers (load segments of
 * non-convex fuel curves) held for every unit whose on/off does not change, so
 * that only a unit just switched decides its segments again. A full set of
 * integers (the MIP's) is taken as it is.
 */
function withHeldSegments(candidate: ReadonlyMap<string, number>, best: ReadonlyMap<string, number>): Map<string, number> {
  if ([...candidate.keys()].some((name) => !name.endsWith('.on'))) return new Map(candidate);
  const switched = [...candidate].filter(([name, value]) => best.get(name) !== value).map(([name]) => name.slice(0, -'.on'.length));
  const held = new Map([...best].filter(([name]) => !name.endsWith('.on') && !switched.some((unit) => name.startsWith(`${unit}.`))));
  for (const [name, value] of candidate) held.set(name, value);
  return held;
}

function onOffOf(integers: ReadonlyMap<string, number>): Map<string, number> {
  return new Map([...integers].filter(([name]) => name.endsWith('.on')).sort(([a], [b]) => a.localeCompare(b)));
}

function sortedByName(values: ReadonlyMap<string, number>): Map<string, number> {
  return new Map([...values].sort(([a], [b]) => a.localeCompare(b)));
}

function keyOf(onOff: ReadonlyMap<string, number>): string {
  return [...onOff].map(([name, value]) => `${name}=${value}`).join(',');
}

/** Whether a converged candidate beats the best so far beyond round-off. */
function improves(candidate: Converged, best: Converged, objective: Objective): boolean {
  const value = candidate.result.objective;
  const held = best.result.objective;
  if (value === null || held === null) return false;
  // Converged objectives are linear programs' optima with every integer held:
  // no MIP gap applies, only round-off.
  const margin = 1e-9 * Math.max(1, Math.abs(held));
  return objective === 'maximumPower' ? value > held + margin : value < held - margin;
}

/** Marginal values from the kept pass's duals alone, when probing is off. */
function dualValues(pass: Pass, result: SolveResult): MarginalValue[] {
  return pass.context.plant.headers.map((header) => ({ header: header.id, dual: headerDual(result, header.id, pass.context.h(header.id)), more: null, less: null, moreSetBy: [], lessSetBy: [] }));
}

/** Every variable's value in a solution, by name, header moves excepted (a next point's moves are 0). */
function solutionValues(pass: Pass, result: SolveResult): Map<string, number> {
  const moves = new Set([...pass.context.headerMoves.values()].map((variable) => variable.name));
  return new Map(pass.context.model.variables.filter((variable) => !moves.has(variable.name)).map((variable) => [variable.name, result.value(variable)]));
}

/** Each header's enthalpy in the solution: its point plus its solved move. */
function solvedHeaderEnthalpy(pass: Pass, solution: PassSolution): Map<string, number> {
  const points = new Map<string, number>();
  for (const [id, h] of pass.context.headerEnthalpy) points.set(id, h + solution.evaluate(pass.context.headerMove(id)));
  return points;
}

/**
 * First guess: controlled headers at their set point; a floating header at the
 * hottest steam a boiler or import delivers straight into it, or else dry
 * saturated steam (mixing then moves it).
 */
export function initialHeaderEnthalpy(plant: Plant): Map<string, number> {
  const points = new Map<string, number>();
  const direct = new Map<string, number>();
  const offer = (header: string, h: number): void => {
    direct.set(header, Math.max(direct.get(header) ?? -Infinity, h));
  };
  for (const boiler of plant.boilers) offer(boiler.header, boiler.outlet.h);
  for (const boiler of plant.heatRecoveryBoilers) offer(boiler.header, boiler.outlet.h);
  for (const supply of plant.steamImports) offer(supply.header, supply.delivered.h);
  for (const header of plant.headers) {
    if (header.state.kind === 'controlled') points.set(header.id, header.state.h);
    else points.set(header.id, direct.get(header.id) ?? saturatedVapour(header.pressure).h);
  }
  return points;
}
