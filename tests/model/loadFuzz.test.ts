// Mutated demo cases always end in a plant or in located issues, never an exception.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { expect, test } from 'vitest';
import { stringify } from 'yaml';
import { loadCaseText, type Issue } from '../../src/model/index.js';

const demos = ['kestrel-bay-board-mill.yaml', 'millbrook-creamery.yaml', 'orchard-vale-foods.yaml'].map((name) => readFileSync(new URL(`../../cases/${name}`, import.meta.url), 'utf8'));
const { parse } = await import('yaml');
const demoData = demos.map((text) => parse(text) as unknown);

/** Every path to a value in the data, so a mutation can pick one. */
function paths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  const here = [prefix];
  if (Array.isArray(value)) return [...here, ...value.flatMap((item, index) => paths(item, [...prefix, index]))];
  if (value !== null && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([key, item]) => paths(item, [...prefix, key]))];
  return here;
}

const replacement = fc.oneof(
  fc.constantFrom('sixty', '60', '-5 t/h', '1e308 t/h', '-1e9 barg', '250 bar', '5000 degC', '101 %', '-3 %', '9 USD/GJ', '42 degC', '3 t', '', 'hp', 'drain', 'nowhere', null, true, 0, -1, 1e308),
  fc.string({ maxLength: 12 }),
  fc.double(),
  fc.constant([]),
  fc.constant({}),
);

type Mutation = { kind: 'replace'; pick: number; value: unknown } | { kind: 'delete'; pick: number } | { kind: 'duplicate'; pick: number };
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant('replace' as const), pick: fc.nat(), value: replacement }),
  fc.record({ kind: fc.constant('delete' as const), pick: fc.nat() }),
  fc.record({ kind: fc.constant('duplicate' as const), pick: fc.nat() }),
);

function mutate(data: unknown, change: Mutation): unknown {
  const copy = structuredClone(data);
  const all = paths(copy).filter((path) => path.length > 0);
  const path = all[change.pick % all.length];
  let parent = copy as Record<string | number, unknown>;
  for (const segment of path.slice(0, -1)) parent = parent[segment] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  if (change.kind === 'replace') parent[last] = change.value;
  else if (change.kind === 'delete') {
    if (Array.isArray(parent)) parent.splice(last as number, 1);
    else delete parent[last];
  } else if (Array.isArray(parent)) parent.push(structuredClone(parent[last]));
  else parent[last] = [parent[last], parent[last]];
  return copy;
}

function assertLocated(issues: Issue[], text: string): void {
  const lineCount = text.split('\n').length;
  for (const issue of issues) {
    expect(issue.code).not.toBe('internal');
    expect(issue.message.length).toBeGreaterThan(0);
    expect(issue.line).toBeGreaterThanOrEqual(1);
    expect(issue.line).toBeLessThanOrEqual(lineCount + 1);
    expect(issue.column).toBeGreaterThanOrEqual(1);
  }
}

test('loading a mutated demo case ends in a plant or in located issues', () => {
  fc.assert(
    fc.property(fc.nat({ max: demos.length - 1 }), fc.array(mutation, { minLength: 1, maxLength: 4 }), (which, changes) => {
      const data = changes.reduce((current, change) => mutate(current, change), demoData[which]);
      const text = stringify(data);
      const result = loadCaseText(text, 'fuzz.yaml');
      assertLocated(result.ok ? result.warnings : result.issues, text);
      if (!result.ok) expect(result.issues.some((issue) => issue.severity === 'error')).toBe(true);
    }),
    { numRuns: 150, seed: 20240601 },
  );
});

test('loading a truncated demo case never throws', () => {
  fc.assert(
    fc.property(fc.nat({ max: demos.length - 1 }), fc.double({ min: 0, max: 1, noNaN: true }), (which, share) => {
      const text = demos[which].slice(0, Math.floor(demos[which].length * share));
      const result = loadCaseText(text, 'cut.yaml');
      const issues = result.ok ? result.warnings : result.issues;
      for (const issue of issues) expect(issue.code).not.toBe('internal');
    }),
    { numRuns: 60, seed: 7 },
  );
});
