// Parsing the case text with yaml 2.x, keeping every node's position so issues
// found later (by the schema or the semantic checks) point at a line and column.
import { isMap, isPair, isScalar, isSeq, LineCounter, parseDocument, type Document, type Node } from 'yaml';
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

/** Nesting depth of brackets and indentation is bounded before the recursive composer runs. */
function flowNestingTooDeep(text: string): boolean {
  let depth = 0;
  for (let index = 0; index < text.length; index++) {
    const char = text[index];
    if (char === '[' || char === '{') {
      depth++;
      if (depth > MAX_NESTING) return true;
    } else if (char === ']' || char === '}') {
      depth = Math.max(0, depth - 1);
    }
  }
  return false;
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
    const message = problem.code === 'TAG_RESOLVE_FAILED'
      ? `custom YAML tags are not part of the case format; found ${firstLine(problem.message).replace(/^Unresolved tag: /, 'tag ')}`
      : `YAML syntax: ${firstLine(problem.message)}`;
    issues.push(fileIssue(problem.code === 'TAG_RESOLVE_FAILED' ? 'custom-tag' : 'yaml-syntax', message, line, col));
  }
  if (issues.length > 0) return { ok: false, issues };
  if (nodeDepth(document.contents) > MAX_NESTING) {
    return { ok: false, issues: [fileIssue('too-deep', `lists and maps nest more than ${MAX_NESTING} levels deep; a case file needs far fewer`)] };
  }
  let data: unknown;
  try {
    data = document.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (error) {
    if (error instanceof Error && /alias/i.test(error.message)) {
      return { ok: false, issues: [fileIssue('too-many-aliases', `the file expands YAML aliases more than ${MAX_ALIAS_COUNT} times; write the values out instead`)] };
    }
    if (error instanceof RangeError) return { ok: false, issues: [fileIssue('too-deep', 'the file nests too deeply to read')] };
    throw error;
  }
  return { ok: true, source: { document, lineCounter, data } };
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
