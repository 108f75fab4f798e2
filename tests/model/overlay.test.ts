import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';

const mill = readFileSync(new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url), 'utf8');
const withoutVariants = mill.slice(0, mill.indexOf('\n# Scenarios:'));

function load(extra: string) {
  return loadCaseText(`${withoutVariants}\n${extra}`, 'mill.yaml');
}

function lineOf(text: string, needle: string): number {
  return text.slice(0, text.indexOf(needle)).split('\n').length;
}

describe('scenario overlays', () => {
  test('a user changed by id keeps its other keys; the others are untouched', () => {
    const loaded = load('scenarios:\n  - id: w\n    hours: 100\n    changes:\n      users:\n        - { id: building_heating, steam: 9 t/h }\n');
    expect(loaded.ok).toBe(true);
    if (!loaded.ok) return;
    const user = loaded.variants.scenarios[0].plant.users.find((entry) => entry.id === 'building_heating')!;
    expect(user.demand).toEqual({ kind: 'flow', massFlow: 2.5 });
    expect(user.header).toBe('lp');
    const base = loaded.plant.users.find((entry) => entry.id === 'building_heating')!;
    expect(base.demand).toEqual({ kind: 'flow', massFlow: 1.25 });
  });
  test('disable removes a unit and add appends one; a scenario can build on another', () => {
    const loaded = load([
      'scenarios:',
      '  - { id: a, hours: 100, changes: { disable: [boiler_1] } }',
      '  - id: b',
      '    hours: 100',
      '    base: a',
      '    changes:',
      '      add:',
      '        users: [{ id: new_user, header: lp, steam: 1 t/h }]',
    ].join('\n'));
    expect(loaded.ok).toBe(true);
    if (!loaded.ok) return;
    const [a, b] = loaded.variants.scenarios;
    expect(a.plant.boilers.map((boiler) => boiler.id)).toEqual(['boiler_2']);
    expect(b.plant.boilers.map((boiler) => boiler.id)).toEqual(['boiler_2']);
    expect(b.plant.users.map((user) => user.id)).toContain('new_user');
    expect(loaded.plant.boilers).toHaveLength(2);
  });
  test('an unknown id in an overlay is an error at its own line and column', () => {
    const extra = 'scenarios:\n  - id: w\n    hours: 100\n    changes:\n      users:\n        - { id: no_such_user, steam: 9 t/h }\n';
    const loaded = load(extra);
    expect(loaded.ok).toBe(false);
    if (loaded.ok) return;
    const text = `${withoutVariants}\n${extra}`;
    expect(loaded.issues[0]).toMatchObject({ code: 'unknown-overlay-id', path: 'scenarios[0].changes.users[0].id', line: lineOf(text, 'no_such_user') });
    expect(loaded.issues[0].message).toMatch(/no item with id "no_such_user" in users.*known: digester/);
  });
  test('a bad value inside an overlay is located in the overlay and names the scenario', () => {
    const extra = 'scenarios:\n  - id: w\n    hours: 100\n    changes:\n      users:\n        - { id: building_heating, steam: nine t/h }\n';
    const loaded = load(extra);
    expect(loaded.ok).toBe(false);
    if (loaded.ok) return;
    const issue = loaded.issues.find((entry) => entry.path === 'scenarios[0].changes.users[0].steam')!;
    expect(issue.line).toBe(lineOf(`${withoutVariants}\n${extra}`, 'nine t/h'));
    expect(issue.message).toMatch(/^in scenario "w": /);
  });
  test('an unknown disable id and a circular base are errors', () => {
    const loaded = load('scenarios:\n  - { id: a, hours: 1, base: b }\n  - { id: b, hours: 1, base: a, changes: { disable: [boiler_9] } }\n');
    expect(loaded.ok).toBe(false);
    if (loaded.ok) return;
    expect(loaded.issues.map((issue) => issue.code)).toEqual(expect.arrayContaining(['circular-base']));
  });
  test('project money must be in the site currency', () => {
    const loaded = load('projects:\n  - { id: p, capital_cost: 1000 USD, life: 10, discount_rate: 8 %, changes: {} }\n');
    expect(loaded.ok).toBe(false);
    if (loaded.ok) return;
    expect(loaded.issues[0].message).toMatch(/expected an amount in EUR \(the site currency\), found "1000 USD"/);
  });
});
