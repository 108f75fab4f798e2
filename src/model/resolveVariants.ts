// Scenarios, projects and sweeps: their own fields read with located issues,
// then each overlay merged onto the raw case and resolved through the same
// resolver as the base, so every check applies to every variant.
import type { CasePath, Issue } from './issue.js';
import { parseHours, parseMoney, parseYears } from './money.js';
import { MAX_MONEY } from './physicalRanges.js';
import { applyOverlay, OverlayOrigins, variantBase } from './overlay.js';
import type { Plant } from './plantTypes.js';
import { ResolveContext } from './resolveContext.js';
import { resolvePlant } from './resolvePlant.js';
import { sweepChanges, sweepValues } from './sweepTarget.js';
import { validateAgainstSchema } from './validateSchema.js';
import {
  HOURS_PER_YEAR, type CaseVariants, type ProjectDefinition, type ProjectPlants, type ScenarioDefinition, type ScenarioPlant, type SweepPlants,
} from './variantTypes.js';
import type { YamlSource } from './yamlSource.js';

type Raw = Record<string, unknown>;

/** A leap year's hours: the most the scenarios together may have. */
const MOST_HOURS = 8784;

export interface VariantsResult {
  issues: Issue[];
  definitions: { scenarios: ScenarioDefinition[]; projects: ProjectDefinition[] };
  variants: CaseVariants;
}

interface Resolver {
  /** resolves merged data; its issues are prefixed with the label */
  resolve(data: Raw, label: string): Plant | null;
  overlay(base: Raw, changes: unknown, changesPath: CasePath): Raw;
}

function makeResolver(source: YamlSource, origins: OverlayOrigins, issues: Issue[], baseIssues: Issue[], context: ResolveContext): Resolver {
  const known = new Set(baseIssues.map((issue) => `${issue.code}|${issue.path}|${issue.message}`));
  return {
    resolve(data, label) {
      const variantSource: YamlSource = { ...source, data, locatePath: (path) => origins.fileOf(data, path) };
      const variantContext = new ResolveContext(variantSource);
      let plant: Plant | null = null;
      const schemaIssues = validateAgainstSchema(variantSource);
      variantContext.schemaFlagged = new Set(schemaIssues.map((issue) => issue.path));
      if (schemaIssues.length === 0) plant = resolvePlant(variantContext);
      for (const issue of [...schemaIssues, ...variantContext.issues]) {
        // A warning the base already gave is not repeated for every variant.
        if (issue.severity === 'warning' && known.has(`${issue.code}|${issue.path}|${issue.message}`)) continue;
        issues.push({ ...issue, message: `${label}: ${issue.message}` });
      }
      const failed = schemaIssues.length > 0 || variantContext.issues.some((issue) => issue.severity === 'error');
      return failed || !plant ? null : { ...plant, scenarios: [], projects: [] };
    },
    overlay(base, changes, changesPath) {
      if (changes === undefined) return base;
      if (changes === null || typeof changes !== 'object' || Array.isArray(changes)) return base; // the schema reports it
      return applyOverlay(base, changes as Raw, changesPath, origins, (code, path, message) => context.error(code, path, message));
    },
  };
}

function readName(item: Raw, id: string): string {
  return typeof item.name === 'string' ? item.name : id;
}

/** Scenario definitions with their bases checked: known, not circular. */
function readScenarios(context: ResolveContext): { definition: ScenarioDefinition; path: CasePath; changes: unknown }[] {
  const seen = new Set<string>();
  const read: { definition: ScenarioDefinition; path: CasePath; changes: unknown }[] = [];
  for (const { item, path } of context.entries(['scenarios'])) {
    if (typeof item.id !== 'string' || item.hours === undefined) continue; // the schema reports it
    const hours = parseHours(item.hours);
    if (!hours.ok) {
      context.error('bad-hours', [...path, 'hours'], hours.message);
      continue;
    }
    if (seen.has(item.id)) {
      context.error('duplicate-id', [...path, 'id'], `scenario id "${item.id}" is already used; scenario ids must be unique`);
      continue;
    }
    seen.add(item.id);
    const base = typeof item.base === 'string' ? item.base : 'plant';
    read.push({ definition: { id: item.id, name: readName(item, item.id), hours: hours.hours, base }, path, changes: item.changes });
  }
  const total = read.reduce((sum, entry) => sum + entry.definition.hours, 0);
  if (total > MOST_HOURS) {
    context.error('too-many-hours', ['scenarios'], `the scenarios' hours add up to ${total} h, more than the ${MOST_HOURS} h of a leap year`);
  }
  return read;
}

export function resolveVariants(source: YamlSource, basePlant: Plant, context: ResolveContext): VariantsResult {
  const issues: Issue[] = [];
  const origins = new OverlayOrigins();
  const baseData = variantBase(source.data as Raw, origins);
  const errorsBefore = context.issues.length;
  const resolver = makeResolver(source, origins, issues, context.issues.slice(), context);

  // Scenarios: the merged data of each, following `base` chains.
  const declared = readScenarios(context);
  const byId = new Map(declared.map((entry) => [entry.definition.id, entry]));
  const merged = new Map<string, Raw | null>();
  const mergedData = (id: string, chain: string[]): Raw | null => {
    if (merged.has(id)) return merged.get(id)!;
    const entry = byId.get(id)!;
    let base: Raw | null = baseData;
    if (entry.definition.base !== 'plant') {
      const parent = byId.get(entry.definition.base);
      if (!parent) {
        const known = ['plant', ...byId.keys()].join(', ');
        context.error('unknown-reference', [...entry.path, 'base'], `no scenario with id "${entry.definition.base}" to build on; known: ${known}`);
        base = null;
      } else if (chain.includes(parent.definition.id)) {
        context.error('circular-base', [...entry.path, 'base'], `scenario "${id}" builds on itself through ${[...chain, parent.definition.id].join(' -> ')}`);
        base = null;
      } else {
        base = mergedData(parent.definition.id, [...chain, parent.definition.id]);
      }
    }
    const data = base === null ? null : resolver.overlay(base, entry.changes, [...entry.path, 'changes']);
    merged.set(id, data);
    return data;
  };
  const scenarios: ScenarioPlant[] = [];
  for (const entry of declared) {
    const data = mergedData(entry.definition.id, [entry.definition.id]);
    if (data === null) continue;
    const plant = resolver.resolve(data, `in scenario "${entry.definition.id}"`);
    if (plant) scenarios.push({ id: entry.definition.id, name: entry.definition.name, hours: entry.definition.hours, plant });
  }
  const implicitBase = declared.length === 0;
  const scenarioData: { id: string; data: Raw }[] = implicitBase
    ? [{ id: 'base', data: baseData }]
    : declared.flatMap((entry) => (merged.get(entry.definition.id) ? [{ id: entry.definition.id, data: merged.get(entry.definition.id)! }] : []));
  if (implicitBase) scenarios.push({ id: 'base', name: 'the plant as written', hours: HOURS_PER_YEAR, plant: { ...basePlant, scenarios: [], projects: [] } });

  // Projects: checked once on the plant as written, then on every scenario.
  const projects: ProjectPlants[] = [];
  const projectIds = new Set<string>();
  for (const { item, path } of context.entries(['projects'])) {
    if (typeof item.id !== 'string') continue;
    if (projectIds.has(item.id)) {
      context.error('duplicate-id', [...path, 'id'], `project id "${item.id}" is already used; project ids must be unique`);
      continue;
    }
    projectIds.add(item.id);
    const definition = readProject(context, item, path, basePlant.site.currency);
    const onBase = resolver.resolve(resolver.overlay(baseData, item.changes, [...path, 'changes']), `in project "${item.id}"`);
    if (!definition || !onBase) continue;
    const plants: ProjectPlants['plants'] = [];
    for (const scenario of scenarioData) {
      const plant = implicitBase
        ? onBase
        : resolver.resolve(resolver.overlay(scenario.data, item.changes, [...path, 'changes']), `in project "${item.id}" on scenario "${scenario.id}"`);
      if (plant) plants.push({ scenario: scenario.id, plant });
    }
    projects.push({ ...definition, plants });
  }

  // Sweeps: one value varied over a range on a scenario (or the plant).
  const sweeps: SweepPlants[] = [];
  for (const { item, path } of context.entries(['sweeps'])) {
    if (typeof item.id !== 'string' || typeof item.target !== 'string') continue;
    const scenarioId = typeof item.scenario === 'string' ? item.scenario : 'plant';
    const start = scenarioId === 'plant' ? baseData : merged.get(scenarioId);
    if (start === undefined) {
      context.error('unknown-reference', [...path, 'scenario'], `no scenario with id "${scenarioId}" to sweep; known: ${['plant', ...byId.keys()].join(', ')}`);
      continue;
    }
    if (start === null) continue;
    const values = sweepValues(item, path, (code, at, message) => context.error(code, at, message));
    if (!values) continue;
    const steps: SweepPlants['steps'] = [];
    for (const value of values) {
      const changes = sweepChanges(start, item.target, value, (code, message) => context.error(code, [...path, 'target'], message));
      if (!changes) break;
      const plant = resolver.resolve(resolver.overlay(start, changes, [...path, 'from']), `in sweep "${item.id}" at ${value}`);
      if (plant) steps.push({ value, plant });
    }
    sweeps.push({ id: item.id, name: readName(item, item.id), scenario: scenarioId, target: item.target, values, steps });
  }

  issues.push(...context.issues.slice(errorsBefore));
  return {
    issues,
    definitions: { scenarios: declared.map((entry) => entry.definition), projects: projects.map(({ plants, ...definition }) => (void plants, definition)) },
    variants: { scenarios, implicitBase, projects, sweeps },
  };
}

function readProject(context: ResolveContext, item: Raw, path: CasePath, currency: string): ProjectDefinition | null {
  const money = (key: string, perYear: boolean): number | undefined => {
    const value = item[key];
    if (value === undefined) return perYear ? 0 : undefined;
    if (typeof value !== 'string') return undefined; // the schema reports it
    const parsed = parseMoney(value, currency, perYear);
    if (!parsed.ok) {
      context.error('bad-money', [...path, key], parsed.message);
      return undefined;
    }
    if (parsed.value < 0) {
      context.error('negative', [...path, key], `expected zero or more, found "${value}"`);
      return undefined;
    }
    if (!(parsed.value <= MAX_MONEY)) {
      context.error('out-of-range', [...path, key], `expected a sum of at most ${MAX_MONEY.toExponential()} ${currency}, found "${value}"`);
      return undefined;
    }
    return parsed.value;
  };
  const capitalCost = money('capital_cost', false);
  const fixedOm = money('fixed_om', true);
  let lifeYears: number | undefined;
  if (item.life !== undefined) {
    const life = parseYears(item.life);
    if (life.ok) lifeYears = life.years;
    else context.error('bad-life', [...path, 'life'], life.message);
  }
  const discountRate = context.fraction([...path, 'discount_rate']);
  if (capitalCost === undefined || fixedOm === undefined || lifeYears === undefined || discountRate === undefined) return null;
  const id = String(item.id);
  return { id, name: readName(item, id), capitalCost, lifeYears, discountRate, fixedOmPerYear: fixedOm };
}
