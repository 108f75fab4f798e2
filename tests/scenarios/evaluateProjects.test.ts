import { describe, expect, test } from 'vitest';
import { loadCase } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { compareScenarios, evaluateProjects, runSweep, workersAvailable } from '../../src/scenarios/index.js';

const loaded = await loadCase(new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url).pathname);
if (!loaded.ok) throw new Error('the demo case must load');
const { variants } = loaded;

async function separateCost(plant: Parameters<typeof solvePlant>[0]): Promise<number> {
  const outcome = await solvePlant(plant);
  if (!outcome.ok) throw new Error(outcome.message);
  return plantResult(outcome).totals.cost_per_h;
}

describe('scenarios of the demo mill', () => {
  test('vitest runs TypeScript sources, so solves fall back to in process', () => {
    expect(workersAvailable()).toBe(false);
  });
  test('compare equals the separate solves, and the annual cost is hours x cost per hour summed', async () => {
    const comparison = await compareScenarios(variants);
    let annual = 0;
    for (const [index, scenario] of variants.scenarios.entries()) {
      const run = comparison.runs[index];
      expect(run.ok).toBe(true);
      if (!run.ok) continue;
      const separate = await separateCost(scenario.plant);
      expect(run.cost_per_h).toBe(separate);
      annual += scenario.hours * separate;
    }
    expect(comparison.annual.cost_per_year).toBeCloseTo(annual, 6);
  });
  test('a project saving equals the difference of the two separate solves, to the cent', async () => {
    const outcome = await evaluateProjects(variants, ['more_condensate']);
    const project = outcome.projects[0];
    expect(project.ok).toBe(true);
    if (!project.ok) return;
    const entry = variants.projects.find((candidate) => candidate.id === 'more_condensate')!;
    let expected = 0;
    for (const scenario of variants.scenarios) {
      const withProject = entry.plants.find((candidate) => candidate.scenario === scenario.id)!.plant;
      expected += scenario.hours * ((await separateCost(scenario.plant)) - (await separateCost(withProject)));
    }
    expect(Math.round(project.annual_saving * 100)).toBe(Math.round(expected * 100));
    expect(project.simple_payback_years).toBeCloseTo(project.capitalCost / (expected - project.fixedOmPerYear), 9);
  }, 180_000);
  test('the import-price sweep costs more per hour as the price rises, never less', async () => {
    const sweep = await runSweep(variants, 'import_price');
    const costs = sweep.runs.map((run) => (run.ok ? run.cost_per_h : NaN));
    expect(costs).toHaveLength(9);
    for (let index = 1; index < costs.length; index++) expect(costs[index]).toBeGreaterThanOrEqual(costs[index - 1] - 1e-9);
  });
});
