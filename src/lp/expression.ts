import type { Variable } from './variable.js';

/**
 * A linear expression: terms in insertion order plus a constant. Insertion
 * order is kept (a Map) so that printed models and written LP files are
 * identical run to run.
 */
export class LinearExpression {
  readonly terms = new Map<Variable, number>();
  constant = 0;

  /** Adds `coefficient * variable`; a repeated variable accumulates. */
  add(variable: Variable, coefficient = 1): this {
    this.terms.set(variable, (this.terms.get(variable) ?? 0) + coefficient);
    return this;
  }

  addConstant(value: number): this {
    this.constant += value;
    return this;
  }

  /** Adds `scale * other`, term by term, keeping this expression's order first. */
  addExpression(other: LinearExpression, scale = 1): this {
    for (const [variable, coefficient] of other.terms) this.add(variable, scale * coefficient);
    this.constant += scale * other.constant;
    return this;
  }

  /** The coefficient of a variable, 0 when absent. */
  coefficient(variable: Variable): number {
    return this.terms.get(variable) ?? 0;
  }

  clone(): LinearExpression {
    return new LinearExpression().addExpression(this);
  }

  /** Value of the expression, constant included, at the given variable values. */
  evaluate(valueOf: (variable: Variable) => number): number {
    let total = this.constant;
    for (const [variable, coefficient] of this.terms) total += coefficient * valueOf(variable);
    return total;
  }
}

/** Starts an empty expression: `expr().add(x, 1).add(y, -1).addConstant(3)`. */
export function expr(): LinearExpression {
  return new LinearExpression();
}

/** The sum of variables (coefficient 1 each) and expressions, in argument order. */
export function sum(...parts: ReadonlyArray<Variable | LinearExpression>): LinearExpression {
  const total = new LinearExpression();
  for (const part of parts) {
    if (part instanceof LinearExpression) total.addExpression(part);
    else total.add(part, 1);
  }
  return total;
}

/** `coefficient * variable` as an expression. */
export function term(variable: Variable, coefficient = 1): LinearExpression {
  return new LinearExpression().add(variable, coefficient);
}
