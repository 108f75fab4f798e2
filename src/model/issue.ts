// One problem found in a case file, located by line, column and path.

export type Severity = 'error' | 'warning';

/** A path into the case: keys and list indices, e.g. ['boilers', 1, 'steam', 'max']. */
export type CasePath = (string | number)[];

export interface Issue {
  severity: Severity;
  /** stable machine-readable code, e.g. "unknown-reference" */
  code: string;
  /** display path, e.g. "boilers[1].steam.max" ("" for the whole file) */
  path: string;
  /** 1-based line, 0 when the file has no usable position */
  line: number;
  /** 1-based column */
  column: number;
  /** what was expected and what was found, in plain words */
  message: string;
}

/** ['boilers', 1, 'steam', 'max'] -> "boilers[1].steam.max" */
export function displayPath(path: CasePath): string {
  let text = '';
  for (const segment of path) {
    if (typeof segment === 'number') text += `[${segment}]`;
    else text += text === '' ? segment : `.${segment}`;
  }
  return text;
}

/** `cases/mill.yaml:14:9  boilers[1].steam.max  expected ..., found ...` */
export function formatIssue(issue: Issue, fileName: string): string {
  const where = issue.line > 0 ? `${fileName}:${issue.line}:${issue.column}` : fileName;
  const label = issue.severity === 'warning' ? 'warning: ' : '';
  const path = issue.path === '' ? '' : `  ${issue.path}`;
  return `${where}${path}  ${label}${issue.message}`;
}

/** Errors before warnings, then in file order; exact duplicates dropped. */
export function sortIssues(issues: Issue[]): Issue[] {
  const seen = new Set<string>();
  const unique = issues.filter((issue) => {
    const key = `${issue.severity}|${issue.path}|${issue.line}|${issue.column}|${issue.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
  const rank = (issue: Issue) => (issue.severity === 'error' ? 0 : 1);
  return unique.sort((a, b) => rank(a) - rank(b) || a.line - b.line || a.column - b.column);
}

/** Quotes a found value the way messages show it: strings in quotes, the rest as YAML would. */
export function describeFound(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'an empty value';
  if (typeof value === 'string') return JSON.stringify(value.length > 60 ? `${value.slice(0, 57)}...` : value);
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'a map of keys';
  return String(value);
}
