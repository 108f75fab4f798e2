// A mixed-integer pass stopped by its time limit with a point: the solve goes on
// with that point's on/off decisions and says so, with the gap, rather than failing.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { highsBackend, type SolverBackend } from '../../src/lp/index.js';
import { loadCaseText } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';

/** HiGHS, except that every MIP reports the time limit with its point, as a slow machine would. */
const stoppedEarly: SolverBackend = {
  name: 'highs-stopped-early',
  async solve(model, options) {
    const result = await highsBackend.solve(model, options);
    if (!model.isMip || result.status !== 'optimal') return result;
    return { ...result, status: 'time_limit', message: 'HiGHS reached the time limit of 60 s; the best point found is within 0.300 % of the best possible (MIP gap); raise solver.time_limit_seconds or solver.mip_gap to accept it' };
  },
};

describe('a time limit on a mixed-integer pass', () => {
  it('keeps the best point found, says so with the gap, and still closes the balance', async () => {
    const file = 'cases/kestrel-bay-board-mill.yaml';
    const loaded = loadCaseText(readFileSync(file, 'utf8'), file);
    if (!loaded.ok) throw new Error('demo case does not load');
    const outcome = await solvePlant(loaded.plant, { backend: stoppedEarly });
    expect(outcome.ok, outcome.ok ? '' : outcome.message).toBe(true);
    if (!outcome.ok) return;
    // The mill keeps its first pass's decisions, whose pass 1 was the stopped MIP.
    const noted = outcome.passes.filter((pass) => pass.note);
    expect(noted.length).toBeGreaterThan(0);
    const result = plantResult(outcome);
    expect(result.audit.worst_relative).toBeLessThanOrEqual(1e-6);
    for (const pass of noted) expect(pass.note).toMatch(/time limit .*MIP gap.*on\/off decisions were used/);
    // Against the same case solved without the limit: the same decisions and optimum here.
    const free = await solvePlant(loaded.plant);
    if (!free.ok) throw new Error(free.message);
    expect(Math.abs(outcome.result.objective! - free.result.objective!)).toBeLessThan(1e-6 * free.result.objective!);
  });
});
