// Parsing the case text with yaml 2.x, keeping every node's position so issues
// found later (by the schema or the semantic checks) point at a line and column.
import { isMap, isPair, isScalar, isSeq, LineCounter, parseDocument, visit, type Document, type Node } from 'yaml';
import type { CasePath, Issue } from './issue.js';
import { displayPath } from './issue.js';

/** Larger files are refused before parsing: a plant case is a few hundred lines. */
export const MAX_CASE_BYTES = 2_000_000;
/** Aliases expanded in total before the file is refused (guards against alias bombs). */
export const MAX_ALIAS_COUNT = 100;
/** Deepest nesting of maps and lists accepted; real cases nest about six deep. */
export const MAX_NESTING = 64;

export interface YamlSource {
  document: Document.Parsed;
  lineCounter: LineCounter;
  /** the plain data, aliases expanded */
  data: unknown;
  /** for a scenario's merged data: where in the file a path's value was written */
  locatePath?: (path: CasePath) => CasePath;
}

export type YamlResult = { ok: true; source: YamlSource } | { ok: false; issues: Issue[] };

function fileIssue(code: string, message: string, line = 0, column = 0): Issue {
  return { severity: 'error', code, path: '', line, column, message };
}

/**
 * Nesting depth of flow brackets is bounded before the recursive composer
 * runs. Brackets inside quoted scalars and comments are not nesting; a quote
 * opens a scalar only where a scalar can start (so "O'Brien" does not).
 */
export function flowNestingTooDeep(text: string): boolean {
  let depth = 0;
  let previous = '\n';
  for (let index = 0; index < text.length; index++) {
    const char = text[index];
    if (char === '#' && (previous === ' ' || previous === '\t' || previous === '\n')) {
      const end = text.indexOf('\n', index);
      if (end < 0) break;
      index = end - 1;
      continue;
    }
    if ((char === '"' || char === "'") && /[\s:,[{\-?]/.test(lastNonBlank(text, index))) {
      index = closingQuote(text, index, char);
      previous = char;
      continue;
    }
    if (char === '[' || char === '{') {
      depth++;
      if (depth > MAX_NESTING) return true;
    } else if (char === ']' || char === '}') {
      depth = Math.max(0, depth - 1);
    }
    previous = char;
  }
  return false;
}

/** The last character before `index` that is not a space or tab ("\n" at the start of the text). */
function lastNonBlank(text: string, index: number): string {
  for (let back = index - 1; back >= 0; back--) if (text[back] !== ' ' && text[back] !== '\t') return text[back];
  return '\n';
}

/** The index of the quote closing the scalar opened at `start` (the text's end when unclosed). */
function closingQuote(text: string, start: number, quote: string): number {
  for (let index = start + 1; index < text.length; index++) {
    if (quote === '"' && text[index] === '\\') index++;
    else if (text[index] === quote) {
      if (quote === "'" && text[index + 1] === "'") index++;
      else return index;
    }
  }
  return text.length;
}

function nodeDepth(node: unknown): number {
  // Iterative so that a pathological tree cannot overflow the stack.
  let deepest = 0;
  const stack: [unknown, number][] = [[node, 1]];
  while (stack.length > 0) {
    const [current, depth] = stack.pop()!;
    if (isMap(current) || isSeq(current)) {
      deepest = Math.max(deepest, depth);
      if (deepest > MAX_NESTING) return deepest;
      for (const item of current.items) {
        if (isPair(item)) stack.push([item.value, depth + 1]);
        else stack.push([item, depth + 1]);
      }
    }
  }
  return deepest;
}

export function parseYaml(text: string): YamlResult {
  if (text.length > MAX_CASE_BYTES) {
    return { ok: false, issues: [fileIssue('file-too-large', `the file has ${text.length} characters; a case file may have at most ${MAX_CASE_BYTES}`)] };
  }
  const binaryAt = text.search(/[\u0000-\u0008\u000e-\u001f\ufffd]/);
  if (binaryAt >= 0) {
    const lines = text.slice(0, binaryAt).split('\n');
    return {
      ok: false,
      issues: [fileIssue('not-text', 'expected a YAML text file, found binary data (a control character or invalid UTF-8)', lines.length, lines[lines.length - 1].length + 1)],
    };
  }
  const bareCr = text.search(/\r(?!\n)/);
  if (bareCr >= 0) {
    const { line, column } = positionOf(text, bareCr);
    return { ok: false, issues: [fileIssue('bare-cr', 'the file ends a line with a bare carriage return (CR, as old Mac editors wrote); save it with LF or CRLF line ends', line, column)] };
  }
  if (flowNestingTooDeep(text)) {
    return { ok: false, issues: [fileIssue('too-deep', `lists and maps nest more than ${MAX_NESTING} levels deep; a case file needs far fewer`)] };
  }
  const lineCounter = new LineCounter();
  let document: Document.Parsed;
  try {
    document = parseDocument(text, { lineCounter, keepSourceTokens: true, prettyErrors: false, uniqueKeys: true, schema: 'core', merge: false });
  } catch (error) {
    if (error instanceof RangeError) return { ok: false, issues: [fileIssue('too-deep', 'the file nests too deeply to read')] };
    throw error;
  }
  const issues: Issue[] = [];
  for (const problem of [...document.errors, ...document.warnings]) {
    const { line, col } = lineCounter.linePos(problem.pos[0]);
    const [code, message] = describeProblem(problem.code, problem.message);
    issues.push(fileIssue(code, message, line, col));
  }
  if (issues.length > 0) return { ok: false, issues };
  if (nodeDepth(document.contents) > MAX_NESTING) {
    return { ok: false, issues: [fileIssue('too-deep', `lists and maps nest more than ${MAX_NESTING} levels deep; a case file needs far fewer`)] };
  }
  const structural = mergeAndAliasIssues(document, lineCounter);
  if (structural.length > 0) return { ok: false, issues: structural };
  let data: unknown;
  try {
    // yaml counts the anchor itself with its aliases; the limit is on aliases.
    data = document.toJS({ maxAliasCount: MAX_ALIAS_COUNT + 1 });
  } catch (error) {
    if (error instanceof Error && /excessive alias/i.test(error.message)) {
      return { ok: false, issues: [fileIssue('too-many-aliases', `the file expands YAML aliases more than ${MAX_ALIAS_COUNT} times; write the values out instead`)] };
    }
    if (error instanceof RangeError) return { ok: false, issues: [fileIssue('too-deep', 'the file nests too deeply to read')] };
    throw error;
  }
  return { ok: true, source: { document, lineCounter, data } };
}

function positionOf(text: string, index: number): { line: number; column: number } {
  const before = text.slice(0, index).split('\n');
  return { line: before.length, column: before[before.length - 1].length + 1 };
}

/** Our own words for the parser's problems that a user can cause. */
function describeProblem(code: string, message: string): [string, string] {
  if (code === 'TAG_RESOLVE_FAILED') return ['custom-tag', `custom YAML tags are not part of the case format; found ${firstLine(message).replace(/^Unresolved tag: /, 'tag ')}`];
  if (code === 'MULTIPLE_DOCS') return ['multiple-documents', 'a second YAML document starts here ("---" after content); a case file is one document: remove the "---" or split the file'];
  if (/call stack/i.test(message)) return ['too-deep', 'the file nests too deeply to read here; a case file nests about six levels'];
  if (code === 'BAD_COLLECTION_TYPE' && /merge/.test(message)) return ['merge-key', 'YAML merge (!!merge, <<) is not part of the case format; write the keys out in full'];
  return ['yaml-syntax', `YAML syntax: ${firstLine(message)}`];
}

const MERGE_TAG = 'tag:yaml.org,2002:merge';

/**
 * Merge keys and aliases with no anchor, each located. With merging off the
 * parser would keep "<<" as an ordinary key and drop a "!!merge" value
 * silently, and an alias with no anchor would end as a bare exception.
 */
function mergeAndAliasIssues(document: Document.Parsed, lineCounter: LineCounter): Issue[] {
  const issues: Issue[] = [];
  const at = (node: Node | null | undefined): { line: number; col: number } => (node?.range ? lineCounter.linePos(node.range[0]) : { line: 0, col: 0 });
  // The depth is already bounded, so a recursive walk is safe here.
  visit(document, {
    Pair(_, pair) {
      if (isScalar(pair.key) && pair.key.value === '<<') {
        const { line, col } = at(pair.key);
        issues.push(fileIssue('merge-key', 'YAML merge keys (<<) are not part of the case format; write the keys out in full', line, col));
      }
    },
    Node(_, node) {
      if ((isScalar(node) || isMap(node) || isSeq(node)) && node.tag === MERGE_TAG) {
        const { line, col } = at(node);
        issues.push(fileIssue('merge-key', 'YAML merge (!!merge) is not part of the case format; write the keys out in full', line, col));
      }
    },
    Alias(_, alias) {
      if (!alias.resolve(document)) {
        const { line, col } = at(alias);
        issues.push(fileIssue('unknown-alias', `the alias *${alias.source} has no anchor &${alias.source} before it; define the anchor first or write the value out`, line, col));
      }
    },
  });
  return issues;
}

function firstLine(message: string): string {
  return message.split('\n')[0].replace(/ at line \d+, column \d+:?$/, '');
}

/** The node at a path, or the deepest existing ancestor when the path runs out. */
function findNode(source: YamlSource, path: CasePath, pointAtKey: boolean): Node | null {
  let current: unknown = source.document.contents;
  let found: Node | null = (current as Node) ?? null;
  for (let index = 0; index < path.length; index++) {
    const segment = path[index];
    const last = index === path.length - 1;
    if (isMap(current)) {
      const pair = current.items.find((item) => isScalar(item.key) && String(item.key.value) === String(segment));
      if (!pair) return found;
      if (last && pointAtKey && isScalar(pair.key)) return pair.key;
      current = pair.value;
    } else if (isSeq(current) && typeof segment === 'number') {
      current = current.items[segment];
    } else {
      return found;
    }
    if (current && (isMap(current) || isSeq(current) || isScalar(current))) found = current as Node;
    else return found;
  }
  return found;
}

/** Line and column (1-based) of the node at a path; the key itself when pointAtKey. */
export function locate(source: YamlSource, path: CasePath, pointAtKey = false): { line: number; column: number } {
  const node = findNode(source, source.locatePath ? source.locatePath(path) : path, pointAtKey);
  if (!node?.range) return { line: 1, column: 1 };
  const { line, col } = source.lineCounter.linePos(node.range[0]);
  return { line, column: col };
}

export function makeIssue(source: YamlSource, severity: Issue['severity'], code: string, path: CasePath, message: string, pointAtKey = false): Issue {
  const { line, column } = locate(source, path, pointAtKey);
  return { severity, code, path: displayPath(source.locatePath ? source.locatePath(path) : path), line, column, message };
}
