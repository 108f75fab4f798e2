// Loading a case: YAML with positions, schema, units, semantic checks, and
// either the resolved plant or every issue found, errors first.
import { open } from 'node:fs/promises';
import type { Issue } from './issue.js';
import { sortIssues } from './issue.js';
import type { Plant } from './plantTypes.js';
import { ResolveContext } from './resolveContext.js';
import { resolvePlant } from './resolvePlant.js';
import { resolveVariants } from './resolveVariants.js';
import type { CaseVariants } from './variantTypes.js';
import { validateAgainstSchema } from './validateSchema.js';
import { MAX_CASE_BYTES, parseYaml } from './yamlSource.js';

/**
 * `variants` holds every scenario, project and sweep resolved to its own
 * plant (a case without scenarios has one, "base", of 8760 h).
 */
export type LoadResult = { ok: true; plant: Plant; warnings: Issue[]; variants: CaseVariants } | { ok: false; issues: Issue[] };

/** Loads a case from its text; `fileName` only labels issues. Never throws for bad input. */
export function loadCaseText(text: string, fileName: string): LoadResult {
  void fileName;
  const parsed = parseYaml(text);
  if (!parsed.ok) return { ok: false, issues: sortIssues(parsed.issues) };
  const { source } = parsed;
  if (source.data === null || source.data === undefined) {
    return { ok: false, issues: [{ severity: 'error', code: 'empty', path: '', line: 1, column: 1, message: 'the file is empty; expected a plant case (steamwright init FILE writes a starter)' }] };
  }
  const context = new ResolveContext(source);
  let schemaIssues: Issue[] = [];
  let plant: Plant | null = null;
  try {
    schemaIssues = validateAgainstSchema(source);
    context.schemaFlagged = new Set(schemaIssues.map((issue) => issue.path));
    if (typeof source.data === 'object' && !Array.isArray(source.data)) plant = resolvePlant(context);
  } catch (error) {
    {
      // A bug, not bad input: still one located line rather than a stack trace.
      const detail = error instanceof Error ? error.message : String(error);
      context.error('internal', [], `steamwright could not finish checking this file (internal error: ${detail}); please report it with the file`);
    }
  }
  const baseIssues = sortIssues([...schemaIssues, ...context.issues]);
  if (!plant || baseIssues.some((issue) => issue.severity === 'error')) return { ok: false, issues: baseIssues };
  // Scenarios, projects and sweeps are resolved only on a sound base, so that
  // every issue they raise is one their own changes caused.
  const variants = resolveVariants(source, plant, context);
  const issues = sortIssues([...baseIssues, ...variants.issues]);
  if (issues.some((issue) => issue.severity === 'error')) return { ok: false, issues };
  return { ok: true, plant: { ...plant, scenarios: variants.definitions.scenarios, projects: variants.definitions.projects }, warnings: issues, variants: variants.variants };
}

function fileIssue(code: string, message: string): LoadResult {
  return { ok: false, issues: [{ severity: 'error', code, path: '', line: 0, column: 0, message }] };
}

function unreadable(error: unknown): LoadResult {
  const code = (error as NodeJS.ErrnoException).code;
  const reasons: Record<string, string> = {
    ENOENT: 'no such file',
    EISDIR: 'it is a directory, not a file',
    EACCES: 'permission denied',
    EPERM: 'permission denied',
    ENOTDIR: 'a part of the path is not a directory',
    ENAMETOOLONG: 'the name is too long',
    ELOOP: 'too many symbolic links',
    EIO: 'input/output error',
  };
  return fileIssue('unreadable', `cannot read the case file: ${(code && reasons[code]) ?? 'it cannot be read'}`);
}

const TOO_LARGE = `a case file may be at most ${MAX_CASE_BYTES / 1_000_000} MB (${MAX_CASE_BYTES.toLocaleString('en')} bytes); a plant case is a few hundred lines`;

/**
 * The file's bytes, read with a bound: a regular file's size is checked
 * before reading, and a device or pipe (/dev/zero, a FIFO) is read no
 * further than the limit.
 */
async function readBounded(filePath: string): Promise<{ ok: true; bytes: Buffer } | { ok: false; result: LoadResult }> {
  let handle;
  try {
    handle = await open(filePath, 'r');
  } catch (error) {
    return { ok: false, result: unreadable(error) };
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) return { ok: false, result: fileIssue('unreadable', 'cannot read the case file: it is a directory, not a file') };
    if (info.isFile() && info.size > MAX_CASE_BYTES) {
      return { ok: false, result: fileIssue('file-too-large', `the file has ${info.size.toLocaleString('en')} bytes; ${TOO_LARGE}`) };
    }
    const buffer = Buffer.alloc(MAX_CASE_BYTES + 1);
    let filled = 0;
    while (filled < buffer.length) {
      const { bytesRead } = await handle.read(buffer, filled, buffer.length - filled, null);
      if (bytesRead === 0) break;
      filled += bytesRead;
    }
    if (filled > MAX_CASE_BYTES) return { ok: false, result: fileIssue('file-too-large', `reading stopped after ${MAX_CASE_BYTES.toLocaleString('en')} bytes; ${TOO_LARGE}`) };
    return { ok: true, bytes: buffer.subarray(0, filled) };
  } catch (error) {
    return { ok: false, result: unreadable(error) };
  } finally {
    await handle.close().catch(() => undefined);
  }
}

/** Reads and loads a case file; an unreadable file is one issue, not an exception. */
export async function loadCase(filePath: string): Promise<LoadResult> {
  const read = await readBounded(filePath);
  if (!read.ok) return read.result;
  const bytes = read.bytes;
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return { ok: false, issues: [{ severity: 'error', code: 'not-text', path: '', line: 0, column: 0, message: 'expected a YAML text file in UTF-8, found binary data or another encoding' }] };
  }
  return loadCaseText(text.replace(/^\uFEFF/, ''), filePath);
}
