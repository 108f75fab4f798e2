// Turning ajv's errors into issues a plant engineer can act on: the key that is
// missing or unknown, the unit expected and the text found, one message per
// problem (a failed oneOf reports the branch the data was evidently meant for).
import type { ErrorObject, ValidateFunction } from 'ajv';
import { caseSchema } from './caseSchema.js';
import type { CasePath, Issue } from './issue.js';
import { describeFound } from './issue.js';
import { makeIssue, type YamlSource } from './yamlSource.js';

type Schema = Record<string, unknown>;

const QUANTITY_NOUNS: Record<string, string> = {
  pressure: 'a pressure',
  temperature: 'a temperature',
  temperatureDifference: 'a temperature difference',
  massFlow: 'a mass flow',
  energy: 'an energy',
  power: 'a power',
  specificEnthalpy: 'a specific enthalpy',
  specificEntropy: 'a specific entropy',
  energyPrice: 'a price per energy',
  massPrice: 'a price per tonne',
  emissionFactor: 'an emission factor',
  percent: 'a percentage',
  mass: 'a mass',
  any: 'a quantity',
};

/** Validates a branch of a oneOf on its own, to learn what that branch wants. */
export type BranchValidator = (branch: object) => ValidateFunction;

function pathOf(instancePath: string): CasePath {
  if (instancePath === '') return [];
  return instancePath.slice(1).split('/').map((raw) => {
    const segment = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    return /^\d+$/.test(segment) ? Number(segment) : segment;
  });
}

function dataAt(data: unknown, path: CasePath): unknown {
  let current = data;
  for (const segment of path) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<string | number, unknown>)[segment];
  }
  return current;
}

function closest(word: string, candidates: string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const distance = editDistance(word.toLowerCase(), candidate.toLowerCase());
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return bestDistance <= Math.max(2, Math.floor(word.length / 3)) ? best : undefined;
}

export function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, index) => index);
  for (let i = 1; i <= a.length; i++) {
    let previous = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const saved = row[j];
      row[j] = Math.min(row[j] + 1, row[j - 1] + 1, previous + (a[i - 1] === b[j - 1] ? 0 : 1));
      previous = saved;
    }
  }
  return row[b.length];
}

/** "a pressure with its unit, such as "42 barg"" from a schema node, or undefined. */
function quantityWanted(schema: Schema | undefined): string | undefined {
  const kind = schema?.['x-quantity'];
  if (typeof kind !== 'string') return undefined;
  const example = Array.isArray(schema?.examples) ? schema.examples[0] : undefined;
  return `${QUANTITY_NOUNS[kind] ?? 'a quantity'} with its unit${example ? `, such as "${example}"` : ''}`;
}

function typeWanted(schema: Schema | undefined, type: string): string {
  const quantity = quantityWanted(schema);
  if (quantity) return quantity;
  if (schema?.pattern === '^[A-Za-z][A-Za-z0-9_-]*$') return 'an id';
  const words: Record<string, string> = { object: 'a map of keys', array: 'a list', string: 'a text value', number: 'a number', integer: 'a whole number', boolean: 'true or false' };
  return words[type] ?? type;
}

function messageFor(error: ErrorObject, data: unknown): { message: string; path: CasePath; pointAtKey: boolean } {
  const path = pathOf(error.instancePath);
  const found = describeFound(dataAt(data, path));
  const parent = error.parentSchema as Schema | undefined;
  const params = error.params as Record<string, unknown>;
  switch (error.keyword) {
    case 'required': {
      const missing = String(params.missingProperty);
      let property = (parent?.properties as Record<string, Schema> | undefined)?.[missing];
      const target = typeof property?.$ref === 'string' ? property.$ref.replace('#/$defs/', '') : undefined;
      if (target) property = (caseSchema.$defs as Record<string, Schema>)[target];
      const hint = property ? quantityWanted(property) ?? (typeof property.description === 'string' ? property.description : undefined) : undefined;
      return { message: `missing key "${missing}"${hint ? `: expected ${hint}` : ''}`, path: [...path, missing], pointAtKey: false };
    }
    case 'additionalProperties': {
      const extra = String(params.additionalProperty);
      const allowed = Object.keys((parent?.properties as Schema | undefined) ?? {});
      const suggestion = closest(extra, allowed);
      const help = suggestion ? `did you mean "${suggestion}"?` : `expected one of ${allowed.join(', ')}`;
      return { message: `unknown key "${extra}"; ${help}`, path: [...path, extra], pointAtKey: true };
    }
    case 'type':
      return { message: path.length === 0 ? `expected a map of keys at the top of the file, found ${found}` : `expected ${typeWanted(parent, String(params.type))}, found ${found}`, path, pointAtKey: false };
    case 'pattern': {
      const wanted = quantityWanted(parent)
        ?? (parent?.pattern === '^[A-Z]{3}$' ? 'a three-letter currency code such as "EUR"' : 'an id: a letter, then letters, digits, _ or -');
      return { message: `expected ${wanted}, found ${found}`, path, pointAtKey: false };
    }
    case 'enum':
      return { message: `expected one of ${(params.allowedValues as unknown[]).join(', ')}, found ${found}`, path, pointAtKey: false };
    case 'const':
      return { message: `expected ${JSON.stringify(params.allowedValue)}, found ${found}`, path, pointAtKey: false };
    case 'minItems':
      return { message: `expected at least ${String(params.limit)} entr${params.limit === 1 ? 'y' : 'ies'}, found none`, path, pointAtKey: false };
    case 'minimum':
    case 'exclusiveMinimum':
      return { message: `expected a number ${error.keyword === 'minimum' ? 'of at least' : 'above'} ${String(params.limit)}, found ${found}`, path, pointAtKey: false };
    case 'false schema':
      return { message: `"${String(path[path.length - 1])}" does not belong here`, path, pointAtKey: true };
    default: {
      const custom = parent?.['x-message'];
      const text = typeof custom === 'string' ? custom : `expected ${error.message ?? 'a different value'}`;
      return { message: `${text}; found ${found}`, path, pointAtKey: false };
    }
  }
}

function sameError(a: ErrorObject, b: ErrorObject): boolean {
  return a.instancePath === b.instancePath && a.keyword === b.keyword && JSON.stringify(a.params) === JSON.stringify(b.params);
}

function shiftErrors(errors: ErrorObject[], prefix: string): ErrorObject[] {
  return errors.map((error) => ({ ...error, instancePath: prefix + error.instancePath }));
}

function isRootMismatch(error: ErrorObject, instancePath: string): boolean {
  return error.instancePath === instancePath && ['type', 'const', 'enum'].includes(error.keyword);
}

/** Which keys of an "exactly one of" are present, for the found part of the message. */
function presentKeys(branches: unknown, value: unknown): string[] | null {
  if (!Array.isArray(branches) || !branches.every((branch) => Array.isArray((branch as Schema).required) && Object.keys(branch as Schema).length === 1)) return null;
  const keys = branches.map((branch) => ((branch as Schema).required as string[])[0]);
  if (value === null || typeof value !== 'object') return [];
  return keys.filter((key) => key in (value as object));
}

/**
 * Resolves ajv's raw error list to one message per problem. A failed oneOf/anyOf
 * is replaced by the errors of the one branch whose type matches the data, or by
 * the union's own x-message when no single branch fits.
 */
export function schemaIssues(errors: ErrorObject[], source: YamlSource, validateBranch: BranchValidator): Issue[] {
  const data = source.data;
  let pending = errors.filter((error) => error.keyword !== 'if');
  const issues: Issue[] = [];
  // Deepest unions first, so an inner union is settled before the outer one.
  const unions = pending.filter((error) => error.keyword === 'oneOf' || error.keyword === 'anyOf')
    .sort((a, b) => b.instancePath.length - a.instancePath.length);
  const replaced: ErrorObject[] = [];
  for (const union of unions) {
    const branches = union.schema as Schema[];
    const value = dataAt(data, pathOf(union.instancePath));
    const branchErrors = branches.map((branch) => {
      const validate = validateBranch(branch);
      return validate(value) ? [] : shiftErrors(validate.errors ?? [], union.instancePath);
    });
    // Drop every error that came from trying the branches.
    pending = pending.filter((error) => error !== union && !branchErrors.some((list) => list.some((other) => sameError(error, other))));
    const fitting = branchErrors.map((list, index) => ({ list, index }))
      .filter(({ list }) => list.length > 0 && !list.some((error) => isRootMismatch(error, union.instancePath)));
    const passing = branchErrors.filter((list) => list.length === 0).length;
    if (passing === 0 && fitting.length === 1) {
      replaced.push(...fitting[0].list.filter((error) => error.keyword !== 'if'));
      continue;
    }
    const custom = (union.parentSchema as Schema | undefined)?.['x-message'];
    const present = presentKeys(branches, value);
    const found = present === null ? describeFound(value) : present.length === 0 ? 'none' : present.join(' and ');
    const text = typeof custom === 'string' ? custom : 'expected one of the allowed forms';
    issues.push(makeIssue(source, 'error', 'schema', pathOf(union.instancePath), `${text}; found ${found}`));
  }
  for (const error of [...pending, ...replaced]) {
    if (error.keyword === 'oneOf' || error.keyword === 'anyOf') continue;
    if (error.keyword === 'not') {
      const path = pathOf(error.instancePath);
      const custom = (error.parentSchema as Schema | undefined)?.['x-message'];
      issues.push(makeIssue(source, 'error', 'schema', path, typeof custom === 'string' ? custom : 'this combination of keys is not allowed'));
      continue;
    }
    const { message, path, pointAtKey } = messageFor(error, data);
    issues.push(makeIssue(source, 'error', 'schema', path, message, pointAtKey));
  }
  return issues;
}
