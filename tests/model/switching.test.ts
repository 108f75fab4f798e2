// A unit's switching rules: start cost and minimum running and stopped hours,
// resolved to SI, and every bad value located at once.
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { issuesOf, replaced } from './caseText.js';

const mill = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');
const BOILER_1 = "    blowdown_to: blowdown_flash     # flashed, the vapour recovered to the LP header\n    can_switch_off: true\n";

function withBoilerSwitching(lines: string): string {
  return replaced(mill, BOILER_1, `${BOILER_1}    switching:\n${lines}`);
}

describe('switching', () => {
  test('start cost and hours resolve on a boiler and a turbine, with their places', () => {
    let text = withBoilerSwitching('      start_cost: 1800 EUR\n      min_hours_on: 6\n      min_hours_off: "4 h"\n');
    text = replaced(text, '    can_switch_off: true\n    drives: generator\n', '    can_switch_off: true\n    switching: { start_cost: "€250", min_hours_on: 2 h }\n    drives: generator\n');
    const loaded = loadCaseText(text, 'mill.yaml');
    expect(loaded.ok).toBe(true);
    if (!loaded.ok) return;
    const boiler = loaded.plant.boilers.find((unit) => unit.id === 'boiler_1')!;
    expect(boiler.switching).toMatchObject({ startCost: 1800, minHoursOn: 6, minHoursOff: 4 });
    expect(boiler.switching!.at.min_hours_on.line).toBe(boiler.switching!.at.switching.line + 1);
    const turbine = loaded.plant.turbines.find((unit) => unit.id === 'tg1')!;
    expect(turbine.switching).toMatchObject({ startCost: 250, minHoursOn: 2, minHoursOff: 0 });
    // Units without the section have none.
    expect(loaded.plant.boilers.find((unit) => unit.id === 'boiler_2')!.switching).toBeUndefined();
  });

  test('every bad value is located, all at once', () => {
    const text = withBoilerSwitching('      start_cost: lots\n      min_hours_on: -3\n      min_hours_off: "four hours"\n');
    expect(issuesOf(text, 'mill.yaml')).toMatchInlineSnapshot(`
      "mill.yaml:104:19  boilers[0].switching.start_cost  expected an amount of money such as "1.2e6 EUR", found "lots"
      mill.yaml:105:21  boilers[0].switching.min_hours_on  expected zero or more hours, found -3
      mill.yaml:106:22  boilers[0].switching.min_hours_off  expected hours such as 6 or "6 h", found "four hours""
    `);
  });

  test('hours past a leap year, a cost in another currency and rules on a unit that never stops are refused', () => {
    let text = withBoilerSwitching('      start_cost: 900 USD\n      min_hours_off: 9000\n');
    text = replaced(text, '    can_switch_off: true\n    drives: generator\n', '    can_switch_off: false\n    switching: { min_hours_on: 8 }\n    drives: generator\n');
    expect(issuesOf(text, 'mill.yaml')).toMatchInlineSnapshot(`
      "mill.yaml:104:19  boilers[0].switching.start_cost  expected an amount in EUR (the site currency), found "900 USD" in USD
      mill.yaml:105:22  boilers[0].switching.min_hours_off  expected at most 8784 hours (a leap year), found 9000
      mill.yaml:154:16  turbines[0].switching  turbine tg1 has can_switch_off: false, so it never starts or stops; remove switching or set can_switch_off: true"
    `);
  });

  test('values of the wrong type are refused once each, by the schema', () => {
    const text = withBoilerSwitching('      start_cost: 1800\n      min_hours_on: [6]\n');
    expect(issuesOf(text, 'mill.yaml')).toMatchInlineSnapshot(`
      "mill.yaml:104:19  boilers[0].switching.start_cost  expected a text value, found 1800
      mill.yaml:105:21  boilers[0].switching.min_hours_on  expected hours such as 6 or "6 h"; found a list"
    `);
  });

  test('a key that is not a rule is refused by the schema', () => {
    const text = withBoilerSwitching('      warm_start_cost: 100 EUR\n');
    expect(issuesOf(text, 'mill.yaml')).toContain('switching');
  });
});
