import { describe, expect, test } from 'vitest';
import { runCli } from '../helpers/cli.js';

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
  }, 120_000);
  test('an unknown scenario is bad usage naming the known ones', async () => {
    const run = await runCli(['compare', 'cases/kestrel-bay-board-mill.yaml', '--scenarios', 'winter,spring']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/no scenario "spring" in the case; known: winter, summer, reduced/);
  });
  test('solve --scenario solves that scenario', async () => {
    const run = await runCli(['solve', 'cases/kestrel-bay-board-mill.yaml', '--scenario', 'reduced', '--json']);
    expect(run.code).toBe(0);
    expect(JSON.parse(run.stdout).units.find((unit: { id: string }) => unit.id === 'boiler_1')).toBeUndefined();
  }, 60_000);
});
