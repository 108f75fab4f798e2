// Successive linearisation: fix the property points, solve the linear model,
// move the points to agree with the flows, and repeat until nothing moves.
import { highsBackend, type SolveResult, type SolverBackend } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { PropertyRangeError, saturatedVapour } from '../properties/index.js';
import { auditPass, type Audit } from './audit.js';
import { buildPass, type Pass } from './buildPass.js';
import type { PointChange, UnitContribution } from './contribution.js';
import { contributionsOf } from './contributions.js';
import { diagnose, type Diagnosis } from './diagnose.js';
import { passSolution, type PassSolution } from './passSolution.js';
import { PlantPhysicsError } from './units/user.js';
import { auditSolve, type IndependentAudit } from './verify/index.js';

export interface SolvePlantOptions {
  objective?: Objective;
  backend?: SolverBackend;
  /** largest enthalpy change between passes for convergence, kJ/kg (default from the case) */
  enthalpyTolerance?: number;
  maxPasses?: number;
}

export interface PassRecord {
  pass: number;
  objective: number;
  /** the largest change of any property point after this pass */
  largestChange: PointChange | null;
  solveMs: number;
  /** on/off decisions held from earlier passes, so this pass was a linear program */
  integersHeld: boolean;
}

export type PlantOutcome =
  | { ok: true; plant: Plant; objective: Objective; pass: Pass; solution: PassSolution; result: SolveResult; headerEnthalpy: Map<string, number>; contributions: UnitContribution[]; passes: PassRecord[]; audit: Audit; independentAudit: IndependentAudit; backend: string }
  | { ok: false; plant: Plant; reason: 'infeasible' | 'not_converged' | 'physics' | 'audit' | 'solver'; message: string; diagnosis?: Diagnosis; passes: PassRecord[] };

/** Audit residuals above this relative size fail the solve. */
export const AUDIT_TOLERANCE = 1e-6;

export async function solvePlant(plant: Plant, options: SolvePlantOptions = {}): Promise<PlantOutcome> {
  const objective = options.objective ?? plant.objective;
  const backend = options.backend ?? highsBackend;
  const tolerance = options.enthalpyTolerance ?? plant.solver.enthalpyTolerance;
  const maxPasses = options.maxPasses ?? plant.solver.maxPasses;
  const contributions = contributionsOf(plant);
  const headerEnthalpy = initialHeaderEnthalpy(plant);
  const passes: PassRecord[] = [];
  const solveOptions = { timeLimitSeconds: plant.solver.timeLimit, mipRelativeGap: plant.solver.mipGap };
  // Duals matter only for the pass that is kept; a kept MIP pass gets them from its LP with integers fixed.
  const passOptions = { ...solveOptions, mipDuals: false };

  try {
    // On/off decisions usually hold from the first pass. Later passes keep them
    // fixed and solve linear programs; at convergence one mixed-integer solve at
    // the final points confirms them, or sends the loop on with better ones.
    let fixed: Map<string, number> | null = null;
    let previousIntegers: Map<string, number> | null = null;
    let converged = false;
    for (let passNumber = 1; passNumber <= maxPasses; passNumber += 1) {
      let pass = buildPass(plant, contributions, headerEnthalpy, objective, false, fixed);
      let result = await backend.solve(pass.context.model, passOptions);
      if (result.status !== 'optimal') {
        if (fixed) {
          // The held decisions no longer fit the moved points: decide them again.
          fixed = null;
          previousIntegers = null;
          converged = false;
          continue;
        }
        if (result.status === 'infeasible' || result.status === 'unbounded') {
          const diagnosis = await diagnose(plant, contributions, headerEnthalpy, objective, backend, solveOptions);
          return { ok: false, plant, reason: 'infeasible', message: diagnosis.summary, diagnosis, passes };
        }
        return { ok: false, plant, reason: 'solver', message: `the solver (${result.backend}) ended "${result.status}"${result.message ? `: ${result.message}` : ''}`, passes };
      }
      const integers: Map<string, number> = fixed ?? integerValues(pass, result);
      let solution = passSolution(result);
      const changes = updatePoints(plant, pass, solution, contributions, headerEnthalpy);
      const enthalpyChanges = changes.filter((change) => change.unit === 'kJ/kg');
      const largest = changes.reduce<PointChange | null>((worst, change) => (worst === null || change.change > worst.change ? change : worst), null);
      const largestEnthalpy = enthalpyChanges.reduce((worst, change) => Math.max(worst, change.change), 0);
      passes.push({ pass: passNumber, objective: result.objective ?? NaN, largestChange: largest, solveMs: result.timeMs, integersHeld: fixed !== null });
      if (!fixed && integers.size > 0) fixed = integers;
      previousIntegers = integers;
      // Converged once the points hold still; the audit then decides whether the
      // last pass's points were close enough for balances to close.
      if (largestEnthalpy < tolerance && passNumber > 1) converged = true;
      if (!converged) continue;
      if (pass.context.fixedIntegers) {
        const check = buildPass(plant, contributions, pass.context.headerEnthalpy, objective);
        const confirmed = await backend.solve(check.context.model, passOptions);
        const confirmedIntegers = confirmed.status === 'optimal' ? integerValues(check, confirmed) : null;
        const better = confirmed.status === 'optimal' && result.objective !== null && confirmed.objective !== null && improves(confirmed.objective, result.objective, pass);
        if (!confirmedIntegers || (better && !sameValues(confirmedIntegers, pass.context.fixedIntegers))) {
          // A different commitment pays at the final points: iterate on with it.
          fixed = null;
          previousIntegers = confirmedIntegers;
          converged = false;
          continue;
        }
      }
      // The kept pass is solved once more as the last model built, with its
      // integers held: a linear program with the same optimum and its duals, and
      // every unit's report reads the same model as the streams (the check above
      // rebuilt the units).
      const kept = buildPass(plant, contributions, pass.context.headerEnthalpy, objective, false, integers);
      const keptResult = await backend.solve(kept.context.model, solveOptions);
      if (keptResult.status === 'optimal') {
        pass = kept;
        result = keptResult;
        solution = passSolution(keptResult);
      }
      const reports = contributions.map((unit) => unit.report(solution));
      const audit = auditPass(pass, solution, reports);
      if (audit.worstRelative <= AUDIT_TOLERANCE || passNumber === maxPasses) {
        if (audit.worstRelative > AUDIT_TOLERANCE) {
          return { ok: false, plant, reason: 'audit', message: `the balance does not close: ${audit.worstDescription}`, passes };
        }
        // The independent audit: the solve's flows and header states through the case's own physics.
        const independentAudit = auditSolve(plant, pass.context.headerEnthalpy, reports);
        if (!independentAudit.ok) return { ok: false, plant, reason: 'audit', message: independentAudit.summary, passes };
        return { ok: true, plant, objective, pass, solution, result, headerEnthalpy: pointsOf(pass), contributions, passes, audit, independentAudit, backend: result.backend };
      }
    }
    const last = passes[passes.length - 1]?.largestChange;
    return {
      ok: false,
      plant,
      reason: 'not_converged',
      message: `the property points did not settle in ${maxPasses} passes: ${last ? `${last.what} still moved ${last.change.toPrecision(3)} ${last.unit}` : 'no pass finished'} (tolerance ${tolerance} kJ/kg). Raise solver.max_passes or look for a recycle that oscillates.`,
      passes,
    };
  } catch (error) {
    if (error instanceof PlantPhysicsError) return { ok: false, plant, reason: 'physics', message: error.message, passes };
    // A state the loop reached outside IF97 (a flow driven to an extreme enthalpy, say) is the case's physics too.
    if (error instanceof PropertyRangeError) return { ok: false, plant, reason: 'physics', message: `a steam state left the range of IF97 while solving: ${error.message}`, passes };
    throw error;
  }
}

/** Values of the pass's integer variables, rounded, by name. */
function integerValues(pass: Pass, result: SolveResult): Map<string, number> {
  const values = new Map<string, number>();
  for (const variable of pass.context.model.variables) if (variable.isInteger) values.set(variable.name, Math.round(result.value(variable)));
  return values;
}

function sameValues(a: ReadonlyMap<string, number>, b: ReadonlyMap<string, number>): boolean {
  if (a.size !== b.size) return false;
  for (const [name, value] of a) if (b.get(name) !== value) return false;
  return true;
}

/** Whether the unrestricted optimum beats the held one by more than the MIP gap. */
function improves(free: number, held: number, pass: Pass): boolean {
  const gap = pass.context.plant.solver.mipGap;
  const margin = Math.max(1e-9, gap) * Math.max(1, Math.abs(held));
  return pass.context.model.objective?.sense === 'maximize' ? free > held + margin : free < held - margin;
}

function pointsOf(pass: Pass): Map<string, number> {
  return new Map(pass.context.headerEnthalpy);
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

/**
 * Moves floating headers to the mixing enthalpy of what entered them,
 * h = (sum m h - heat loss) / sum m, then lets each unit move its own points.
 */
function updatePoints(plant: Plant, pass: Pass, solution: PassSolution, contributions: readonly UnitContribution[], headerEnthalpy: Map<string, number>): PointChange[] {
  const changes: PointChange[] = [];
  for (const header of plant.headers) {
    if (header.state.kind === 'controlled') continue;
    let mass = 0;
    let energy = -header.heatLoss;
    for (const stream of pass.context.streamsInto(header.id)) {
      const flow = solution.evaluate(stream.flow);
      mass += flow;
      energy += flow * stream.h;
    }
    if (mass <= 1e-9) continue;
    const next = energy / mass;
    const previous = headerEnthalpy.get(header.id)!;
    changes.push({ what: `${header.id}.h`, change: Math.abs(next - previous), unit: 'kJ/kg' });
    headerEnthalpy.set(header.id, next);
  }
  const enthalpyOf = (id: string): number => headerEnthalpy.get(id)!;
  for (const unit of contributions) changes.push(...(unit.update?.(solution, enthalpyOf) ?? []));
  return changes;
}
