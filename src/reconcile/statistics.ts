// Critical values of the reconciliation tests, from @stdlib's chi-square and
// normal quantile functions (well kept, typed, no hand-written series).
import chiSquareCdf from '@stdlib/stats-base-dists-chisquare-cdf';
import chiSquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';

/** Upper critical value of the global test: the chi-square quantile at 1 - level, `dof` degrees of freedom. */
export function globalCritical(level: number, dof: number): number {
  return chiSquareQuantile(1 - level, dof);
}

/** Probability of a chi-square statistic at least this large with no gross error. */
export function globalPValue(statistic: number, dof: number): number {
  return dof > 0 ? 1 - chiSquareCdf(statistic, dof) : 1;
}

/**
 * Two-sided critical value of the measurement test when `tests` of them are
 * made at an overall level: the Sidak correction, each at
 * beta = 1 - (1 - level)^(1/tests) (Sidak 1967; applied to the measurement
 * test by Mah and Tamhane, AIChE J. 28 (1982) 828).
 */
export function sidakCritical(level: number, tests: number): number {
  const beta = 1 - Math.pow(1 - level, 1 / Math.max(1, tests));
  return normalQuantile(1 - beta / 2, 0, 1);
}

/** Two-sided standard normal critical value at one level, uncorrected (1.96 at 5 %). */
export function normalCritical(level: number): number {
  return normalQuantile(1 - level / 2, 0, 1);
}

/** Coverage factor of an interval stated at a two-sided confidence: 1.96 at 95 %. */
export function coverageFactor(confidence: number): number {
  return normalQuantile(1 - (1 - confidence) / 2, 0, 1);
}
