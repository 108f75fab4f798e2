// Statistical tests of a reconciliation and the search for bad meters.
//
// - Global test: the weighted sum of squared adjustments against the
//   chi-square quantile (Reilly and Carpani 1963; Almasy and Sztano 1975).
// - Measurement test: each redundant reading's adjustment over its standard
//   deviation against a normal quantile with the Sidak correction for the
//   number of tests (Mah and Tamhane, AIChE J. 28 (1982) 828).
// - Serial elimination: while the global test rejects, the reading with the
//   largest measurement-test statistic is set aside as unmeasured and the
//   balance reconciled again; its bias is estimated as the reading less the
//   value the others then give it (Ripps 1965; Serth and Heenan, AIChE J. 32
//   (1986) 733).
// - VDI 2048 Part 1 (2000), section 1.4 "quality control": the same global
//   criterion at 95 %, and each reading's improvement within 1.96 of its own
//   standard deviation (no correction for the number of tests).
import { reconcileLinear, type LinearProblem, type LinearResult } from './linearReconciliation.js';
import { globalCritical, globalPValue, normalCritical, sidakCritical } from './statistics.js';

export interface TestSettings {
  /** overall level of significance of each test, e.g. 0.05 */
  level: number;
  /** at most this many readings set aside; default: as many as stay redundant */
  maxEliminations?: number;
}

export interface GlobalTest {
  statistic: number;
  dof: number;
  critical: number;
  pValue: number;
  passed: boolean;
}

export interface Suspect {
  /** index of the reading in the problem */
  reading: number;
  /** its measurement-test statistic when it was chosen */
  statistic: number;
  /** the reading less the value the other readings give it */
  bias: number;
  biasSigma: number;
  /** the global test once it is set aside */
  globalAfter: GlobalTest;
  /**
   * Readings with the same statistic (relative 1e-6): the balances cannot
   * tell their gross errors apart (an equivalent set), so the bias may be in
   * any of them. The chosen one is the first in the problem's order.
   */
  equivalent: number[];
}

export interface TestedReconciliation {
  result: LinearResult;
  global: GlobalTest;
  /** Sidak-corrected critical value of the measurement test */
  measurementCritical: number;
  /** readings whose statistic exceeds it, by index */
  measurementFlagged: number[];
  vdi2048: { globalPassed: boolean; critical: number; flagged: number[] };
  /** suspects in the order serial elimination found them */
  suspects: Suspect[];
  /** the reconciliation with every suspect set aside (the same as `result` when there are none) */
  final: LinearResult;
}

function globalTestOf(result: LinearResult, level: number): GlobalTest {
  const critical = result.dof > 0 ? globalCritical(level, result.dof) : 0;
  return { statistic: result.globalStatistic, dof: result.dof, critical, pValue: globalPValue(result.globalStatistic, result.dof), passed: result.dof === 0 || result.globalStatistic <= critical };
}

export function testReconciliation(problem: LinearProblem, settings: TestSettings): TestedReconciliation {
  const result = reconcileLinear(problem);
  const global = globalTestOf(result, settings.level);
  const redundantCount = result.readings.filter((reading) => reading.redundant).length;
  const measurementCritical = sidakCritical(settings.level, redundantCount);
  const vdiCritical = normalCritical(0.05);
  const flaggedBy = (critical: number): number[] => result.readings.flatMap((reading, i) => (reading.statistic !== null && reading.statistic > critical ? [i] : []));

  const suspects: Suspect[] = [];
  let active = problem.readings.map((_, i) => i);
  let current = result;
  let currentGlobal = global;
  const limit = settings.maxEliminations ?? problem.readings.length;
  while (!currentGlobal.passed && suspects.length < limit) {
    let worst = -1;
    let worstStatistic = -Infinity;
    current.readings.forEach((reading, i) => {
      if (reading.statistic !== null && reading.statistic > worstStatistic) {
        worstStatistic = reading.statistic;
        worst = i;
      }
    });
    if (worst < 0) break;
    const equivalent = current.readings.flatMap((reading, i) => (i !== worst && reading.statistic !== null && Math.abs(reading.statistic - worstStatistic) <= 1e-6 * worstStatistic ? [active[i]] : []));
    const chosen = Math.min(active[worst], ...equivalent);
    const others = [active[worst], ...equivalent].filter((index) => index !== chosen);
    active = active.filter((index) => index !== chosen);
    const next = reconcileLinear({ ...problem, readings: active.map((index) => problem.readings[index]) });
    const reading = problem.readings[chosen];
    const estimate = next.estimate[reading.variable];
    const estimateSigma = next.sigma[reading.variable];
    const nextGlobal = globalTestOf(next, settings.level);
    suspects.push({
      reading: chosen,
      statistic: worstStatistic,
      bias: estimate === null ? NaN : reading.value - estimate,
      biasSigma: estimateSigma === null ? NaN : Math.sqrt(reading.sigma ** 2 + estimateSigma ** 2),
      globalAfter: nextGlobal,
      equivalent: others,
    });
    current = next;
    currentGlobal = nextGlobal;
  }

  return {
    result,
    global,
    measurementCritical,
    measurementFlagged: flaggedBy(measurementCritical),
    vdi2048: { globalPassed: global.dof === 0 || global.statistic <= globalCritical(0.05, global.dof), critical: vdiCritical, flagged: flaggedBy(vdiCritical) },
    suspects,
    final: current,
  };
}
