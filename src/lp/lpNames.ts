/**
 * Names that the CPLEX LP format reads back exactly. Measured on the HiGHS
 * 1.15 LP reader (probe in tests/lp/lpNames.test.ts): the keywords below are
 * refused or misread when used as names (`inf` and `infinity` silently drop
 * the variable), any name starting with "inf" is refused, and brackets,
 * colons, slashes, operators, spaces, a leading digit are refused or
 * misread. Letters, digits, "_" and "." (not first) are read back exactly, so
 * we keep to those and rename anything else.
 */
const reservedWords = new Set([
  'min', 'max', 'minimize', 'minimise', 'maximize', 'maximise', 'minimum', 'maximum',
  'st', 's.t.', 'st.', 'subject', 'such', 'bound', 'bounds', 'bin', 'bins', 'binary', 'binaries',
  'gen', 'gens', 'general', 'generals', 'integer', 'integers', 'semi', 'semis', 'semi-continuous',
  'sos', 'free', 'end', 'inf', 'infinity',
]);

const maximumLength = 255;

/** True when the name can be written as it is. */
export function isSafeLpName(name: string): boolean {
  if (name.length === 0 || name.length > maximumLength) return false;
  if (!/^[A-Za-z_][A-Za-z0-9_.]*$/.test(name)) return false;
  const lower = name.toLowerCase();
  if (reservedWords.has(lower) || lower.startsWith('inf')) return false;
  // "e1" or "E5x" could be taken for an exponent by some readers.
  if (/^[eE][0-9]/.test(name)) return false;
  return true;
}

/** A safe spelling of a name, before making it unique. */
export function sanitizeLpName(name: string): string {
  let safe = name.replace(/[^A-Za-z0-9_.]/g, '_');
  if (safe.length === 0 || !/^[A-Za-z_]/.test(safe)) safe = `_${safe}`;
  if (!isSafeLpName(safe)) safe = `_${safe}`;
  return safe.slice(0, maximumLength - 8);
}

/**
 * Assigns every original name one safe, unique LP name. Names already safe
 * keep their spelling; the rest are sanitised and, if that collides, get a
 * numeric suffix. One map serves columns and rows: the same original name
 * gets the same LP name wherever it appears.
 */
export class LpNameTable {
  private readonly toLp = new Map<string, string>();
  private readonly taken = new Set<string>();

  constructor(originals: Iterable<string>) {
    const pending: string[] = [];
    for (const name of originals) {
      if (this.toLp.has(name)) continue;
      if (isSafeLpName(name)) {
        this.toLp.set(name, name);
        this.taken.add(name);
      } else {
        this.toLp.set(name, '');
        pending.push(name);
      }
    }
    for (const name of pending) this.toLp.set(name, this.claim(sanitizeLpName(name)));
  }

  /** A fresh safe name not used by any original, e.g. for the objective or a split row. */
  claim(wanted: string): string {
    const base = isSafeLpName(wanted) ? wanted : sanitizeLpName(wanted);
    let candidate = base;
    for (let suffix = 2; this.taken.has(candidate); suffix++) candidate = `${base}_${suffix}`;
    this.taken.add(candidate);
    return candidate;
  }

  lpName(original: string): string {
    const found = this.toLp.get(original);
    if (found === undefined) throw new Error(`No LP name was assigned to "${original}".`);
    return found;
  }

  /** Original name -> LP name, in first-seen order. */
  get map(): ReadonlyMap<string, string> {
    return this.toLp;
  }
}
