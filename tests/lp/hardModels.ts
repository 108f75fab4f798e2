// Models that are slow by construction, for tests of time limits: a limit of
// a second or more is reached on any machine, however fast or idle, so the
// tests never depend on the wall clock being tight.
import { LinearModel, expr, type Variable } from '../../src/lp/index.js';

/**
 * A market split instance (Cornuejols and Dawande, "A class of hard small
 * 0-1 programs", IPCO 1998): `rows` equality rows over `columns` binaries
 * with coefficients in 0..99 and right-hand sides half the row sums. Branch
 * and bound must enumerate a large part of the 2^columns points; with 4 rows
 * and 30 columns (the paper's n = 10 (m - 1)) branch and bound runs for minutes at least. Written with
 * deviation variables (minimise the total deviation), so every point is
 * feasible and a solver stopped early still has a solution and a gap.
 * Coefficients come from a fixed linear congruential generator, so the
 * instance is the same on every run.
 */
export function marketSplit(rows = 4, columns = 30, seed = 12345): { model: LinearModel; choices: Variable[] } {
  const model = new LinearModel(`market.split.${rows}x${columns}`);
  let state = seed >>> 0;
  const next = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state % 100;
  };
  const choices = Array.from({ length: columns }, (_, column) => model.addVariable(`x${column}`, { type: 'binary' }));
  const deviation = expr();
  for (let row = 0; row < rows; row++) {
    const coefficients = choices.map(() => next());
    const target = Math.floor(coefficients.reduce((total, value) => total + value, 0) / 2);
    const over = model.addVariable(`over${row}`);
    const under = model.addVariable(`under${row}`);
    const balance = expr();
    choices.forEach((choice, column) => balance.add(choice, coefficients[column]));
    model.addRow(`split${row}`, balance.add(over, -1).add(under, 1), '=', target);
    deviation.add(over).add(under);
  }
  model.setObjective('minimize', deviation);
  return { model, choices };
}
