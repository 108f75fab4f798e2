// Successive linear programming for one set of on/off decisions: solve the
// plant linearised about its point, move the point, and repeat until it holds
// still. The first pass fixes the floating headers' enthalpies (there are no
// flows yet to linearise about); from the second pass each floating header's
// enthalpy is a variable, its energy row is written with every m h taken to
// first order about the last pass, and a trust radius bounds its move.
import type { SolveOptions, SolveResult, SolverBackend } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { auditPass, type Audit } from './audit.js';
import { buildPass, type Pass } from './buildPass.js';
import type { PassPoint } from './context.js';
import type { PointChange, UnitContribution } from './contribution.js';
import { passSolution, type PassSolution } from './passSolution.js';

export interface PassRecord {
  pass: number;
  objective: number;
  /** the largest change of any property point after this pass */
  largestChange: PointChange | null;
  solveMs: number;
  /** on/off decisions held from earlier passes, so this pass was a linear program */
  integersHeld: boolean;
  /** where the solver stopped short of optimal but with a point that was used: why, and the gap */
  note?: string;
}

/** Audit residuals above this relative size fail the solve. */
export const AUDIT_TOLERANCE = 1e-6;

/** First trust radius of a floating header's enthalpy, and its bounds, kJ/kg. */
const TRUST = { initial: 50, largest: 400, smallest: 1e-4 } as const;

export interface LoopSettings {
  plant: Plant;
  objective: Objective;
  backend: SolverBackend;
  tolerance: number;
  maxPasses: number;
  solveOptions: SolveOptions;
}

export type Converged = {
  ok: true;
  pass: Pass;
  result: SolveResult;
  solution: PassSolution;
  contributions: UnitContribution[];
  /** the point the kept pass was linearised about */
  point: PassPoint;
  /** every integer variable's value, by name */
  integers: Map<string, number>;
  passes: PassRecord[];
  audit: Audit;
};

export type NotConverged =
  | { ok: false; reason: 'infeasible'; point: PassPoint; contributions: UnitContribution[]; passes: PassRecord[] }
  | { ok: false; reason: 'solver' | 'not_converged' | 'audit'; message: string; passes: PassRecord[] };

/**
 * Converges the plant with the named integers held (null: the first pass
 * decides them all). Integers not named are decided by the first pass and then
 * held. Throws PlantPhysicsError or PropertyRangeError for physics the case
 * cannot reach.
 */
export async function converge(settings: LoopSettings, contributions: UnitContribution[], start: ReadonlyMap<string, number> | PassPoint, commitment: ReadonlyMap<string, number> | null): Promise<Converged | NotConverged> {
  const { plant, objective, backend, tolerance, maxPasses } = settings;
  const passOptions = { ...settings.solveOptions, mipDuals: false };
  // From a bare guess of the headers' enthalpies, or warm from another converged
  // point (its flows to linearise about and its trust radii): the first pass is then linearised too.
  const warm = start instanceof Map ? null : (start as PassPoint);
  const headerEnthalpy = new Map(warm ? warm.headerEnthalpy : (start as ReadonlyMap<string, number>));
  const trust = new Map<string, number>(warm ? [...warm.trust].map(([id, radius]) => [id, Math.max(radius, TRUST.initial)]) : []);
  const lastMove = new Map<string, number>();
  let previous: Map<string, number> | null = warm?.previous ? new Map(warm.previous) : null;
  let fixed: ReadonlyMap<string, number> | null = commitment;
  let held = false;
  const passes: PassRecord[] = [];
  const history: PointChange[][] = [];

  for (let passNumber = 1; passNumber <= maxPasses; passNumber += 1) {
    const point: PassPoint = { headerEnthalpy: new Map(headerEnthalpy), previous, trust: new Map(trust) };
    const pass = buildPass(plant, contributions, point, objective, { fixedIntegers: fixed });
    // Duals are asked for only where the pass is a linear program; a MIP pass is never the kept one.
    const result = await backend.solve(pass.context.model, pass.context.model.isMip ? passOptions : settings.solveOptions);
    // A MIP stopped by its time limit with a point: take the point (its on/off
    // decisions are then held and judged like any other), and say so.
    const limited = result.status === 'time_limit' && result.hasSolution && pass.context.model.isMip;
    if (result.status !== 'optimal' && !limited) {
      if (held) {
        // The held decisions no longer fit the moved points: decide the free ones again.
        fixed = commitment;
        held = false;
        continue;
      }
      if (result.status === 'infeasible' || result.status === 'unbounded') return { ok: false, reason: 'infeasible', point, contributions, passes };
      return { ok: false, reason: 'solver', message: `the solver (${result.backend}) ended "${result.status}"${result.message ? `: ${result.message}` : ''}`, passes };
    }
    const integers = integerValues(pass, result);
    const wasHeld = held;
    if (!held && integers.size > 0) {
      fixed = integers;
      held = true;
    }
    const solution = passSolution(result);
    const changes = movePoints(plant, pass, solution, contributions, headerEnthalpy, trust, lastMove);
    history.push(changes);
    const largest = changes.reduce<PointChange | null>((worst, change) => (worst === null || change.change > worst.change ? change : worst), null);
    passes.push({ pass: passNumber, objective: result.objective ?? NaN, largestChange: largest, solveMs: result.timeMs, integersHeld: wasHeld, ...(limited ? { note: `${result.message ?? 'the solver stopped at its time limit'}; its on/off decisions were used` } : {}) });
    previous = pointValues(pass, result);
    // A pass whose integers were still free is a MIP without duals: go on at least once.
    if (pass.context.model.isMip) continue;
    const settled = changes.every((change) => change.unit !== 'kJ/kg' || change.change < tolerance) && !changes.some((change) => change.what.endsWith('.h (at its trust radius)'));
    const linearised = plant.headers.every((header) => header.state.kind === 'controlled' || point.trust.has(header.id) || !throughputOf(pass, solution, header.id));
    if (!settled || !linearised) continue;
    const audit = auditPass(pass, solution, contributions.map((unit) => unit.report(solution)));
    if (audit.worstRelative <= AUDIT_TOLERANCE) {
      return { ok: true, pass, result, solution, contributions, point, integers, passes, audit };
    }
    if (passNumber === maxPasses) return { ok: false, reason: 'audit', message: `the balance does not close: ${audit.worstDescription}`, passes };
  }
  return { ok: false, reason: 'not_converged', message: notSettled(history, maxPasses, tolerance), passes };
}

/**
 * Moves every point: a linearised floating header by its solved move (its
 * trust radius halved when the move turns back, doubled when it was cut
 * short); a header not yet linearised to the mixing enthalpy of what entered
 * it, after which it is linearised; then each unit's own points.
 */
function movePoints(
  plant: Plant,
  pass: Pass,
  solution: PassSolution,
  contributions: readonly UnitContribution[],
  headerEnthalpy: Map<string, number>,
  trust: Map<string, number>,
  lastMove: Map<string, number>,
): PointChange[] {
  const changes: PointChange[] = [];
  const context = pass.context;
  for (const header of plant.headers) {
    if (header.state.kind === 'controlled') continue;
    const previous = headerEnthalpy.get(header.id)!;
    const radius = context.trust.get(header.id);
    const move = context.headerMoves.get(header.id);
    if (move && radius !== undefined) {
      if (!throughputOf(pass, solution, header.id)) {
        // Idle in this pass: its enthalpy means nothing, so it stays, and is set
        // by mixing again once steam flows.
        trust.delete(header.id);
        lastMove.delete(header.id);
        continue;
      }
      const step = solution.value(move);
      const last = lastMove.get(header.id) ?? 0;
      const atRadius = Math.abs(step) >= radius * (1 - 1e-9) && radius < TRUST.largest;
      let next = radius;
      if (last !== 0 && Math.sign(step) !== Math.sign(last) && Math.abs(step) > 1e-9) next = Math.max(TRUST.smallest, Math.abs(step) / 2);
      else if (atRadius) next = Math.min(TRUST.largest, radius * 2);
      trust.set(header.id, next);
      lastMove.set(header.id, step);
      headerEnthalpy.set(header.id, previous + step);
      changes.push({ what: atRadius ? `${header.id}.h (at its trust radius)` : `${header.id}.h`, change: Math.abs(step), unit: 'kJ/kg' });
      continue;
    }
    let mass = 0;
    let energy = -header.heatLoss;
    for (const stream of context.streamsInto(header.id)) {
      const flow = solution.evaluate(stream.flow);
      mass += flow;
      energy += stream.energy ? solution.evaluate(stream.energy) : flow * stream.h;
    }
    if (mass <= 1e-9) continue;
    const next = energy / mass;
    changes.push({ what: `${header.id}.h`, change: Math.abs(next - previous), unit: 'kJ/kg' });
    headerEnthalpy.set(header.id, next);
    trust.set(header.id, Math.max(TRUST.initial, 2 * Math.abs(next - previous)));
  }
  const enthalpyOf = (id: string): number => headerEnthalpy.get(id)!;
  for (const unit of contributions) changes.push(...(unit.update?.(solution, enthalpyOf) ?? []));
  return changes;
}

function throughputOf(pass: Pass, solution: PassSolution, id: string): boolean {
  return pass.context.streamsInto(id).some((stream) => solution.evaluate(stream.flow) > 1e-9);
}

/** Values of the pass's integer variables, rounded, by name. */
export function integerValues(pass: Pass, result: SolveResult): Map<string, number> {
  const values = new Map<string, number>();
  for (const variable of pass.context.model.variables) if (variable.isInteger) values.set(variable.name, Math.round(result.value(variable)));
  // Held integers are written as fixed continuous variables: keep them too.
  for (const [name] of pass.context.fixedIntegers ?? []) {
    const variable = pass.context.model.variables.find((candidate) => candidate.name === name);
    if (variable) values.set(name, Math.round(result.value(variable)));
  }
  return values;
}

/** The pass's flows by name, the point the next pass linearises about; header moves are 0 there by definition. */
function pointValues(pass: Pass, result: SolveResult): Map<string, number> {
  const moves = new Set([...pass.context.headerMoves.values()].map((variable) => variable.name));
  const values = new Map<string, number>();
  for (const variable of pass.context.model.variables) if (!moves.has(variable.name)) values.set(variable.name, result.value(variable));
  return values;
}

/** Names the point that would not settle, and whether it swung back and forth. */
function notSettled(history: PointChange[][], maxPasses: number, tolerance: number): string {
  const recent = history.slice(-6);
  const moves = new Map<string, number[]>();
  for (const changes of recent) for (const change of changes) if (change.unit === 'kJ/kg') moves.set(change.what.replace(' (at its trust radius)', ''), [...(moves.get(change.what.replace(' (at its trust radius)', '')) ?? []), change.change]);
  let worst: [string, number[]] | null = null;
  for (const entry of moves) if (!worst || Math.max(...entry[1]) > Math.max(...worst[1])) worst = entry;
  if (!worst) return `the property points did not settle in ${maxPasses} passes. Raise solver.max_passes.`;
  const [what, sizes] = worst;
  const steady = sizes.length >= 4 && Math.min(...sizes) > 0.5 * Math.max(...sizes);
  const pattern = steady ? `keeps moving by about ${Math.max(...sizes).toPrecision(3)} kJ/kg a pass, swinging between two states` : `still moved ${sizes[sizes.length - 1].toPrecision(3)} kJ/kg in the last pass`;
  return `the property points did not settle in ${maxPasses} passes: ${what} ${pattern} (tolerance ${tolerance} kJ/kg). A unit whose flow sets that point is near a limit where it switches between two ways of running; fix its flow or loosen the limit, or raise solver.max_passes.`;
}
