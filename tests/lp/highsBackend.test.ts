import { describe, expect, it } from 'vitest';
import { LinearModel, expr, getBackend } from '../../src/lp/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { marketSplit } from './hardModels.js';
import { textbookCases, wyndorInfeasible, wyndorUnbounded } from './textbookModels.js';

const highs = getBackend('highs');

describe('HiGHS backend on textbook LPs', () => {
  for (const testCase of textbookCases) {
    it(`${testCase.title} reaches the published optimum ${testCase.objective} (${testCase.source})`, async () => {
      const result = await highs.solve(testCase.build());
      expect(result.status).toBe('optimal');
      expectClose(result.objective!, testCase.objective, 1e-9, `${testCase.title} objective`);
      for (const [name, value] of Object.entries(testCase.point)) {
        expect(Math.abs(result.value(name) - value), `${testCase.title} ${name}`).toBeLessThan(1e-9);
      }
      for (const [row, price] of Object.entries(testCase.shadowPrices ?? {})) {
        expect(Math.abs(result.shadowPrice(row) - price), `${testCase.title} shadow price of ${row}`).toBeLessThan(1e-9);
      }
      expect(result.backend).toBe('highs');
      expect(result.iterations).not.toBeNull();
      expect(result.timeMs).toBeGreaterThan(0);
    });
  }

  it('reports Wyndor with Z >= 50 as infeasible, without a point', async () => {
    const result = await highs.solve(wyndorInfeasible());
    expect(result.status).toBe('infeasible');
    expect(result.objective).toBeNull();
    expect(result.hasSolution).toBe(false);
    expect(result.dualsAvailable).toBe(false);
    expect(() => result.value('x1')).toThrow(/ended "infeasible"/);
  });

  it('reports Wyndor without plants 2 and 3 as unbounded', async () => {
    const result = await highs.solve(wyndorUnbounded());
    expect(result.status).toBe('unbounded');
    expect(result.objective).toBeNull();
  });

  it('resolves an "infeasible or unbounded" verdict before reporting it', async () => {
    // x - y >= 1 and y - x >= 1 contradict; with both free and costs pulling
    // down, the dual is infeasible too, the case presolve cannot split.
    const model = new LinearModel('contradiction');
    const x = model.addVariable('x', { lower: -Infinity });
    const y = model.addVariable('y', { lower: -Infinity });
    model.addRow('a', expr().add(x).add(y, -1), '>=', 1);
    model.addRow('b', expr().add(y).add(x, -1), '>=', 1);
    model.setObjective('minimize', expr().add(x, -1).add(y, -1));
    const result = await highs.solve(model, { presolve: 'on' });
    expect(result.status).toBe('infeasible');
  });

  it('keeps the objective constant as an offset', async () => {
    const model = new LinearModel('offset');
    const x = model.addVariable('x', { upper: 4 });
    model.setObjective('maximize', expr().add(x, 2).addConstant(7));
    model.addRow('cap', expr().add(x), '<=', 3);
    const result = await highs.solve(model);
    expectClose(result.objective!, 13, 1e-12, 'objective with offset');
  });

  it('moves an expression constant to the right-hand side of its row', async () => {
    const model = new LinearModel('constant.row');
    const x = model.addVariable('x', { upper: 100 });
    model.addRow('demand', expr().add(x).addConstant(-5), '>=', 10); // x - 5 >= 10
    model.setObjective('minimize', expr().add(x));
    const result = await highs.solve(model);
    expectClose(result.value(x), 15, 1e-12, 'x');
    expectClose(result.rowActivity.get('demand')!, 15, 1e-12, 'activity without the constant');
    expectClose(result.shadowPrice('demand'), 1, 1e-12, 'price of demand');
  });

  it('stops at a time limit on each solve, not cumulatively', async () => {
    const model = new LinearModel('quick');
    const x = model.addVariable('x', { upper: 1 });
    model.addRow('cap', expr().add(x), '<=', 1);
    model.setObjective('maximize', expr().add(x));
    for (let attempt = 0; attempt < 3; attempt++) {
      const result = await highs.solve(model, { timeLimitSeconds: 5 });
      expect(result.status).toBe('optimal');
    }
  });

  it('ends a hard MIP at its time limit with the best point found', async () => {
    // Hard by construction (tests/lp/hardModels.ts), so a 1 s limit is reached
    // on any machine; every point is feasible, so HiGHS has one to return.
    const { model } = marketSplit();
    const result = await highs.solve(model, { timeLimitSeconds: 1 });
    expect(result.status).toBe('time_limit');
    expect(result.objective).not.toBeNull();
    expect(result.primal.size).toBeGreaterThan(0);
    // The message gives the gap and what to change.
    expect(result.message).toMatch(/^HiGHS reached the time limit of 1 s; the best point found is within [\d.]+ % of the best possible \(MIP gap\); raise solver\.time_limit_seconds or solver\.mip_gap to accept it$/);
  });
});
