// `compare --scenarios plant,...`: the plant as written as a column beside the
// scenarios, checked against a solve of that plant on its own, and kept out
// of the annual total, which stays the sum of the scenarios alone.
import { describe, expect, it } from 'vitest';
import { loadCase } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { AS_WRITTEN, compareScenarios, ScenarioLookupError } from '../../src/scenarios/index.js';
import { expectClose } from '../helpers/expectClose.js';

const loaded = await loadCase(new URL('../../cases/millbrook-creamery.yaml', import.meta.url).pathname);
if (!loaded.ok) throw new Error('the creamery case does not load');

describe('compare with the plant as written', () => {
  it('solves the plant as written in its own column, leaves it out of the annual total', async () => {
    const comparison = await compareScenarios(loaded.variants, [AS_WRITTEN, 'winter', 'summer'], { workers: 1 }, loaded.plant);
    expect(comparison.runs.map((run) => run.id)).toEqual(['plant', 'winter', 'summer']);
    const [asWritten, winter, summer] = comparison.runs;
    if (!asWritten.ok || !winter.ok || !summer.ok) throw new Error('a column failed');
    // A second path: the plant as written, solved directly.
    const direct = await solvePlant(loaded.plant);
    if (!direct.ok) throw new Error(direct.message);
    expectClose(asWritten.cost_per_h, plantResult(direct).totals.cost_per_h, 1e-9, 'cost per hour of the plant as written');
    expect(asWritten.hours).toBe(8760);
    // The annual total is the two scenarios' (3,000 h and 3,200 h) and nothing of the whole-year column.
    expect(comparison.annual.hours).toBe(winter.hours + summer.hours);
    expectClose(comparison.annual.cost_per_year!, winter.cost_per_year + summer.cost_per_year, 1e-12, 'annual cost');
  });

  it('without the plant as written, "plant" is an unknown scenario that lists what is known', async () => {
    await expect(compareScenarios(loaded.variants, ['plant'], { workers: 1 })).rejects.toThrow(ScenarioLookupError);
    await expect(compareScenarios(loaded.variants, ['nope'], { workers: 1 }, loaded.plant)).rejects.toThrow(/known: winter, summer, reduced, and plant for the plant as written/);
  });
});
