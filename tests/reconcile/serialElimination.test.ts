import { describe, expect, test } from 'vitest';
import { globalCritical, sidakCritical, testReconciliation, type BalanceRow, type LinearProblem } from '../../src/reconcile/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { normalDraws, seededRandom } from './helpers/generatedNetworks.js';

// An invented plant (demo data, not from any source) with known true flows, t/h:
// two boilers into HP; a back-pressure turbine and a letdown from HP to LP;
// two users on each header; LP heating steam, makeup and condensate into the
// deaerator, which feeds the boilers. Every flow is metered.
const STREAMS: { id: string; from: string; to: string; flow: number }[] = [
  { id: 'boiler1', from: 'env', to: 'hp', flow: 60 },
  { id: 'boiler2', from: 'env', to: 'hp', flow: 40 },
  { id: 'turbineIn', from: 'hp', to: 'turbine', flow: 35 },
  { id: 'turbineOut', from: 'turbine', to: 'lp', flow: 35 },
  { id: 'letdownIn', from: 'hp', to: 'letdown', flow: 15 },
  { id: 'letdownOut', from: 'letdown', to: 'lp', flow: 15 },
  { id: 'user1', from: 'hp', to: 'env', flow: 30 },
  { id: 'user2', from: 'hp', to: 'env', flow: 20 },
  { id: 'user3', from: 'lp', to: 'env', flow: 20 },
  { id: 'user4', from: 'lp', to: 'env', flow: 18 },
  { id: 'heating', from: 'lp', to: 'deaerator', flow: 12 },
  { id: 'makeup', from: 'env', to: 'deaerator', flow: 40 },
  { id: 'condensate', from: 'env', to: 'deaerator', flow: 48 },
  { id: 'feedwater', from: 'deaerator', to: 'env', flow: 100 },
];
const NODES = ['hp', 'lp', 'turbine', 'letdown', 'deaerator'];
const BALANCES: BalanceRow[] = NODES.map((node) => ({
  name: node,
  terms: new Map(STREAMS.flatMap((stream, index): [number, number][] => (stream.to === node ? [[index, 1]] : stream.from === node ? [[index, -1]] : []))),
}));
/**
 * Standard deviation of each meter: 1.5 % of the true flow, 3 % for the
 * turbine inlet meter. That meter lies in two balances whose other meters are
 * more precise, so 91 % of its variance is checked by them (1 - var(x) / var(y));
 * a 5-sigma bias then gives a mean measurement-test statistic of 5 sqrt(0.91) = 4.8.
 * A meter whose balances cannot separate it from others (the boilers, the
 * users on one header, the deaerator's makeup, condensate and feedwater) can
 * never be named alone by any test: see the equivalence test below.
 */
const SIGMA = STREAMS.map((stream) => (stream.id === 'turbineIn' ? 0.03 : 0.015) * stream.flow);

function draw(normal: () => number, bias: Map<number, number> = new Map()): LinearProblem {
  return {
    variableCount: STREAMS.length,
    balances: BALANCES,
    readings: STREAMS.map((stream, index) => ({ variable: index, value: stream.flow + SIGMA[index] * normal() + (bias.get(index) ?? 0), sigma: SIGMA[index] })),
  };
}

describe('testReconciliation', () => {
  test('the true flows balance, so the test plant is consistent', () => {
    for (const row of BALANCES) {
      let sum = 0;
      for (const [index, coefficient] of row.terms) sum += coefficient * STREAMS[index].flow;
      expect(sum, row.name).toBe(0);
    }
  });

  test('critical values: chi-square 0.95 quantiles and the Sidak-corrected normal quantile', () => {
    // Chi-square upper 5 % points, printed in every statistics table (e.g.
    // NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.6.7.4): 3.841 (1 dof), 11.070 (5 dof).
    expectClose(globalCritical(0.05, 1), 3.841, 5e-4, 'chi-square 1 dof');
    expectClose(globalCritical(0.05, 5), 11.070, 5e-4, 'chi-square 5 dof');
    // One test: the plain 1.96. Ten tests: beta = 1 - 0.95^(1/10) = 0.005116, z(1 - beta/2) = 2.800
    // (closed form; value checked against the normal table, z(0.99744) = 2.80).
    expectClose(sidakCritical(0.05, 1), 1.95996, 1e-5, 'one test');
    expectClose(sidakCritical(0.05, 10), 2.800, 1e-3, 'ten tests');
  });

  test('Monte Carlo, 1000 draws with no gross error: the global test rejects within 2 points of its 5 % level', () => {
    const normal = normalDraws(seededRandom(42));
    let rejected = 0;
    let named = 0;
    for (let trial = 0; trial < 1000; trial++) {
      const tested = testReconciliation(draw(normal), { level: 0.05 });
      expect(tested.global.dof).toBe(5);
      if (!tested.global.passed) rejected++;
      if (tested.suspects.length > 0) named++;
    }
    if (process.env.SHOW_RATES) process.stderr.write(`RATE false alarm ${rejected / 1000}\n`);
    expect(rejected / 1000).toBeGreaterThanOrEqual(0.03);
    expect(rejected / 1000).toBeLessThanOrEqual(0.07);
    // Serial elimination only starts when the global test rejects.
    expect(named).toBe(rejected);
  });

  test('Monte Carlo, 1000 draws with the turbine inlet meter biased by 5 standard deviations: it is named first in at least 90 % of draws', () => {
    const index = STREAMS.findIndex((stream) => stream.id === 'turbineIn');
    const normal = normalDraws(seededRandom(100 + index));
    let first = 0;
    let biasTotal = 0;
    for (let trial = 0; trial < 1000; trial++) {
      const tested = testReconciliation(draw(normal, new Map([[index, 5 * SIGMA[index]]])), { level: 0.05 });
      if (tested.suspects[0]?.reading === index) {
        first++;
        biasTotal += tested.suspects[0].bias;
      }
    }
    if (process.env.SHOW_RATES) process.stderr.write(`RATE named first ${first / 1000}, mean bias ${biasTotal / first / SIGMA[index]} sigma\n`);
    expect(first / 1000).toBeGreaterThanOrEqual(0.9);
    // The estimated bias is unbiased: its mean over the draws that named the meter is near 5 sigma.
    expectClose(biasTotal / first / SIGMA[index], 5, 0.1, 'mean estimated bias in sigmas');
  });

  test('meters the balances cannot tell apart are named as equivalent', () => {
    // boiler1 and boiler2 both enter only the HP balance: their columns are alike, so are their statistics.
    const normal = normalDraws(seededRandom(9));
    const tested = testReconciliation(draw(normal, new Map([[0, 20 * SIGMA[0]]])), { level: 0.05 });
    expect(tested.suspects[0].reading).toBe(0);
    expect(tested.suspects[0].equivalent).toContain(1);
  });
});
