import { Matrix, inverse } from 'ml-matrix';
import { describe, expect, test } from 'vitest';
import { loadHighs } from '../../src/lp/index.js';
import { reconcileLinear, type LinearProblem } from '../../src/reconcile/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { balances, generateNetwork, leastSquaresLp, observableByGraph, readingsOf, redundantByGraph, seededRandom } from './helpers/generatedNetworks.js';

describe('reconcileLinear', () => {
  test('one node, all flows measured, matches the closed form', () => {
    // Hand derivation (Lagrange, one constraint a - b - c = 0): with the
    // imbalance r = a - b - c and S = sa^2 + sb^2 + sc^2, the adjustments are
    // -sa^2 r / S for a and +sb^2 r / S, +sc^2 r / S for b and c; the global
    // statistic r^2 / S on 1 degree of freedom; every measurement-test
    // statistic |r| / sqrt(S); reconciled sigma_i = s_i sqrt(1 - s_i^2 / S).
    const [a, b, c] = [100, 61, 35];
    const [sa, sb, sc] = [2, 1.5, 1];
    const problem: LinearProblem = {
      variableCount: 3,
      balances: [{ name: 'header', terms: new Map([[0, 1], [1, -1], [2, -1]]) }],
      readings: [{ variable: 0, value: a, sigma: sa }, { variable: 1, value: b, sigma: sb }, { variable: 2, value: c, sigma: sc }],
    };
    const result = reconcileLinear(problem);
    const r = a - b - c;
    const S = sa ** 2 + sb ** 2 + sc ** 2;
    expectClose(result.readings[0].adjustment, (-sa * sa * r) / S, 1e-12, 'a');
    expectClose(result.readings[1].adjustment, (sb * sb * r) / S, 1e-12, 'b');
    expectClose(result.readings[2].adjustment, (sc * sc * r) / S, 1e-12, 'c');
    expect(result.dof).toBe(1);
    expectClose(result.globalStatistic, (r * r) / S, 1e-12, 'global');
    for (const [i, s] of [sa, sb, sc].entries()) {
      expectClose(result.readings[i].statistic!, Math.abs(r) / Math.sqrt(S), 1e-12, `statistic ${i}`);
      expectClose(result.readings[i].sigma, s * Math.sqrt(1 - (s * s) / S), 1e-12, `sigma ${i}`);
    }
  });

  test('one node with one flow unmeasured: the unmeasured flow is the balance of the others, nothing is redundant', () => {
    const problem: LinearProblem = {
      variableCount: 3,
      balances: [{ name: 'header', terms: new Map([[0, 1], [1, -1], [2, -1]]) }],
      readings: [{ variable: 0, value: 100, sigma: 2 }, { variable: 1, value: 61, sigma: 1.5 }],
    };
    const result = reconcileLinear(problem);
    expect(result.dof).toBe(0);
    expect(result.readings.map((reading) => reading.redundant)).toEqual([false, false]);
    expectClose(result.estimate[2]!, 39, 1e-12, 'unmeasured');
    expectClose(result.sigma[2]!, Math.sqrt(4 + 2.25), 1e-12, 'its sigma');
  });

  test('all measured: the covariance matches V - V A\'(A V A\')^-1 A V by dense inverse', () => {
    const random = seededRandom(7);
    for (let trial = 0; trial < 20; trial++) {
      const network = generateNetwork(random, 6, 5, 1);
      const problem: LinearProblem = { variableCount: network.edges.length, balances: balances(network), readings: readingsOf(network, random) };
      const A = new Matrix(problem.balances.map((row) => Array.from({ length: problem.variableCount }, (_, j) => row.terms.get(j) ?? 0)));
      const V = Matrix.diag(problem.readings.map((reading) => reading.sigma ** 2));
      const y = Matrix.columnVector(problem.readings.map((reading) => reading.value));
      const gain = V.mmul(A.transpose()).mmul(inverse(A.mmul(V).mmul(A.transpose())));
      const xHat = y.clone().sub(gain.mmul(A).mmul(y));
      const covariance = V.clone().sub(gain.mmul(A).mmul(V));
      const result = reconcileLinear(problem);
      result.readings.forEach((reading, i) => {
        // A bridge of the network is forced to zero, so the tolerance is absolute near zero.
        expect(Math.abs(reading.reconciled - xHat.get(i, 0)), `trial ${trial} flow ${i}`).toBeLessThan(1e-9 * Math.max(1, Math.abs(xHat.get(i, 0))));
        expect(Math.abs(reading.sigma - Math.sqrt(Math.max(0, covariance.get(i, i)))), `trial ${trial} sigma ${i}`).toBeLessThan(1e-6 * Math.max(1, problem.readings[i].sigma));
      });
      expect(result.dof).toBe(network.nodes);
    }
  });

  test('estimates match an independent HiGHS quadratic programme on generated networks', async () => {
    const highs = await loadHighs();
    const random = seededRandom(11);
    for (let trial = 0; trial < 25; trial++) {
      const network = generateNetwork(random, 3 + Math.floor(random() * 8), Math.floor(random() * 6), 0.7);
      const problem: LinearProblem = { variableCount: network.edges.length, balances: balances(network), readings: readingsOf(network, random) };
      const result = reconcileLinear(problem);
      const lp = leastSquaresLp(problem, () => true);
      const solved = highs.solve(lp);
      expect(solved.Status, `trial ${trial}`).toBe('Optimal');
      for (let j = 0; j < problem.variableCount; j++) {
        const estimate = result.estimate[j];
        if (estimate === null) continue;
        const qp = (solved.Columns as Record<string, { Primal: number }>)[`x${j}`].Primal;
        expect(Math.abs(estimate - qp), `trial ${trial} x${j}: projection ${estimate}, HiGHS QP ${qp}`).toBeLessThan(1e-4 * Math.max(1, Math.abs(qp)));
      }
    }
  });

  test('observability and redundancy agree with the graph rules on 300 generated networks', () => {
    const random = seededRandom(2026);
    let unobservable = 0;
    let nonRedundant = 0;
    for (let trial = 0; trial < 300; trial++) {
      const network = generateNetwork(random, 2 + Math.floor(random() * 12), Math.floor(random() * 10), 0.3 + 0.6 * random());
      const problem: LinearProblem = { variableCount: network.edges.length, balances: balances(network), readings: readingsOf(network, random) };
      const result = reconcileLinear(problem);
      expect(result.observable, `trial ${trial}: observability`).toEqual(observableByGraph(network));
      const redundant = redundantByGraph(network);
      const byMatrix = network.edges.map((_, j) => result.readings.find((reading) => reading.variable === j)?.redundant ?? false);
      expect(byMatrix, `trial ${trial}: redundancy`).toEqual(redundant);
      unobservable += result.observable.filter((ok) => !ok).length;
      nonRedundant += result.readings.filter((reading) => !reading.redundant).length;
    }
    // The generated set exercises both classes, not only the easy ones.
    expect(unobservable).toBeGreaterThan(50);
    expect(nonRedundant).toBeGreaterThan(50);
  });
});

describe('reconcileLinear with known terms in the balances', () => {
  test('one node a - b + c = 0 with c known matches the closed form', () => {
    // Hand derivation as above with the imbalance r = a - b + c: adjustments
    // -sa^2 r / S and +sb^2 r / S, global statistic r^2 / S.
    const [a, b, known] = [100, 95, -3];
    const [sa, sb] = [2, 1.5];
    const result = reconcileLinear({
      variableCount: 2,
      balances: [{ name: 'node', terms: new Map([[0, 1], [1, -1]]), constant: known }],
      readings: [{ variable: 0, value: a, sigma: sa }, { variable: 1, value: b, sigma: sb }],
    });
    const r = a - b + known;
    const S = sa ** 2 + sb ** 2;
    expectClose(result.readings[0].adjustment, (-sa * sa * r) / S, 1e-12, 'a');
    expectClose(result.readings[1].adjustment, (sb * sb * r) / S, 1e-12, 'b');
    expectClose(result.globalStatistic, (r * r) / S, 1e-12, 'global');
    expectClose(result.readings[0].reconciled - result.readings[1].reconciled + known, 0, 1e-12, 'closes');
  });

  test('an unmeasured flow takes the known term: u = a + c', () => {
    const result = reconcileLinear({
      variableCount: 2,
      balances: [{ name: 'node', terms: new Map([[0, 1], [1, -1]]), constant: 2.5 }],
      readings: [{ variable: 0, value: 40, sigma: 1 }],
    });
    expectClose(result.estimate[1]!, 42.5, 1e-12, 'u');
  });

  test('matches the dense Lagrange solution x = y - V A\'(A V A\')^-1 (A y + c) on generated networks', () => {
    const random = seededRandom(31);
    for (let trial = 0; trial < 20; trial++) {
      const network = generateNetwork(random, 5, 4, 1);
      const base = balances(network);
      const problem: LinearProblem = { variableCount: network.edges.length, balances: base.map((row) => ({ ...row, constant: 10 * (random() - 0.5) })), readings: readingsOf(network, random) };
      const A = new Matrix(problem.balances.map((row) => Array.from({ length: problem.variableCount }, (_, j) => row.terms.get(j) ?? 0)));
      const c = Matrix.columnVector(problem.balances.map((row) => row.constant ?? 0));
      const V = Matrix.diag(problem.readings.map((reading) => reading.sigma ** 2));
      const y = Matrix.columnVector(problem.readings.map((reading) => reading.value));
      const gain = V.mmul(A.transpose()).mmul(inverse(A.mmul(V).mmul(A.transpose())));
      const xHat = y.clone().sub(gain.mmul(A.mmul(y).add(c)));
      const result = reconcileLinear(problem);
      result.readings.forEach((reading, i) => {
        expect(Math.abs(reading.reconciled - xHat.get(i, 0)), `trial ${trial} flow ${i}`).toBeLessThan(1e-9 * Math.max(1, Math.abs(xHat.get(i, 0))));
      });
      const residual = A.mmul(Matrix.columnVector(result.readings.map((reading) => reading.reconciled))).add(c);
      for (let i = 0; i < residual.rows; i++) expect(Math.abs(residual.get(i, 0)), `trial ${trial} row ${i}`).toBeLessThan(1e-9);
    }
  });

  test('known terms that no flows can close are refused by name', () => {
    // Two balances on the same unmeasured loop with different known terms.
    expect(() =>
      reconcileLinear({
        variableCount: 1,
        balances: [
          { name: 'first', terms: new Map([[0, 1]]), constant: 1 },
          { name: 'second', terms: new Map([[0, 1]]), constant: 2 },
        ],
        readings: [],
      }),
    ).toThrow(/first, second/);
  });
});
