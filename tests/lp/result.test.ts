import { describe, expect, it } from 'vitest';
import { LinearModel, expr, getBackend, type SolveResult } from '../../src/lp/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { randomFeasibleLp } from './randomLp.js';
import { radiationTherapy, wyndor } from './textbookModels.js';

const highs = getBackend('highs');

/** Re-solves with one row's bound moved by delta and returns the objective change per unit. */
async function finiteDifference(build: () => LinearModel, rowName: string, sense: '<=' | '>=', rhs: number, delta: number): Promise<number> {
  const base = await highs.solve(build());
  const moved = build();
  const row = moved.row(rowName);
  const rebuilt = new LinearModel(`${moved.name}.moved`);
  for (const variable of moved.variables) rebuilt.addVariable(variable.name, { lower: variable.lower, upper: variable.upper, type: variable.type });
  const copy = (expression: typeof row.expression) => {
    const result = expr();
    for (const [variable, coefficient] of expression.terms) result.add(rebuilt.variable(variable.name), coefficient);
    return result.addConstant(expression.constant);
  };
  for (const other of moved.rows) {
    if (other.name === row.name) rebuilt.addRow(other.name, copy(other.expression), sense, rhs + delta);
    else if (other.sense === 'range') rebuilt.addRangeRow(other.name, other.lower, copy(other.expression), other.upper);
    else rebuilt.addRow(other.name, copy(other.expression), other.sense, other.sense === '>=' ? other.lower : other.upper);
  }
  rebuilt.setObjective(moved.objective!.sense, copy(moved.objective!.expression));
  const after = await highs.solve(rebuilt);
  return (after.objective! - base.objective!) / delta;
}

describe('shadowPrice = d(optimal objective)/d(right-hand side)', () => {
  it('maximise with <= rows: Wyndor plant 3 is worth +1 per hour (Hillier & Lieberman sec. 4.7, from memory)', async () => {
    const result = await highs.solve(wyndor());
    expectClose(result.shadowPrice('plant3'), 1, 1e-9, 'plant3');
    expectClose(await finiteDifference(wyndor, 'plant3', '<=', 18, 0.01), 1, 1e-9, 'finite difference');
  });

  it('minimise with a >= row: raising the tumour-centre dose floor costs more (sign checked by re-solving)', async () => {
    const build = () => {
      // The >= row binds only once its floor is above 6.3; 6.4 makes it bind.
      const model = new LinearModel('radiation.tight');
      const x1 = model.addVariable('beam1');
      const x2 = model.addVariable('beam2');
      model.addRow('healthy.anatomy', expr().add(x1, 0.3).add(x2, 0.1), '<=', 2.7);
      model.addRow('center.of.tumour', expr().add(x1, 0.6).add(x2, 0.4), '>=', 6.4);
      model.addRow('tumour.region', expr().add(x1, 0.5).add(x2, 0.5), '>=', 6);
      model.setObjective('minimize', expr().add(x1, 0.4).add(x2, 0.5));
      return model;
    };
    const result = await highs.solve(build());
    const price = result.shadowPrice('center.of.tumour');
    expect(price).toBeGreaterThan(0);
    expectClose(await finiteDifference(build, 'center.of.tumour', '>=', 6.4, 0.001), price, 1e-6, 'finite difference');
  });

  it('minimise with a binding <= row: more room lowers the cost, so the price is negative', async () => {
    const result = await highs.solve(radiationTherapy());
    const price = result.shadowPrice('healthy.anatomy');
    expect(price).toBeLessThan(0);
    expectClose(await finiteDifference(radiationTherapy, 'healthy.anatomy', '<=', 2.7, 0.001), price, 1e-6, 'finite difference');
  });

  it('maximise with a binding >= row: a higher floor lowers the profit, so the price is negative', async () => {
    const build = () => {
      const model = wyndor();
      model.addRow('x1.floor', expr().add(model.variable('x1')), '>=', 3);
      return model;
    };
    const result = await highs.solve(build());
    const price = result.shadowPrice('x1.floor');
    expect(price).toBeLessThan(0);
    expectClose(await finiteDifference(build, 'x1.floor', '>=', 3, 0.01), price, 1e-6, 'finite difference');
  });
});

/** Strong duality: objective = offset + sum of duals times the active bounds, rows and columns. */
function dualObjective(model: LinearModel, result: SolveResult): number {
  let total = model.objective!.expression.constant;
  for (const row of model.rows) {
    const price = result.shadowPrice(row.name);
    const activity = result.rowActivity.get(row.name)!;
    const bound = Math.abs(activity - row.lower) <= Math.abs(activity - row.upper) ? row.lower : row.upper;
    if (price !== 0) total += price * bound;
  }
  for (const variable of model.variables) {
    const reduced = result.reducedCost!.get(variable.name)!;
    const value = result.value(variable);
    const bound = Math.abs(value - variable.lower) <= Math.abs(value - variable.upper) ? variable.lower : variable.upper;
    if (reduced !== 0) total += reduced * bound;
  }
  return total;
}

describe('HiGHS duals on 200 random LPs', () => {
  it('close the duality gap and are complementary to the slacks', async () => {
    for (let seed = 1001; seed <= 1200; seed++) {
      const model = randomFeasibleLp(seed);
      const result = await highs.solve(model);
      expect(result.status).toBe('optimal');
      expect(result.dualsAvailable).toBe(true);
      expectClose(dualObjective(model, result), result.objective!, 1e-7, `seed ${seed} strong duality`);
      const maximise = model.objective!.sense === 'maximize';
      for (const row of model.rows) {
        const price = result.shadowPrice(row.name);
        const activity = result.rowActivity.get(row.name)!;
        const atLower = Math.abs(activity - row.lower) <= 1e-7 * Math.max(1, Math.abs(row.lower));
        const atUpper = Math.abs(activity - row.upper) <= 1e-7 * Math.max(1, Math.abs(row.upper));
        if (!atLower && !atUpper) expect(Math.abs(price), `seed ${seed} ${row.name} slack but priced`).toBeLessThan(1e-7);
        // Raising an active upper bound can only help; raising an active lower bound can only hurt.
        const helps = maximise ? price >= -1e-7 : price <= 1e-7;
        const hurts = maximise ? price <= 1e-7 : price >= -1e-7;
        if (atUpper && !atLower) expect(helps, `seed ${seed} ${row.name} sign at upper`).toBe(true);
        if (atLower && !atUpper) expect(hurts, `seed ${seed} ${row.name} sign at lower`).toBe(true);
      }
    }
  });
});
