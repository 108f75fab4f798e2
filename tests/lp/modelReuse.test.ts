// HiGHS models kept within withModelReuse: a model of a structure solved
// before only has its changed costs, bounds and coefficients set, and starts
// from the last basis. Checked against fresh solves of the same models,
// outside any scope, on a family of seeded models of one structure (LPs and
// MIPs), with another structure solved in between.
import { describe, expect, it, vi } from 'vitest';
import { expr, HighsSession, highsBackend, LinearModel, withModelReuse, type SolveResult } from '../../src/lp/index.js';
import { randomFeasibleLp, seededRandom } from './randomLp.js';

const COLUMNS = 7;
const ROWS = 6;

/** Which variables each row uses: the same for every member of the family. */
function pattern(): boolean[][] {
  const random = seededRandom(11);
  return Array.from({ length: ROWS }, () => Array.from({ length: COLUMNS }, () => random() < 0.6));
}

/** A member of the family: same names, pattern and integrality; costs, bounds, coefficients and right-hand sides drawn from the seed. */
function member(seed: number, integer: boolean): LinearModel {
  const random = seededRandom(seed);
  const pick = (low: number, high: number): number => low + (high - low) * random();
  const model = new LinearModel('family');
  const point: number[] = [];
  const variables = Array.from({ length: COLUMNS }, (_, column) => {
    const upper = Math.round(pick(2, 10));
    const isInteger = integer && column < 2;
    point.push(isInteger ? Math.floor(pick(0, upper + 1)) : pick(0, upper));
    return model.addVariable(`x${column}`, { lower: 0, upper, type: isInteger ? 'integer' : 'continuous' });
  });
  pattern().forEach((uses, row) => {
    const expression = expr();
    let activity = 0;
    uses.forEach((used, column) => {
      if (!used && column > 0) return;
      const coefficient = Math.round(pick(1, 9) * 10) / 10;
      expression.add(variables[column], coefficient);
      activity += coefficient * point[column];
    });
    model.addRow(`r${row}`, expression, row % 2 === 0 ? '<=' : '>=', row % 2 === 0 ? activity + pick(0, 3) : activity - pick(0, 3));
  });
  const objective = expr();
  variables.forEach((variable) => objective.add(variable, Math.round(pick(-5, 5) * 10) / 10));
  model.setObjective('minimize', objective);
  return model;
}

describe('withModelReuse', () => {
  for (const integer of [false, true]) {
    it(`${integer ? 'MIPs' : 'LPs'} of one structure re-solved in a kept model match fresh solves, with another structure in between`, async () => {
      const seeds = Array.from({ length: 25 }, (_, k) => 100 + k);
      const fresh: SolveResult[] = [];
      for (const seed of seeds) fresh.push(await highsBackend.solve(member(seed, integer)));
      const other = await highsBackend.solve(randomFeasibleLp(7));

      const opened = vi.spyOn(HighsSession, 'open');
      const kept: SolveResult[] = [];
      let otherKept: SolveResult | undefined;
      try {
        await withModelReuse(async () => {
          for (const [at, seed] of seeds.entries()) {
            kept.push(await highsBackend.solve(member(seed, integer)));
            if (at === 10) otherKept = await highsBackend.solve(randomFeasibleLp(7));
          }
        });
        // One HiGHS model for the family and one for the other structure.
        expect(opened).toHaveBeenCalledTimes(2);
      } finally {
        opened.mockRestore();
      }
      seeds.forEach((seed, at) => {
        expect(kept[at].status, `seed ${seed}`).toBe(fresh[at].status);
        expect(fresh[at].status).toBe('optimal');
        expect(Math.abs(kept[at].objective! - fresh[at].objective!), `seed ${seed}`).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(fresh[at].objective!)));
      });
      expect(otherKept!.objective).toBeCloseTo(other.objective!, 9);
    });
  }

  it('outside a scope every solve loads a model of its own', async () => {
    const opened = vi.spyOn(HighsSession, 'open');
    try {
      await highsBackend.solve(member(1, false));
      await highsBackend.solve(member(2, false));
      expect(opened).toHaveBeenCalledTimes(2);
    } finally {
      opened.mockRestore();
    }
  });
});
