// On/off decisions judged at their own converged points: an option that may
// only help never raises the converged optimum, and the loop ends on every
// plant, with units removed one at a time too.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { solvePlant } from '../../src/plant/index.js';
import { loadPlant } from './helpers/cases.js';
import { plantShape, plantText } from './helpers/generatedPlants.js';

const MILL = 'cases/kestrel-bay-board-mill.yaml';

/** The optimum may differ by round-off and by the loop's tolerance, never by more. */
function noWorse(withOption: number, without: number): boolean {
  return withOption <= without + 1e-6 * Math.max(1, Math.abs(without));
}

describe('adding a unit that may switch off never raises the converged optimum', () => {
  it("the mill's reduced scenario costs no more with bpt2 than without (1,761.90 against 1,766.29 EUR/h before)", async () => {
    const loaded = loadCaseText(readFileSync(MILL, 'utf8'), MILL);
    if (!loaded.ok) throw new Error('demo case does not load');
    const base = loaded.variants.scenarios.find((scenario) => scenario.id === 'reduced')!.plant;
    const withTurbine = loaded.variants.projects.find((project) => project.id === 'bpt_mp_lp')!.plants.find((entry) => entry.scenario === 'reduced')!.plant;
    const without = await solvePlant(base);
    if (!without.ok) throw new Error(without.message);
    // Alone, and told the base plant's decisions, as evaluate does.
    for (const options of [{}, { commitment: without.commitment, start: without.start }]) {
      const withIt = await solvePlant(withTurbine, options);
      if (!withIt.ok) throw new Error(withIt.message);
      expect(noWorse(withIt.result.objective!, without.result.objective!), `${withIt.result.objective} against ${without.result.objective}`).toBe(true);
    }
    expect(without.commitments.filter((candidate) => candidate.kept)).toHaveLength(1);
  }, 120_000);

  it('property: generated plants with a switchable back-pressure turbine added', async () => {
    let compared = 0;
    await fc.assert(
      fc.asyncProperty(plantShape, fc.integer({ min: 60, max: 80 }), async (shape, efficiency) => {
        const plant = loadPlant(plantText(shape).text);
        const without = await solvePlant(plant, { probeMarginalValues: false });
        if (!without.ok) return;
        const low = `h${shape.headers - 1}`;
        const turbine = `  - id: added_bpt
    inlet: h0
    stages:
      - to: ${low}
        isentropic_efficiency: ${efficiency} %
        section_flow: { min: 6 t/h, max: 30 t/h }
    generator_efficiency: 95 %
    can_switch_off: true
`;
        const text = plantText(shape).text;
        const withText = text.includes('turbines:\n') ? text.replace('turbines:\n', `turbines:\n${turbine}`) : text.replace('letdowns:\n', `turbines:\n${turbine}letdowns:\n`);
        const withIt = await solvePlant(loadPlant(withText), { probeMarginalValues: false, commitment: without.commitment, start: without.start });
        expect(withIt.ok, withIt.ok ? '' : withIt.message).toBe(true);
        if (!withIt.ok) return;
        compared += 1;
        expect(noWorse(withIt.result.objective!, without.result.objective!), `${withIt.result.objective} against ${without.result.objective}`).toBe(true);
      }),
      { numRuns: 60, seed: 4242 },
    );
    expect(compared).toBeGreaterThan(30);
  }, 600_000);
});

describe('the loop always ends', () => {
  it('the mill with no site demand settles (it swung 45.9 kJ/kg a pass at bpt1 before)', async () => {
    const text = readFileSync(MILL, 'utf8').replace('site_demand: 7.5 MW', 'site_demand: 0 MW');
    const loaded = loadCaseText(text, MILL);
    if (!loaded.ok) throw new Error('case does not load');
    for (const scenario of loaded.variants.scenarios) {
      const outcome = await solvePlant(scenario.plant);
      expect(outcome.ok, `${scenario.id}: ${outcome.ok ? '' : outcome.message}`).toBe(true);
      expect(outcome.passes.length).toBeLessThanOrEqual(10);
    }
  }, 120_000);

  it('property: generated plants of 2 to 6 headers with each turbine removed in turn converge or say what cannot be met', async () => {
    let runs = 0;
    await fc.assert(
      fc.asyncProperty(plantShape.filter((shape) => shape.turbines.length > 0), async (shape) => {
        for (let without = -1; without < shape.turbines.length; without += 1) {
          const outcome = await solvePlant(loadPlant(plantText(shape, without < 0 ? null : without).text), { probeMarginalValues: false });
          runs += 1;
          // Never "did not settle": a plant either converges or names what it cannot meet.
          if (!outcome.ok) expect(['infeasible', 'physics'], outcome.message).toContain(outcome.reason);
        }
      }),
      { numRuns: 60, seed: 777 },
    );
    expect(runs).toBeGreaterThan(100);
  }, 600_000);

  it('a loop cut short names the point that was still moving', async () => {
    const loaded = loadCaseText(readFileSync(MILL, 'utf8'), MILL);
    if (!loaded.ok) throw new Error('demo case does not load');
    const outcome = await solvePlant(loaded.plant, { maxPasses: 2 });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.reason).toBe('not_converged');
    expect(outcome.message).toMatch(/did not settle in 2 passes: (mp|lp)\.h /);
  }, 60_000);
});
