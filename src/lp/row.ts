import type { LinearExpression } from './expression.js';

/** How a row was written; 'range' means lower <= expression <= upper. */
export type RowSense = '<=' | '>=' | '=' | 'range';

/**
 * A named row, normalised to `lower <= terms <= upper`: the expression's
 * constant has already been moved to the bounds, so `lower`/`upper` are the
 * right-hand sides the solver sees and the duals refer to.
 */
export interface Row {
  readonly name: string;
  readonly index: number;
  readonly sense: RowSense;
  /** The expression as given, constant included. */
  readonly expression: LinearExpression;
  readonly lower: number;
  readonly upper: number;
}
