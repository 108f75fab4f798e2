/** How a variable may take values. A binary is an integer fixed to [0, 1]. */
export type VariableType = 'continuous' | 'binary' | 'integer';

export interface VariableOptions {
  /** Lower bound; default 0. Use -Infinity for a free variable. */
  lower?: number;
  /** Upper bound; default +Infinity (1 for a binary). */
  upper?: number;
  /** Default 'continuous'. */
  type?: VariableType;
}

/**
 * A decision variable: a handle owned by one model. Its position in the model
 * (`index`) is the column number every backend uses, so names never need to
 * be parsed back from a solver.
 */
export class Variable {
  constructor(
    readonly name: string,
    readonly index: number,
    readonly lower: number,
    readonly upper: number,
    readonly type: VariableType,
    /** The model that declared this variable; a handle from another model is refused. */
    readonly owner: object,
  ) {}

  get isInteger(): boolean {
    return this.type !== 'continuous';
  }

  toString(): string {
    return this.name;
  }
}
