import { compileModel } from './compile.js';
import type { LinearExpression } from './expression.js';
import type { LinearModel } from './linearModel.js';
import { LpNameTable } from './lpNames.js';

export interface LpFormatExport {
  /** The model in CPLEX LP format. */
  readonly text: string;
  /**
   * Our name -> LP name, for every variable and row. A ranged row with both
   * bounds finite is written as two rows; here it maps to the first (lower).
   */
  readonly names: ReadonlyMap<string, string>;
  /** Our row name -> every LP row written for it: one, two for a range, none for a row without finite bounds. */
  readonly rowParts: ReadonlyMap<string, readonly string[]>;
  /** LP name -> our name, variables and every row part. */
  readonly fromLp: ReadonlyMap<string, string>;
  readonly objectiveName: string;
}

const lineWidth = 200;

/**
 * Writes any model in the CPLEX LP format so that the exact problem can be
 * handed to another solver. Names are made safe for the format (see
 * lpNames.ts) and the mapping is returned, so results come back under our
 * names. The sense is written `Maximize`/`Minimize`: the HiGHS reader takes
 * the British `Maximise` for minimise, silently. Every column gets an
 * explicit bound line, so a column used nowhere still exists on reading.
 * Ranged rows are written as a `.lo` and a `.hi` row, as HiGHS's own writer
 * does, since its reader does not accept `lo <= expr <= hi` rows.
 */
export function toLpFormat(model: LinearModel): LpFormatExport {
  compileModel(model); // validates, naming every bad row and variable
  const objective = model.objective!;
  const table = new LpNameTable([...model.variables.map((variable) => variable.name), ...model.rows.map((row) => row.name)]);
  const objectiveName = table.claim('obj');
  const names = new Map<string, string>();
  const fromLp = new Map<string, string>();
  const rowParts = new Map<string, string[]>();
  for (const variable of model.variables) {
    names.set(variable.name, table.lpName(variable.name));
    fromLp.set(table.lpName(variable.name), variable.name);
  }

  const lpOf = (expression: LinearExpression): string => writeTerms(expression, (name) => table.lpName(name), model.variables[0]?.name);
  const lines: string[] = [`\\ Model ${commentSafe(model.name)}, written by steamwright`];
  for (const [original, lpName] of table.map) {
    if (original !== lpName) lines.push(`\\ renamed ${commentSafe(JSON.stringify(original))} -> ${lpName}`);
  }
  lines.push(objective.sense === 'maximize' ? 'Maximize' : 'Minimize');
  const constant = objective.expression.constant;
  const constantText = constant === 0 ? '' : constant < 0 ? ` - ${number(-constant)}` : ` + ${number(constant)}`;
  lines.push(...wrap(` ${objectiveName}: ${lpOf(objective.expression)}${constantText}`));

  lines.push('Subject To');
  for (const row of model.rows) {
    const lpName = table.lpName(row.name);
    const body = lpOf(row.expression);
    const parts: string[] = [];
    const { lower, upper } = row;
    const lowerFinite = Number.isFinite(lower);
    const upperFinite = Number.isFinite(upper);
    if (lowerFinite && upperFinite && lower === upper) {
      lines.push(...wrap(` ${lpName}: ${body} = ${number(lower)}`));
      parts.push(lpName);
    } else if (lowerFinite && upperFinite) {
      const lowName = table.claim(`${lpName}.lo`);
      const highName = table.claim(`${lpName}.hi`);
      lines.push(...wrap(` ${lowName}: ${body} >= ${number(lower)}`));
      lines.push(...wrap(` ${highName}: ${body} <= ${number(upper)}`));
      parts.push(lowName, highName);
    } else if (lowerFinite) {
      lines.push(...wrap(` ${lpName}: ${body} >= ${number(lower)}`));
      parts.push(lpName);
    } else if (upperFinite) {
      lines.push(...wrap(` ${lpName}: ${body} <= ${number(upper)}`));
      parts.push(lpName);
    } else {
      lines.push(`\\ row ${commentSafe(JSON.stringify(row.name))} has no finite bound and is left out`);
    }
    names.set(row.name, parts[0] ?? lpName);
    rowParts.set(row.name, parts);
    for (const part of parts) fromLp.set(part, row.name);
  }

  lines.push('Bounds');
  for (const variable of model.variables) {
    const lpName = table.lpName(variable.name);
    const { lower, upper } = variable;
    if (lower === Number.NEGATIVE_INFINITY && upper === Number.POSITIVE_INFINITY) lines.push(` ${lpName} free`);
    else if (lower === upper) lines.push(` ${lpName} = ${number(lower)}`);
    else lines.push(` ${number(lower)} <= ${lpName} <= ${number(upper)}`);
  }
  const integers = model.variables.filter((variable) => variable.isInteger).map((variable) => table.lpName(variable.name));
  if (integers.length > 0) {
    lines.push('Generals');
    lines.push(...wrap(` ${integers.join(' ')}`));
  }
  lines.push('End');
  return { text: `${lines.join('\n')}\n`, names, rowParts, fromLp, objectiveName };
}

function writeTerms(expression: LinearExpression, lpName: (name: string) => string, anyColumn: string | undefined): string {
  let text = '';
  for (const [variable, coefficient] of expression.terms) {
    if (coefficient === 0) continue;
    const sign = coefficient < 0 ? '-' : '+';
    const magnitude = Math.abs(coefficient);
    const term = magnitude === 1 ? `${sign} ${lpName(variable.name)}` : `${sign} ${number(magnitude)} ${lpName(variable.name)}`;
    text = text === '' ? (coefficient < 0 ? `-${term.slice(1)}` : term.slice(2)) : `${text} ${term}`;
  }
  // A row whose terms are all zero still needs a left-hand side.
  if (text === '' && anyColumn !== undefined) text = `0 ${lpName(anyColumn)}`;
  return text;
}

function number(value: number): string {
  if (value === Number.POSITIVE_INFINITY) return '+inf';
  if (value === Number.NEGATIVE_INFINITY) return '-inf';
  if (Object.is(value, -0)) return '0';
  return String(value);
}

function commentSafe(text: string): string {
  return text.replace(/[\r\n\u2028\u2029]/g, ' ');
}

/** Breaks long lines between terms; continuation lines start with spaces. */
function wrap(line: string): string[] {
  if (line.length <= lineWidth) return [line];
  const pieces = line.split(/ (?=[+-] )/);
  const out: string[] = [];
  let current = '';
  for (const piece of pieces) {
    if (current !== '' && current.length + piece.length + 1 > lineWidth) {
      out.push(current);
      current = `   ${piece}`;
    } else {
      current = current === '' ? piece : `${current} ${piece}`;
    }
  }
  if (current !== '') out.push(current);
  return out;
}
