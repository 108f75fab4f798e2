import { describe, expect, it } from 'vitest';
import { LinearModel, expr, getBackend } from '../../src/lp/index.js';
import { expectClose } from '../helpers/expectClose.js';

const weights = [12, 7, 11, 8, 9, 6, 14, 5];
const values = [24, 13, 23, 15, 16, 11, 27, 8];
const capacity = 40;

/** The best knapsack value by trying all 2^8 subsets. */
function knapsackByEnumeration(): number {
  let best = 0;
  for (let mask = 0; mask < 1 << weights.length; mask++) {
    let weight = 0;
    let value = 0;
    weights.forEach((itemWeight, item) => {
      if (mask & (1 << item)) {
        weight += itemWeight;
        value += values[item];
      }
    });
    if (weight <= capacity && value > best) best = value;
  }
  return best;
}

function knapsack(): LinearModel {
  const model = new LinearModel('knapsack');
  const take = weights.map((_, item) => model.addVariable(`take${item}`, { type: 'binary' }));
  model.addRow('capacity', take.reduce((total, variable, item) => total.add(variable, weights[item]), expr()), '<=', capacity);
  model.setObjective('maximize', take.reduce((total, variable, item) => total.add(variable, values[item]), expr()));
  return model;
}

describe('MIP', () => {
  it('an 8-item knapsack reaches the optimum found by enumerating all subsets, on both backends', async () => {
    const best = knapsackByEnumeration();
    for (const name of ['highs', 'jslp'] as const) {
      const result = await getBackend(name).solve(knapsack(), { mipRelativeGap: 0 });
      expect(result.status, name).toBe('optimal');
      expectClose(result.objective!, best, 1e-9, `${name} knapsack`);
      for (const [variable, value] of result.primal) expect(Math.abs(value - Math.round(value)), `${name} ${variable}`).toBeLessThan(1e-9);
    }
  });

  it('takes MIP duals from the LP with the integers fixed at the optimum', async () => {
    // Two boilers with minimum loads on a steam-like demand row: on/off binaries.
    const build = (fixed?: { on1: number; on2: number }) => {
      const model = new LinearModel('commitment');
      const on1 = model.addVariable('unit1.on', fixed ? { lower: fixed.on1, upper: fixed.on1 } : { type: 'binary' });
      const on2 = model.addVariable('unit2.on', fixed ? { lower: fixed.on2, upper: fixed.on2 } : { type: 'binary' });
      const out1 = model.addVariable('unit1.out', { upper: 50 });
      const out2 = model.addVariable('unit2.out', { upper: 30 });
      model.addRow('unit1.max', expr().add(out1).add(on1, -50), '<=', 0);
      model.addRow('unit1.min', expr().add(out1).add(on1, -10), '>=', 0);
      model.addRow('unit2.max', expr().add(out2).add(on2, -30), '<=', 0);
      model.addRow('unit2.min', expr().add(out2).add(on2, -5), '>=', 0);
      model.addRow('demand', expr().add(out1).add(out2), '>=', 42);
      model.setObjective('minimize', expr().add(out1, 3).add(out2, 4).add(on1, 20).add(on2, 15));
      return model;
    };
    const mip = await getBackend('highs').solve(build());
    expect(mip.status).toBe('optimal');
    expect(mip.dualsAvailable).toBe(true);
    expect(mip.dualSource).toBe('fixed_lp');
    const fixed = await getBackend('highs').solve(build({ on1: mip.value('unit1.on'), on2: mip.value('unit2.on') }));
    expect(fixed.dualSource).toBe('lp');
    expectClose(mip.objective!, fixed.objective!, 1e-12, 'objective');
    for (const row of ['unit1.max', 'unit1.min', 'unit2.max', 'unit2.min', 'demand']) {
      expect(Math.abs(mip.shadowPrice(row) - fixed.shadowPrice(row)), row).toBeLessThan(1e-9);
    }
    expect(mip.mipNodes).not.toBeNull();
    // Asked not to, the backend skips the fixed-LP solve and says why there are no duals.
    const bare = await getBackend('highs').solve(build(), { mipDuals: false });
    expect(bare.objective).toBe(mip.objective);
    expect(bare.dualsAvailable).toBe(false);
    expect(() => bare.shadowPrice('demand')).toThrow(/mipDuals: false/);
  });
});
