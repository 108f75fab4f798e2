import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../helpers/cli.js';
import { SWITCH_CASE_WITH_SHORTFALL } from './helpers/switchCase.js';

interface JsonRun { id: string; hours: number; ok: boolean; cost_per_h: number; cost_per_year: number; totals: Record<string, unknown>; headers: unknown[] }

describe('steamwright compare (the built binary, on worker threads)', () => {
  test('--json gives scenarios[] identical with workers and in process', async () => {
    const parallel = await runCli(['compare', 'cases/kestrel-bay-board-mill.yaml', '--json']);
    const serial = await runCli(['compare', 'cases/kestrel-bay-board-mill.yaml', '--json', '--workers', '1']);
    expect(parallel.code).toBe(0);
    expect(serial.code).toBe(0);
    const strip = (text: string) => (JSON.parse(text).scenarios as JsonRun[]).map(({ id, hours, cost_per_h, cost_per_year, totals, headers }) => ({ id, hours, cost_per_h, cost_per_year, totals, headers }));
    const runs = strip(parallel.stdout);
    expect(runs.map((run) => run.id)).toEqual(['winter', 'summer', 'reduced']);
    expect(runs).toEqual(strip(serial.stdout));
    for (const run of runs) expect(run.cost_per_year).toBeCloseTo(run.hours * run.cost_per_h, 6);
  });
  test('an unknown scenario is bad usage naming the known ones', async () => {
    const run = await runCli(['compare', 'cases/kestrel-bay-board-mill.yaml', '--scenarios', 'winter,spring']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/no scenario "spring" in the case; known: winter, summer, reduced/);
  });
  test('solve --scenario solves that scenario', async () => {
    const run = await runCli(['solve', 'cases/kestrel-bay-board-mill.yaml', '--scenario', 'reduced', '--json']);
    expect(run.code).toBe(0);
    expect(JSON.parse(run.stdout).units.find((unit: { id: string }) => unit.id === 'boiler_1')).toBeUndefined();
  });
  test('a US-units case is compared in klb/h, MMBtu/h and USD/klb; --json stays in SI', async () => {
    const text = await runCli(['compare', 'cases/millbrook-creamery.yaml']);
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/steam raised, klb\/h/);
    expect(text.stdout).toMatch(/fuel, MMBtu\/h/);
    expect(text.stdout).toMatch(/hp marginal steam value, USD\/klb/);
    expect(text.stdout).not.toMatch(/raised, t\/h|steam value, USD\/t\b/);
    const csv = await runCli(['compare', 'cases/millbrook-creamery.yaml', '--csv']);
    expect(csv.stdout).toMatch(/^"cost per hour, USD",/m);
    expect(csv.stdout).toMatch(/^"steam raised, klb\/h",/m);
    const json = JSON.parse((await runCli(['compare', 'cases/millbrook-creamery.yaml', '--json'])).stdout);
    expect(typeof json.scenarios[0].totals.steam_raised_kg_s).toBe('number');
  });
  test('evaluate on a US-units case prints its projects and screen in US units', async () => {
    const run = await runCli(['evaluate', 'cases/millbrook-creamery.yaml']);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/^blowdown_flash: /m);
    expect(run.stdout).toMatch(/vented less klb\/h/);
    expect(run.stdout).toMatch(/fuel less MMBtu\/h/);
  });
  test('a scenario that cannot be met is NOT SOLVED with its short header, the others print, and the exit code is 1', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-compare-'));
    const file = join(folder, 'shortfall.yaml');
    writeFileSync(file, SWITCH_CASE_WITH_SHORTFALL);
    const run = await runCli(['compare', file, '--workers', '1']);
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(/overload: NOT SOLVED: the case cannot be met: lp is short of/);
    expect(run.stdout).toMatch(/cost per hour, USD\s+[\d,]+\.\d\d/);
    expect(run.stdout).toMatch(/Annual cost over 8,000 h: not available/);
    expect(run.stderr).toMatch(/1 of 2 could not be solved: overload/);
  });
  test('a sweep prints per-step costs and no annual total, and --json names the sweep', async () => {
    const text = await runCli(['compare', 'cases/kestrel-bay-board-mill.yaml', '--sweep', 'import_price']);
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/on scenario "summer"/);
    expect(text.stdout).not.toMatch(/Annual cost over/);
    const json = JSON.parse((await runCli(['compare', 'cases/kestrel-bay-board-mill.yaml', '--sweep', 'import_price', '--json'])).stdout);
    expect(json.annual).toBeNull();
    expect(json.sweep).toEqual({ id: 'import_price', target: 'power.import.price', scenario: 'summer' });
    expect(json.scenarios).toHaveLength(9);
  });
});
