// The Willans line: a turbine's steam flow is close to linear in its power.

/**
 * Power (kW) of a turbine section on a Willans line m = m0 + P / slopeInverse,
 * written here in the form engineers fit from test data:
 * P = max(0, (m - intercept) * slope), with `intercept` the no-load flow (kg/s)
 * and `slope` the incremental power per unit flow (kW per kg/s).
 */
export function willansPower(flow: number, intercept: number, slope: number): number {
  return Math.max(0, (flow - intercept) * slope);
}
