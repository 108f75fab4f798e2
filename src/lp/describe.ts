import type { LinearExpression } from './expression.js';
import type { LinearModel } from './linearModel.js';
import type { Row } from './row.js';
import type { Variable } from './variable.js';

/**
 * Prints a model as mathematics, e.g.
 *   hp.mass: boiler1 + turbine1.exh - prv1 = 0
 * Rows are printed normalised: a constant written in the expression appears
 * moved to the right-hand side, as the solver sees it. Zero terms are left out.
 */
export function describeModel(model: LinearModel): string {
  const lines = [`model ${model.name}`];
  const objective = model.objective;
  if (objective) {
    lines.push(`${objective.sense} ${formatExpression(objective.expression, true)}`);
  } else {
    lines.push('(no objective)');
  }
  lines.push('subject to');
  for (const row of model.rows) lines.push(`  ${describeRow(row)}`);
  const bounds = model.variables.map(describeBounds).filter((text) => text !== '');
  if (bounds.length > 0) {
    lines.push('bounds');
    for (const text of bounds) lines.push(`  ${text}`);
  }
  return lines.join('\n');
}

export function describeRow(row: Row): string {
  const left = formatExpression(row.expression, false);
  if (row.sense === 'range') return `${row.name}: ${formatNumber(row.lower)} <= ${left} <= ${formatNumber(row.upper)}`;
  if (row.sense === '<=') return `${row.name}: ${left} <= ${formatNumber(row.upper)}`;
  if (row.sense === '>=') return `${row.name}: ${left} >= ${formatNumber(row.lower)}`;
  return `${row.name}: ${left} = ${formatNumber(row.lower)}`;
}

/** Non-default bounds and integrality of one variable; '' for a plain x >= 0. */
export function describeBounds(variable: Variable): string {
  const { name, lower, upper, type } = variable;
  if (type === 'binary') {
    return lower === 0 && upper === 1 ? `${name} binary` : `${name} binary, ${formatNumber(lower)} <= ${name} <= ${formatNumber(upper)}`;
  }
  const suffix = type === 'integer' ? ' integer' : '';
  let range = '';
  if (lower === upper) range = `${name} = ${formatNumber(lower)}`;
  else if (lower === Number.NEGATIVE_INFINITY && upper === Number.POSITIVE_INFINITY) range = `${name} free`;
  else if (lower !== 0 || upper !== Number.POSITIVE_INFINITY) {
    range = `${formatNumber(lower)} <= ${name} <= ${formatNumber(upper)}`;
  }
  if (type === 'integer') return range === '' ? `${name}${suffix}` : `${range},${suffix}`;
  return range;
}

/** `boiler1 + 2 turbine1.exh - prv1`, with the constant when asked for. */
export function formatExpression(expression: LinearExpression, withConstant: boolean): string {
  let text = '';
  for (const [variable, coefficient] of expression.terms) {
    if (coefficient === 0) continue;
    const magnitude = Math.abs(coefficient);
    const body = magnitude === 1 ? variable.name : `${formatNumber(magnitude)} ${variable.name}`;
    const negative = coefficient < 0 || Number.isNaN(coefficient);
    const shown = Number.isNaN(coefficient) ? `NaN ${variable.name}` : body;
    if (text === '') text = negative && !Number.isNaN(coefficient) ? `-${shown}` : shown;
    else text += negative && !Number.isNaN(coefficient) ? ` - ${shown}` : ` + ${shown}`;
  }
  if (withConstant && expression.constant !== 0) {
    const constant = expression.constant;
    if (text === '') text = formatNumber(constant);
    else text += constant < 0 ? ` - ${formatNumber(-constant)}` : ` + ${formatNumber(constant)}`;
  }
  return text === '' ? '0' : text;
}

export function formatNumber(value: number): string {
  if (value === Number.POSITIVE_INFINITY) return 'inf';
  if (value === Number.NEGATIVE_INFINITY) return '-inf';
  if (Object.is(value, -0)) return '0';
  return String(value);
}
