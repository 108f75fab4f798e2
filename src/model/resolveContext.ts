// Shared state while a case is resolved into a Plant: the YAML source for
// positions, the issues found so far, the defaults applied, and readers that
// parse quantities with src/units and report exactly what went wrong.
import { formatQuantity, parseQuantity, type QuantityKind } from '../units/index.js';
import { MIN_POSITIVE_FRACTION, PHYSICAL_RANGES } from './physicalRanges.js';
import { PropertyRangeError } from '../properties/index.js';
import { displayPath, type CasePath, type Issue, type Severity } from './issue.js';
import type { DefaultApplied, Range, UnitSystem } from './plantTypes.js';
import { makeIssue, type YamlSource } from './yamlSource.js';

export type IdKind = 'fuel' | 'header' | 'boiler' | 'heatRecoveryBoiler' | 'steamImport' | 'turbine' | 'letdown' | 'user' | 'flashTank' | 'feedwaterPump' | 'machine' | 'absorptionChiller' | 'trapGroup';

export const ID_KIND_WORDS: Record<IdKind, string> = {
  fuel: 'fuel', header: 'header', boiler: 'boiler', heatRecoveryBoiler: 'heat-recovery boiler', steamImport: 'steam import',
  turbine: 'turbine', letdown: 'letdown', user: 'user', flashTank: 'flash tank', feedwaterPump: 'feedwater pump', machine: 'machine',
  absorptionChiller: 'absorption chiller', trapGroup: 'trap group',
};

export class ResolveContext {
  readonly issues: Issue[] = [];
  readonly defaults: DefaultApplied[] = [];
  /** every id in the case with its kind and where it was declared */
  readonly ids = new Map<string, { kind: IdKind; path: CasePath }>();
  atmosphericPressure = 0.101325;
  currency = '';
  unitSystem: UnitSystem = 'si';
  /** display paths the schema already reported; not reported again */
  schemaFlagged = new Set<string>();

  constructor(readonly source: YamlSource) {}

  /** Whether the schema already reported the value at this path (paths of merged data map to the file). */
  flagged(path: CasePath): boolean {
    return this.schemaFlagged.has(displayPath(this.source.locatePath ? this.source.locatePath(path) : path));
  }

  get data(): unknown {
    return this.source.data;
  }

  report(severity: Severity, code: string, path: CasePath, message: string, pointAtKey = false): void {
    this.issues.push(makeIssue(this.source, severity, code, path, message, pointAtKey));
  }

  error(code: string, path: CasePath, message: string): void {
    this.report('error', code, path, message);
  }

  warn(code: string, path: CasePath, message: string): void {
    this.report('warning', code, path, message);
  }

  addDefault(path: CasePath, value: string, reason: string): void {
    this.defaults.push({ path: displayPath(path), value, reason });
  }

  /** The raw value at a path, or undefined. */
  raw(path: CasePath): unknown {
    let current = this.source.data;
    for (const segment of path) {
      if (current === null || typeof current !== 'object') return undefined;
      current = (current as Record<string | number, unknown>)[segment];
    }
    return current;
  }

  /** The entries of a list at path (non-objects skipped: the schema reported them). */
  entries(path: CasePath): { item: Record<string, unknown>; path: CasePath }[] {
    const list = this.raw(path);
    if (!Array.isArray(list)) return [];
    return list.flatMap((item, index) => (item !== null && typeof item === 'object' && !Array.isArray(item) ? [{ item: item as Record<string, unknown>, path: [...path, index] }] : []));
  }

  text(path: CasePath): string | undefined {
    const value = this.raw(path);
    return typeof value === 'string' ? value : undefined;
  }

  /** A quantity in SI; undefined when absent or wrong (wrong is reported here, absent by the schema). */
  quantity(path: CasePath, kind: QuantityKind): number | undefined {
    const value = this.raw(path);
    if (typeof value !== 'string' || this.flagged(path)) return undefined;
    const parsed = parseQuantity(value, kind, { atmosphericPressure_MPa: this.atmosphericPressure });
    if (!parsed.ok) {
      this.error('bad-quantity', path, parsed.message);
      return undefined;
    }
    if (!Number.isFinite(parsed.value)) {
      this.error('bad-quantity', path, `expected a finite number, found "${value}"`);
      return undefined;
    }
    const limits = PHYSICAL_RANGES[kind];
    if (parsed.value < limits.min || parsed.value > limits.max) {
      this.error('out-of-range', path, `expected a value ${limits.words}, found "${value}"`);
      return undefined;
    }
    if (parsed.currency !== undefined && this.currency !== '' && parsed.currency !== this.currency) {
      this.error('wrong-currency', path, `expected a price in ${this.currency} (the site currency), found "${value}" in ${parsed.currency}`);
      return undefined;
    }
    return parsed.value;
  }

  /** A non-negative quantity; a negative one is reported with its value. */
  amount(path: CasePath, kind: QuantityKind): number | undefined {
    const value = this.quantity(path, kind);
    if (value !== undefined && value < 0) {
      this.error('negative', path, `expected zero or more, found "${this.text(path)}"`);
      return undefined;
    }
    return value;
  }

  /** A percentage as a fraction in [0, 1] (or (0, 1] when zero makes no sense). */
  fraction(path: CasePath, options: { zeroAllowed: boolean } = { zeroAllowed: true }): number | undefined {
    const value = this.quantity(path, 'percent');
    if (value === undefined) return undefined;
    const zeroOk = options.zeroAllowed ? value >= 0 : value >= MIN_POSITIVE_FRACTION;
    if (!zeroOk || value > 1) {
      const range = options.zeroAllowed ? 'from 0 % to 100 %' : `of at least ${MIN_POSITIVE_FRACTION * 100} % and at most 100 %`;
      this.error('percent-range', path, `expected a percentage ${range}, found "${this.text(path)}"`);
      return undefined;
    }
    return value;
  }

  /** A min/max pair; min defaults to 0 and max to Infinity; min above max is an error. */
  range(path: CasePath, kind: QuantityKind, fallbackMax = Infinity): Range {
    const min = this.raw([...path, 'min']) === undefined ? 0 : this.amount([...path, 'min'], kind) ?? 0;
    const max = this.raw([...path, 'max']) === undefined ? fallbackMax : this.amount([...path, 'max'], kind) ?? fallbackMax;
    if (min > max) {
      this.error('min-above-max', [...path, 'min'], `min ${this.show(min, kind)} is above max ${this.show(max, kind)}`);
    }
    return { min, max };
  }

  /** A value in the case's display units, for messages. */
  show(valueSI: number, kind: QuantityKind): string {
    if (!Number.isFinite(valueSI)) return 'no limit';
    return formatQuantity(valueSI, kind, this.unitSystem, { atmosphericPressure_MPa: this.atmosphericPressure, digits: 4, currency: this.currency || undefined });
  }

  /** Runs a property call; a state outside IF97 becomes an issue and undefined. */
  property<T>(path: CasePath, what: string, compute: () => T): T | undefined {
    try {
      return compute();
    } catch (error) {
      if (error instanceof PropertyRangeError || error instanceof RangeError) {
        this.error('outside-if97', path, `${what} is outside the steam tables (IAPWS-IF97 regions 1, 2 and 4): ${error.message}`);
        return undefined;
      }
      throw error;
    }
  }

  declareId(id: unknown, kind: IdKind, path: CasePath): void {
    if (typeof id !== 'string') return;
    const earlier = this.ids.get(id);
    if (earlier) {
      const where = makeIssue(this.source, 'error', '', earlier.path, '');
      this.error('duplicate-id', [...path, 'id'], `id "${id}" is already used by the ${ID_KIND_WORDS[earlier.kind]} at ${where.path} (line ${where.line}); ids must be unique across the plant`);
      return;
    }
    this.ids.set(id, { kind, path });
  }

  /**
   * A reference to a unit of one of the given kinds; words such as "drain" are
   * accepted when listed. Unknown or wrong-kind references are reported.
   */
  reference(path: CasePath, kinds: IdKind[], words: string[] = []): string | undefined {
    const value = this.raw(path);
    if (typeof value !== 'string' || this.flagged(path)) return undefined;
    if (words.includes(value)) return value;
    const known = this.ids.get(value);
    const wanted = kinds.map((kind) => ID_KIND_WORDS[kind]).join(' or ');
    if (known && kinds.includes(known.kind)) return value;
    if (known) {
      this.error('wrong-reference', path, `expected a ${wanted}${words.length ? ` or ${words.join(', ')}` : ''}, found "${value}", which is a ${ID_KIND_WORDS[known.kind]}`);
      return undefined;
    }
    const candidates = [...this.ids.entries()].filter(([, entry]) => kinds.includes(entry.kind)).map(([id]) => id);
    const choices = [...candidates, ...words];
    const list = choices.length > 0 ? `; known: ${choices.join(', ')}` : `; the case has no ${wanted}`;
    this.error('unknown-reference', path, `no ${wanted} with id "${value}"${list}`);
    return undefined;
  }
}
