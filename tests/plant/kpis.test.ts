// Key figures and limits that must not mislead: drained condensate is not
// returned, and an unused take-or-pay import shows as a limit and a figure.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { solveSummary } from '../../src/report/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant, smallCase } from './helpers/cases.js';

describe('condensate return', () => {
  it('counts only condensate that reaches the deaerator or a flash tank, not what is collected and drained', async () => {
    const plant = loadPlant(readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8'));
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    let returned = 0;
    let used = 0;
    for (const user of plant.users) {
      const steam = Number(result.units.find((unit) => unit.id === user.id)!.values.steam_kg_s);
      used += steam;
      if (user.condensate.to.kind !== 'drain') returned += steam * user.condensate.returnFraction;
    }
    // tank_tracing collects 40 % of its condensate but dumps it.
    expect(plant.users.find((user) => user.id === 'tank_tracing')!.condensate.to.kind).toBe('drain');
    expectClose(result.kpis.condensate_return_fraction!, returned / used, 1e-9, 'condensate return');
  });
});

describe('take-or-pay', () => {
  it('an import below the minimum billed is a binding limit and a line of the solve summary', async () => {
    const text = smallCase().replace('import: { price: 100 USD/MWh, max: 10 MW }', 'import: { price: 100 USD/MWh, max: 10 MW, minimum_billed: 1 MW, shortfall_price: 50 USD/MWh }');
    const outcome = await solvePlant(loadPlant(text));
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    const grid = result.units.find((unit) => unit.id === 'grid')!;
    expect(Number(grid.values.shortfall_kW)).toBeGreaterThan(900);
    expect(grid.binding.join('; ')).toMatch(/import below its take-or-pay minimum: 9\d\d kW billed unused/);
    expect(solveSummary(result, { atmosphericPressure_MPa: 0.101325 })).toMatch(/take-or-pay shortfall \(billed, not taken\) +9\d\d kW/);
  });
});
