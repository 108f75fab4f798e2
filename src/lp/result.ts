import type { CompiledModel } from './compile.js';
import { checkPrimalFeasibility, defaultFeasibilityTolerance } from './feasibility.js';
import type { Variable } from './variable.js';

/**
 * Outcome of a solve, the same words for every backend. Each backend maps its
 * solver's own statuses onto these through one explicit table, with
 * 'unknown' for anything the table does not list.
 */
export type SolveStatus =
  | 'optimal'
  | 'infeasible'
  | 'unbounded'
  | 'time_limit'
  | 'iteration_limit'
  | 'did_not_finish'
  | 'error'
  | 'unknown';

/** Where the duals came from: the LP itself, or the LP with integers fixed at the MIP optimum. */
export type DualSource = 'lp' | 'fixed_lp';

/**
 * Sign convention (one for all backends, min and max alike):
 *
 *   shadowPrice(row) = d(optimal objective) / d(right-hand side of row)
 *
 * the change in the optimal objective value, in the model's own sense and
 * units, per unit increase of the row's bound (for a ranged row, of whichever
 * bound is active). The right-hand side is the row's normalised bound: a
 * constant written in the row's expression counts as moved across. Examples:
 * minimising cost with a `>=` demand row gives a price >= 0 (more demand
 * costs more); maximising profit with a `<=` capacity row gives a price >= 0;
 * minimising with a binding `<=` capacity row gives a price <= 0.
 * Reduced costs follow the same rule for a variable's active bound:
 * d(optimal objective) / d(bound).
 *
 * HiGHS reports row duals and column duals in exactly this convention (checked
 * for min and max, <= and >= rows, in tests/lp/result.test.ts), so `dual` and
 * `shadowPrice` agree for it; `dual` holds the solver's raw values.
 */
export interface SolveResult {
  readonly backend: string;
  readonly status: SolveStatus;
  /** Objective at the returned point, offset included; null without a solution. */
  readonly objective: number | null;
  /** Variable values by variable name; empty without a solution. */
  readonly primal: ReadonlyMap<string, number>;
  /** Row activities (the row's terms, without the expression constant) by row name. */
  readonly rowActivity: ReadonlyMap<string, number>;
  /** Raw row duals by row name, or null when the backend gives none. */
  readonly dual: ReadonlyMap<string, number> | null;
  /** Reduced costs by variable name, or null. */
  readonly reducedCost: ReadonlyMap<string, number> | null;
  readonly dualsAvailable: boolean;
  readonly dualSource: DualSource | null;
  /** Simplex (plus interior-point) iterations where the backend reports them. */
  readonly iterations: number | null;
  /** Branch-and-bound nodes for a MIP, where reported. */
  readonly mipNodes: number | null;
  /** Wall-clock time of the solve call, milliseconds. */
  readonly timeMs: number;
  readonly message?: string;
  /** True when primal values are present (optimal, or a limit with an incumbent). */
  readonly hasSolution: boolean;
  /** d(optimal objective)/d(rhs) of the named row; throws when duals are unavailable. */
  shadowPrice(rowName: string): number;
  /** The value of a variable (handle or name); throws without a solution. */
  value(variable: Variable | string): number;
}

/** What a backend hands over before checking and naming. */
export interface RawOutcome {
  readonly backend: string;
  readonly status: SolveStatus;
  readonly objective?: number;
  readonly colValue?: ArrayLike<number>;
  readonly rowDual?: ArrayLike<number>;
  readonly colDual?: ArrayLike<number>;
  readonly dualSource?: DualSource;
  readonly iterations?: number | null;
  readonly mipNodes?: number | null;
  readonly timeMs: number;
  readonly message?: string;
  /** Why duals are missing, when they are; goes into the shadowPrice error. */
  readonly dualsMissingReason?: string;
}

const statusesWithPoint: ReadonlySet<SolveStatus> = new Set(['optimal', 'time_limit', 'iteration_limit']);

/**
 * Names the raw arrays, and checks primal feasibility of every returned point
 * before handing it on: a point that breaks a row beyond tolerance turns the
 * result into 'error' with the worst violations in the message.
 */
export function buildResult(compiled: CompiledModel, raw: RawOutcome, tolerance = defaultFeasibilityTolerance): SolveResult {
  let status = raw.status;
  let message = raw.message;
  const primal = new Map<string, number>();
  const rowActivity = new Map<string, number>();
  let objective: number | null = null;
  let dual: Map<string, number> | null = null;
  let reducedCost: Map<string, number> | null = null;
  let hasSolution = false;

  if (raw.colValue && statusesWithPoint.has(status)) {
    const report = checkPrimalFeasibility(compiled, raw.colValue, tolerance);
    if (!report.feasible) {
      message = `${raw.backend} returned a point that is not feasible (${status}): ${report.violations.join('; ')}`;
      status = 'error';
    } else {
      compiled.columnNames.forEach((name, column) => primal.set(name, raw.colValue![column] + 0));
      compiled.rowNames.forEach((name, row) => rowActivity.set(name, report.activity[row] + 0));
      objective = raw.objective ?? null;
      hasSolution = true;
      if (raw.rowDual && raw.colDual) {
        dual = new Map(compiled.rowNames.map((name, row) => [name, raw.rowDual![row] + 0]));
        reducedCost = new Map(compiled.columnNames.map((name, column) => [name, raw.colDual![column] + 0]));
      }
    }
  }
  const dualsAvailable = dual !== null;
  const dualSource = dualsAvailable ? (raw.dualSource ?? 'lp') : null;
  const missing = raw.dualsMissingReason ?? (hasSolution ? 'the backend gave none' : `the solve ended "${status}"`);

  return {
    backend: raw.backend,
    status,
    objective,
    primal,
    rowActivity,
    dual,
    reducedCost,
    dualsAvailable,
    dualSource,
    iterations: raw.iterations ?? null,
    mipNodes: raw.mipNodes ?? null,
    timeMs: raw.timeMs,
    ...(message === undefined ? {} : { message }),
    hasSolution,
    shadowPrice(rowName: string): number {
      if (!dual) throw new Error(`No shadow price for row "${rowName}" from ${raw.backend}: ${missing}. Check dualsAvailable first.`);
      const price = dual.get(rowName);
      if (price === undefined) throw new Error(`Model "${compiled.name}" has no row named "${rowName}".`);
      return price;
    },
    value(variable: Variable | string): number {
      const name = typeof variable === 'string' ? variable : variable.name;
      const found = primal.get(name);
      if (found === undefined) {
        if (!hasSolution) throw new Error(`No value for "${name}": the solve by ${raw.backend} ended "${status}" without a solution.`);
        throw new Error(`Model "${compiled.name}" has no variable named "${name}".`);
      }
      return found;
    },
  };
}
