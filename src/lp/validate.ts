import type { LinearExpression } from './expression.js';
import type { LinearModel } from './linearModel.js';

/** One thing wrong with a model, naming the row or variable. */
export interface ModelIssue {
  /** `row "hp.mass"`, `variable "boiler1"`, `objective`. */
  readonly where: string;
  readonly message: string;
}

/** Thrown when a model is refused before any solver or writer sees it. */
export class InvalidModelError extends Error {
  constructor(
    readonly modelName: string,
    readonly issues: readonly ModelIssue[],
  ) {
    const listed = issues.map((issue) => `  ${issue.where}: ${issue.message}`).join('\n');
    super(`Model "${modelName}" was refused before solving (${issues.length} issue${issues.length === 1 ? '' : 's'}):\n${listed}`);
    this.name = 'InvalidModelError';
  }
}

/**
 * Every issue that would make a solver misread the model: non-finite
 * coefficients or constants, NaN or inverted bounds, variables that belong to
 * another model, a missing or empty objective. Infinite bounds are fine.
 */
export function validateModel(model: LinearModel): ModelIssue[] {
  const issues: ModelIssue[] = [];
  for (const variable of model.variables) {
    const where = `variable "${variable.name}"`;
    const { lower, upper } = variable;
    if (Number.isNaN(lower)) issues.push({ where, message: 'lower bound is NaN; expected a number or -Infinity' });
    if (Number.isNaN(upper)) issues.push({ where, message: 'upper bound is NaN; expected a number or Infinity' });
    if (lower === Number.POSITIVE_INFINITY) issues.push({ where, message: 'lower bound is +Infinity; no value can meet it' });
    if (upper === Number.NEGATIVE_INFINITY) issues.push({ where, message: 'upper bound is -Infinity; no value can meet it' });
    if (lower > upper) issues.push({ where, message: `lower bound ${lower} is above upper bound ${upper}` });
  }

  const objective = model.objective;
  if (!objective) {
    issues.push({ where: 'objective', message: 'the model has no objective; call setObjective first' });
  } else {
    checkExpression(model, objective.expression, 'objective', issues);
    // An objective with no non-zero term is legal: the model asks for any
    // feasible point (a plant whose prices are all zero under minimum cost).
  }

  for (const row of model.rows) {
    const where = `row "${row.name}"`;
    checkExpression(model, row.expression, where, issues);
    if (Number.isNaN(row.lower) || Number.isNaN(row.upper)) {
      issues.push({ where, message: 'right-hand side is NaN; expected a number' });
      continue;
    }
    if (row.lower === Number.POSITIVE_INFINITY || row.upper === Number.NEGATIVE_INFINITY) {
      issues.push({ where, message: `bounds [${row.lower}, ${row.upper}] cannot be met by any finite activity` });
    } else if (row.lower > row.upper) {
      issues.push({ where, message: `lower bound ${row.lower} is above upper bound ${row.upper}` });
    }
  }
  return issues;
}

/** Throws InvalidModelError listing every issue, or returns quietly. */
export function assertValidModel(model: LinearModel): void {
  const issues = validateModel(model);
  if (issues.length > 0) throw new InvalidModelError(model.name, issues);
}

function checkExpression(model: LinearModel, expression: LinearExpression, where: string, issues: ModelIssue[]): void {
  if (!Number.isFinite(expression.constant)) {
    issues.push({ where, message: `constant is ${expression.constant}; expected a finite number` });
  }
  for (const [variable, coefficient] of expression.terms) {
    if (variable.owner !== model || model.variables[variable.index] !== variable) {
      issues.push({ where, message: `uses variable "${variable.name}", which is not declared in model "${model.name}"` });
      continue;
    }
    if (!Number.isFinite(coefficient)) {
      issues.push({ where, message: `coefficient of "${variable.name}" is ${coefficient}; expected a finite number` });
    }
  }
}
