// Loading a case: YAML with positions, schema, units, semantic checks, and
// either the resolved plant or every issue found, errors first.
import { readFile } from 'node:fs/promises';
import type { Issue } from './issue.js';
import { sortIssues } from './issue.js';
import { checkSources, checkVenting, linkDrives, linkFlashTanks } from './plantChecks.js';
import type { Plant } from './plantTypes.js';
import { ResolveContext, type IdKind } from './resolveContext.js';
import { resolveHeaders } from './resolveHeaders.js';
import { resolveDeaerator, resolveFlashTanks, resolveLetdowns, resolveMachines, resolveUsers } from './resolveNetwork.js';
import { resolveFuels, resolveObjective, resolvePower, resolveSite, resolveSolver } from './resolveSite.js';
import { resolveBoilers, resolveHeatRecoveryBoilers, resolveSteamImports } from './resolveSupply.js';
import { resolveTurbines } from './resolveTurbines.js';
import { validateAgainstSchema } from './validateSchema.js';
import { parseYaml } from './yamlSource.js';

export type LoadResult = { ok: true; plant: Plant; warnings: Issue[] } | { ok: false; issues: Issue[] };

const ID_LISTS: [string, IdKind][] = [
  ['fuels', 'fuel'], ['headers', 'header'], ['boilers', 'boiler'], ['heat_recovery_boilers', 'heatRecoveryBoiler'],
  ['steam_imports', 'steamImport'], ['turbines', 'turbine'], ['letdowns', 'letdown'], ['users', 'user'],
  ['flash_tanks', 'flashTank'], ['machines', 'machine'],
];

/** Words with a fixed meaning in references; a unit may not take one as its id. */
const RESERVED_IDS = ['deaerator', 'drain', 'atmosphere', 'generator', 'none', 'saturated'];

function declareIds(context: ResolveContext): void {
  const lists: [(string | number)[], IdKind][] = [...ID_LISTS.map(([key, kind]) => [[key], kind] as [(string | number)[], IdKind]), [['deaerator', 'feedwater_pumps'], 'feedwaterPump']];
  for (const [listPath, kind] of lists) {
    for (const { item, path } of context.entries(listPath)) {
      if (typeof item.id === 'string' && RESERVED_IDS.includes(item.id)) {
        context.error('reserved-id', [...path, 'id'], `"${item.id}" is a reserved word in references (${RESERVED_IDS.join(', ')}); choose another id`);
        continue;
      }
      context.declareId(item.id, kind, path);
    }
  }
}

function resolvePlant(context: ResolveContext): Plant | null {
  declareIds(context);
  const site = resolveSite(context);
  const fuels = resolveFuels(context);
  const power = resolvePower(context);
  const headers = resolveHeaders(context);
  const byId = new Map(headers.map((header) => [header.id, header]));
  const parts = {
    name: String(context.raw(['name']) ?? ''),
    description: typeof context.raw(['description']) === 'string' ? String(context.raw(['description'])) : '',
    fuels,
    headers,
    boilers: resolveBoilers(context, byId),
    heatRecoveryBoilers: resolveHeatRecoveryBoilers(context, byId),
    steamImports: resolveSteamImports(context, byId),
    turbines: resolveTurbines(context, byId),
    letdowns: resolveLetdowns(context, byId),
    users: resolveUsers(context, byId),
    flashTanks: resolveFlashTanks(context, byId),
    machines: resolveMachines(context),
    objective: resolveObjective(context),
    solver: resolveSolver(context),
    scenarios: Array.isArray(context.raw(['scenarios'])) ? (context.raw(['scenarios']) as unknown[]) : [],
    projects: Array.isArray(context.raw(['projects'])) ? (context.raw(['projects']) as unknown[]) : [],
  };
  const deaerator = resolveDeaerator(context, byId);
  if (!site || !power || !deaerator) return null;
  const plant = { ...parts, site, power, deaerator };
  linkDrives(context, plant);
  linkFlashTanks(context, plant);
  checkSources(context, plant);
  checkVenting(context, plant);
  return { ...plant, defaults: context.defaults };
}

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
  const issues = sortIssues([...schemaIssues, ...context.issues]);
  if (!plant || issues.some((issue) => issue.severity === 'error')) return { ok: false, issues };
  return { ok: true, plant, warnings: issues };
}

/** Reads and loads a case file; an unreadable file is one issue, not an exception. */
export async function loadCase(filePath: string): Promise<LoadResult> {
  let bytes: Buffer;
  try {
    bytes = await readFile(filePath);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory, not a file' : code === 'EACCES' ? 'permission denied' : 'it cannot be read';
    return { ok: false, issues: [{ severity: 'error', code: 'unreadable', path: '', line: 0, column: 0, message: `cannot read the case file: ${reason}` }] };
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return { ok: false, issues: [{ severity: 'error', code: 'not-text', path: '', line: 0, column: 0, message: 'expected a YAML text file in UTF-8, found binary data or another encoding' }] };
  }
  return loadCaseText(text.replace(/^\uFEFF/, ''), filePath);
}
