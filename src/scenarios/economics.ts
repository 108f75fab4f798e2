// Project economics on end-of-year cash flows: net present value, internal
// rate of return by a bracketing root finder, simple payback.

/** NPV at `rate` of cash flows, the first at time 0 and one per year after it. */
export function netPresentValue(rate: number, cashFlows: number[]): number {
  if (!(rate > -1)) throw new Error(`discount rate ${rate} must be above -1 (-100 %)`);
  return cashFlows.reduce((total, flow, year) => total + flow / (1 + rate) ** year, 0);
}

/** Cash flows of a project: -capital now, then the same net saving each year of its life (a part year last). */
export function projectCashFlows(capital: number, netAnnual: number, lifeYears: number): number[] {
  const whole = Math.floor(lifeYears);
  const flows = [-capital, ...Array.from({ length: whole }, () => netAnnual)];
  const part = lifeYears - whole;
  if (part > 1e-9) flows.push(netAnnual * part);
  return flows;
}

/**
 * The rate at which NPV is zero, or null when the cash flows never change
 * sign (no IRR) or NPV has no root between -99 % and 1000 % a year. Bisection
 * on a bracket found by scanning: slow but never diverges, unlike Newton.
 */
export function internalRateOfReturn(cashFlows: number[]): number | null {
  const signs = cashFlows.filter((flow) => flow !== 0).map(Math.sign);
  if (!signs.some((sign) => sign !== signs[0])) return null;
  const npv = (rate: number): number => netPresentValue(rate, cashFlows);
  // Scan outward from 0 on a grid that is fine near zero, where real IRRs live.
  const grid = [-0.99, -0.9, -0.75, -0.5, -0.25, -0.1, 0, 0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.5, 0.75, 1, 2, 5, 10];
  let low = NaN;
  let high = NaN;
  for (let index = grid.indexOf(0); index < grid.length - 1 && Number.isNaN(low); index++) {
    if (Math.sign(npv(grid[index])) !== Math.sign(npv(grid[index + 1]))) [low, high] = [grid[index], grid[index + 1]];
  }
  for (let index = grid.indexOf(0); index > 0 && Number.isNaN(low); index--) {
    if (Math.sign(npv(grid[index - 1])) !== Math.sign(npv(grid[index]))) [low, high] = [grid[index - 1], grid[index]];
  }
  if (Number.isNaN(low)) return null;
  let npvLow = npv(low);
  for (let iteration = 0; iteration < 200 && high - low > 1e-12; iteration++) {
    const middle = (low + high) / 2;
    const npvMiddle = npv(middle);
    if (npvMiddle === 0) return middle;
    if (Math.sign(npvMiddle) === Math.sign(npvLow)) [low, npvLow] = [middle, npvMiddle];
    else high = middle;
  }
  return (low + high) / 2;
}

/** Years for the net annual saving to repay the capital; null when it never does. */
export function simplePayback(capital: number, netAnnual: number): number | null {
  return netAnnual > 0 ? capital / netAnnual : null;
}
