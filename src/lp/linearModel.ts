import { LinearExpression } from './expression.js';
import type { Row, RowSense } from './row.js';
import { Variable, type VariableOptions, type VariableType } from './variable.js';
import { describeModel } from './describe.js';

export type ObjectiveSense = 'minimize' | 'maximize';

export interface Objective {
  readonly sense: ObjectiveSense;
  /** Constant included: it is the objective offset. */
  readonly expression: LinearExpression;
}

const variableTypes: readonly VariableType[] = ['continuous', 'binary', 'integer'];

/**
 * A solver-neutral linear (or mixed-integer) model: named variables with
 * bounds and integrality, named rows, one objective. Names are unique within
 * variables and within rows; a duplicate is a programmer error and throws.
 * Numbers are checked later, all at once, by `validateModel`, before any
 * solver or writer sees the model.
 */
export class LinearModel {
  private readonly variableList: Variable[] = [];
  private readonly rowList: Row[] = [];
  private readonly variablesByName = new Map<string, Variable>();
  private readonly rowsByName = new Map<string, Row>();
  private objectiveValue: Objective | null = null;

  constructor(readonly name: string) {}

  get variables(): readonly Variable[] {
    return this.variableList;
  }

  get rows(): readonly Row[] {
    return this.rowList;
  }

  get objective(): Objective | null {
    return this.objectiveValue;
  }

  get isMip(): boolean {
    return this.variableList.some((variable) => variable.isInteger);
  }

  addVariable(name: string, options: VariableOptions = {}): Variable {
    checkName('variable', name, this.variablesByName, this.name);
    const type = options.type ?? 'continuous';
    if (!variableTypes.includes(type)) {
      throw new Error(`Variable "${name}" has type "${String(type)}"; expected one of ${variableTypes.join(', ')}.`);
    }
    let lower = options.lower ?? 0;
    let upper = options.upper ?? Number.POSITIVE_INFINITY;
    if (type === 'binary') {
      lower = options.lower ?? 0;
      upper = options.upper ?? 1;
      if (lower < 0 || upper > 1) {
        throw new Error(`Binary variable "${name}" has bounds [${lower}, ${upper}]; a binary's bounds must lie within [0, 1].`);
      }
    }
    const variable = new Variable(name, this.variableList.length, lower, upper, type, this);
    this.variableList.push(variable);
    this.variablesByName.set(name, variable);
    return variable;
  }

  /** Adds `expression sense rhs`; the expression is copied, so later edits to it do not leak in. */
  addRow(name: string, expression: LinearExpression, sense: '<=' | '>=' | '=', rhs: number): Row {
    const shift = expression.constant;
    switch (sense) {
      case '<=':
        return this.pushRow(name, expression, sense, Number.NEGATIVE_INFINITY, rhs - shift);
      case '>=':
        return this.pushRow(name, expression, sense, rhs - shift, Number.POSITIVE_INFINITY);
      case '=':
        return this.pushRow(name, expression, sense, rhs - shift, rhs - shift);
      default:
        throw new Error(`Row "${name}" has sense "${String(sense)}"; expected "<=", ">=" or "=". Use addRangeRow for a range.`);
    }
  }

  /** Adds `lower <= expression <= upper`. */
  addRangeRow(name: string, lower: number, expression: LinearExpression, upper: number): Row {
    return this.pushRow(name, expression, 'range', lower - expression.constant, upper - expression.constant);
  }

  setObjective(sense: ObjectiveSense, expression: LinearExpression): void {
    if (sense !== 'minimize' && sense !== 'maximize') {
      throw new Error(`Objective sense "${String(sense)}" is not known; expected "minimize" or "maximize".`);
    }
    this.objectiveValue = { sense, expression: expression.clone() };
  }

  variable(name: string): Variable {
    const found = this.variablesByName.get(name);
    if (!found) throw new Error(`Model "${this.name}" has no variable named "${name}".`);
    return found;
  }

  hasVariable(name: string): boolean {
    return this.variablesByName.has(name);
  }

  row(name: string): Row {
    const found = this.rowsByName.get(name);
    if (!found) throw new Error(`Model "${this.name}" has no row named "${name}".`);
    return found;
  }

  hasRow(name: string): boolean {
    return this.rowsByName.has(name);
  }

  /** The model as mathematics, one row a line, for debugging. */
  describe(): string {
    return describeModel(this);
  }

  private pushRow(name: string, expression: LinearExpression, sense: RowSense, lower: number, upper: number): Row {
    checkName('row', name, this.rowsByName, this.name);
    const row: Row = { name, index: this.rowList.length, sense, expression: expression.clone(), lower, upper };
    this.rowList.push(row);
    this.rowsByName.set(name, row);
    return row;
  }
}

function checkName(kind: string, name: string, taken: Map<string, unknown>, modelName: string): void {
  if (typeof name !== 'string' || name.length === 0) {
    throw new Error(`A ${kind} in model "${modelName}" has an empty name. Give every ${kind} a readable name.`);
  }
  if (taken.has(name)) {
    throw new Error(`Model "${modelName}" already has a ${kind} named "${name}". Names must be unique.`);
  }
}
