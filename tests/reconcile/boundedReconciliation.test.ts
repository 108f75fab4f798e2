import { describe, expect, test } from 'vitest';
import { loadHighs } from '../../src/lp/index.js';
import { reconcileBounded, reconcileLinear, type LinearProblem } from '../../src/reconcile/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { balances, generateNetwork, leastSquaresLp, readingsOf, seededRandom } from './helpers/generatedNetworks.js';

describe('reconcileBounded', () => {
  test('one node a = b + c: a small outlet driven negative is held at zero, and a and b meet at their weighted mean', () => {
    // Unbounded: r = 10 - 10.4 - 0.02 = -0.42, S = 0.33, c moves by -0.04 r / S... to -0.031.
    // With c held at 0, a = b is the inverse-variance mean (10/0.25 + 10.4/0.04) / (1/0.25 + 1/0.04) = 300/29.
    const problem: LinearProblem = {
      variableCount: 3,
      balances: [{ name: 'node', terms: new Map([[0, 1], [1, -1], [2, -1]]) }],
      readings: [{ variable: 0, value: 10, sigma: 0.5 }, { variable: 1, value: 10.4, sigma: 0.2 }, { variable: 2, value: 0.02, sigma: 0.2 }],
    };
    expect(reconcileLinear(problem).estimate[2]!).toBeLessThan(0);
    const { result, atBound } = reconcileBounded(problem, [0, 0, 0]);
    expect(atBound).toEqual([2]);
    expectClose(result.estimate[0]!, 300 / 29, 1e-12, 'a');
    expectClose(result.estimate[1]!, 300 / 29, 1e-12, 'b');
    expect(Math.abs(result.estimate[2]!)).toBeLessThan(1e-12);
  });

  test('no bound broken: the same as the unbounded fit', () => {
    const problem: LinearProblem = {
      variableCount: 3,
      balances: [{ name: 'node', terms: new Map([[0, 1], [1, -1], [2, -1]]) }],
      readings: [{ variable: 0, value: 100, sigma: 2 }, { variable: 1, value: 61, sigma: 1.5 }, { variable: 2, value: 35, sigma: 1 }],
    };
    const { result, atBound } = reconcileBounded(problem, [0, 0, 0]);
    expect(atBound).toEqual([]);
    reconcileLinear(problem).estimate.forEach((value, j) => expectClose(result.estimate[j]!, value!, 1e-12, `x${j}`));
  });

  test('matches an independent HiGHS quadratic programme with x >= 0 on generated networks', async () => {
    const highs = await loadHighs();
    const random = seededRandom(1515);
    let held = 0;
    for (let trial = 0; trial < 40; trial++) {
      const network = generateNetwork(random, 3 + Math.floor(random() * 8), Math.floor(random() * 6), 0.8);
      // Readings drawn independently of the balances: large imbalances drive many flows negative.
      const problem: LinearProblem = { variableCount: network.edges.length, balances: balances(network), readings: readingsOf(network, random) };
      const unbounded = reconcileLinear(problem);
      const lower = unbounded.estimate.map((value) => (value === null ? null : 0));
      const { result, atBound } = reconcileBounded(problem, lower);
      held += atBound.length;
      // Unobservable flows stay free, as the active-set method leaves them.
      const lp = leastSquaresLp(problem, (j) => lower[j] === null);
      const solved = highs.solve(lp);
      expect(solved.Status, `trial ${trial}`).toBe('Optimal');
      for (let j = 0; j < problem.variableCount; j++) {
        const estimate = result.estimate[j];
        if (estimate === null) continue;
        expect(estimate, `trial ${trial} x${j} below its bound`).toBeGreaterThanOrEqual(-1e-9);
        const qp = (solved.Columns as Record<string, { Primal: number }>)[`x${j}`].Primal;
        expect(Math.abs(estimate - qp), `trial ${trial} x${j}: active set ${estimate}, HiGHS QP ${qp}`).toBeLessThan(1e-4 * Math.max(1, Math.abs(qp)));
      }
    }
    // The generated set holds bounds often, not only the easy unbounded case.
    expect(held).toBeGreaterThan(20);
  });
});
