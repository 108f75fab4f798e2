// The published steam-metering network of Serth and Heenan (1986), with
// every stream metered at 2.5 % (see tests/fixtures/serthHeenanSteamMetering.ts
// for where the numbers come from). No printed reconciled values were at
// hand, so the checks are properties that must hold on it: the true flows
// close every balance and are left where they are, the global test's false
// alarms stay at its level, and a 7-sigma gross error on one meter is found.
import { describe, expect, test } from 'vitest';
import { reconcileLinear, testReconciliation, type BalanceRow, type LinearProblem } from '../../src/reconcile/index.js';
import { SERTH_HEENAN_FLOWS, SERTH_HEENAN_INCIDENCE, SERTH_HEENAN_SIGMA_SHARE } from '../fixtures/serthHeenanSteamMetering.js';
import { normalDraws, seededRandom } from './helpers/generatedNetworks.js';

const balances: BalanceRow[] = SERTH_HEENAN_INCIDENCE.map((row, i) => ({ name: `unit ${i + 1}`, terms: new Map(row.flatMap((coefficient, j) => (coefficient === 0 ? [] : [[j, coefficient] as [number, number]]))) }));
const sigma = SERTH_HEENAN_FLOWS.map((flow) => SERTH_HEENAN_SIGMA_SHARE * flow);

function draw(normal: () => number, bias: ReadonlyMap<number, number> = new Map()): LinearProblem {
  return {
    variableCount: SERTH_HEENAN_FLOWS.length,
    balances,
    readings: SERTH_HEENAN_FLOWS.map((flow, j) => ({ variable: j, value: flow + sigma[j] * normal() + (bias.get(j) ?? 0), sigma: sigma[j] })),
  };
}

describe('Serth and Heenan (1986) steam-metering network', () => {
  test('the true flows close all 11 balances and reconcile to themselves; 11 degrees of freedom, every meter redundant', () => {
    const exact = reconcileLinear({ variableCount: 28, balances, readings: SERTH_HEENAN_FLOWS.map((flow, j) => ({ variable: j, value: flow, sigma: sigma[j] })) });
    expect(exact.dof).toBe(11);
    expect(exact.globalStatistic).toBeLessThan(1e-20);
    exact.readings.forEach((reading, j) => {
      expect(reading.redundant, `stream ${j + 1}`).toBe(true);
      expect(Math.abs(reading.adjustment), `stream ${j + 1}`).toBeLessThan(1e-9);
    });
  });

  test('1,000 draws with no gross error: the global test rejects within 2 points of its 5 % level', () => {
    const normal = normalDraws(seededRandom(1986));
    let rejected = 0;
    for (let i = 0; i < 1000; i++) if (!testReconciliation(draw(normal), { level: 0.05, maxEliminations: 0 }).global.passed) rejected++;
    expect(Math.abs(rejected / 1000 - 0.05)).toBeLessThan(0.02);
  });

  test('1,000 draws with the best-checked meter reading 7 standard deviations high: serial elimination names it first in at least 90 %', () => {
    // The meter whose adjustment the balances constrain most (largest share
    // of its variance in the adjustment's): a gross error there shows most.
    const exact = reconcileLinear({ variableCount: 28, balances, readings: SERTH_HEENAN_FLOWS.map((flow, j) => ({ variable: j, value: flow, sigma: sigma[j] })) });
    const share = exact.readings.map((reading, j) => reading.adjustmentSigma / sigma[j]);
    const biased = share.indexOf(Math.max(...share));
    // 7 sigma, mid-range of the 5 to 9 sigma errors the benchmark set draws on
    // this network. At 5 sigma the rate here is about 89 %: with 28 meters and
    // 11 balances the Sidak critical value is 3.2 and the meter keeps only part
    // of its error in its adjustment, so the power is lower than on the
    // invented plant of serialElimination.test.ts.
    const normal = normalDraws(seededRandom(733));
    let first = 0;
    for (let i = 0; i < 1000; i++) {
      const tested = testReconciliation(draw(normal, new Map([[biased, 7 * sigma[biased]]])), { level: 0.05 });
      if (tested.suspects[0]?.reading === biased) first++;
    }
    expect(first / 1000).toBeGreaterThanOrEqual(0.9);
  });
});
