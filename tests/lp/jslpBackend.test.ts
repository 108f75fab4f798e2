import { afterAll, describe, expect, it } from 'vitest';
import { LinearModel, closeJslpWorker, expr, getBackend, jslpStatusTable } from '../../src/lp/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { randomFeasibleLp } from './randomLp.js';
import { textbookCases, wyndorInfeasible, wyndorUnbounded } from './textbookModels.js';

const jslp = getBackend('jslp');
const highs = getBackend('highs');

afterAll(async () => {
  await closeJslpWorker();
});

describe('javascript-lp-solver backend', () => {
  for (const testCase of textbookCases) {
    it(`${testCase.title} reaches the published optimum ${testCase.objective} (${testCase.source})`, async () => {
      const result = await jslp.solve(testCase.build());
      expect(result.status).toBe('optimal');
      // The package rounds its answers (to about 1e-8), hence the looser tolerance.
      expectClose(result.objective!, testCase.objective, 1e-6, `${testCase.title} objective`);
    });
  }

  it('says that duals are unavailable', async () => {
    const result = await jslp.solve(textbookCases[0].build());
    expect(result.dualsAvailable).toBe(false);
    expect(result.dual).toBeNull();
    expect(() => result.shadowPrice('plant1')).toThrow(/javascript-lp-solver gives no duals/);
  });

  it('reports infeasible and unbounded textbook variants', async () => {
    expect((await jslp.solve(wyndorInfeasible())).status).toBe('infeasible');
    expect((await jslp.solve(wyndorUnbounded())).status).toBe('unbounded');
  });

  it('maps verdicts through one table', () => {
    expect([...jslpStatusTable.entries()]).toEqual([
      ['feasible/bounded', 'optimal'],
      ['feasible/unbounded', 'unbounded'],
      ['infeasible/bounded', 'infeasible'],
      ['infeasible/unbounded', 'infeasible'],
    ]);
  });

  it('handles free variables, negative lower bounds and ranged rows', async () => {
    const model = new LinearModel('bounds');
    const free = model.addVariable('free.var', { lower: -Infinity, upper: Infinity });
    const negative = model.addVariable('negative', { lower: -4, upper: 3 });
    model.addRangeRow('band', -2, expr().add(free).add(negative), 5);
    model.addRow('link', expr().add(free).add(negative, -1), '>=', -10);
    model.setObjective('minimize', expr().add(free, 1).add(negative, 2));
    const reference = await highs.solve(model);
    const result = await jslp.solve(model);
    expect(result.status).toBe('optimal');
    expectClose(result.objective!, reference.objective!, 1e-9, 'objective');
  });

  it('ends a solve that runs past the watchdog as did_not_finish, and serves the next solve', async () => {
    // A knapsack-like MIP with many near-equal items keeps branch and bound busy far past 1 ms.
    const model = new LinearModel('slow');
    const items = Array.from({ length: 60 }, (_, index) => model.addVariable(`item${index}`, { type: 'integer', upper: 3 }));
    const weight = expr();
    const value = expr();
    items.forEach((item, index) => {
      weight.add(item, 1000 + ((index * 7919) % 97));
      value.add(item, 1000 + ((index * 104729) % 89));
    });
    model.addRow('capacity', weight, '<=', 31_337.5);
    model.setObjective('maximize', value);
    const slow = await jslp.solve(model, { timeLimitSeconds: 0.001 });
    expect(slow.status).toBe('did_not_finish');
    expect(slow.message).toMatch(/did not finish within 0.001 s/);
    const next = await jslp.solve(textbookCases[0].build());
    expect(next.status).toBe('optimal');
  });
});

describe('javascript-lp-solver and HiGHS agree', () => {
  it('on 300 random feasible LPs, objective to 1e-6 relative; watchdog stops are counted as skipped', async () => {
    let agreed = 0;
    const skipped: number[] = [];
    for (let seed = 1; seed <= 300; seed++) {
      const model = randomFeasibleLp(seed);
      const reference = await highs.solve(model);
      expect(reference.status, `seed ${seed} highs`).toBe('optimal');
      const other = await jslp.solve(model, { timeLimitSeconds: 5 });
      if (other.status === 'did_not_finish') {
        skipped.push(seed);
        continue;
      }
      expect(other.status, `seed ${seed} jslp: ${other.message ?? ''}`).toBe('optimal');
      const scale = Math.max(1, Math.abs(reference.objective!));
      expect(Math.abs(other.objective! - reference.objective!) / scale, `seed ${seed} objective`).toBeLessThan(1e-6);
      agreed++;
    }
    console.log(`random LP cross-check: ${agreed} agreed, ${skipped.length} skipped by the watchdog (seeds ${skipped.join(', ') || 'none'})`);
    expect(agreed + skipped.length).toBe(300);
    expect(skipped.length).toBeLessThan(15);
  });
});
