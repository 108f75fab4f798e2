import { MAX_TEMPERATURE, MIN_TEMPERATURE, REGION1_MAX_TEMPERATURE } from './constants.js';
import { newtonStepRegion1 } from './region1.js';
import { temperaturePHRegion1Backward, temperaturePSRegion1Backward } from './region1Backward.js';
import { newtonStepRegion2 } from './region2.js';
import { temperaturePHRegion2Backward } from './region2BackwardPH.js';
import { temperaturePSRegion2Backward } from './region2BackwardPS.js';

// The backward equations agree with the forward ones to about 25 mK
// (IAPWS R7-97(2012) sections 5.2 and 6.3). Newton on the forward equation
// from there converges quadratically: two steps reach round-off.
// Near the corners of their range (region 2 T(p,s) below the triple-point
// pressure) the backward value can be far off, so Newton is safeguarded by
// bisection inside the region's temperature bracket; h and s rise with T
// at fixed p (cp > 0), so the sign of each step tells which side the root is.

const MAX_STEPS = 100;
const LAST_STEP = 1e-7;

type NewtonStep = (p: number, T: number, target: number, onEntropy: boolean) => number;

function refine(
  step: NewtonStep,
  p: number,
  start: number,
  target: number,
  onEntropy: boolean,
  low: number,
  high: number,
): number {
  let below = low;
  let above = high;
  let T = start > low && start < high ? start : start <= low ? low : high;
  for (let k = 0; k < MAX_STEPS; k++) {
    const dT = step(p, T, target, onEntropy);
    // Convergence is quadratic: after a step d the remaining error is about
    // d^2 (dcp/dT) / (2 cp), and (dcp/dT) / cp stays below 0.1 /K in regions 1
    // and 2 (measured: 0.095 /K in region 2 beside the B23 line at 16.6 MPa).
    // A step under 1e-7 T (6e-5 K at 600 K) leaves under 2e-10 K, so it is
    // taken without evaluating again: usually after the second evaluation.
    if (Math.abs(dT) <= LAST_STEP * T) return T - dT;
    if (dT > 0) above = T;
    else below = T;
    const next = T - dT;
    T = next > below && next < above ? next : 0.5 * (below + above);
  }
  return T;
}

/** T(p, h) in region 1 (K), consistent with enthalpyRegion1 to round-off. Allocation-free. */
export function temperaturePHRegion1(p: number, h: number): number {
  return refine(newtonStepRegion1, p, temperaturePHRegion1Backward(p, h), h, false, MIN_TEMPERATURE, REGION1_MAX_TEMPERATURE);
}

/** T(p, s) in region 1 (K), consistent with entropyRegion1 to round-off. */
export function temperaturePSRegion1(p: number, s: number): number {
  return refine(newtonStepRegion1, p, temperaturePSRegion1Backward(p, s), s, true, MIN_TEMPERATURE, REGION1_MAX_TEMPERATURE);
}

/** T(p, h) in region 2 (K), consistent with enthalpyRegion2 to round-off. Allocation-free. */
export function temperaturePHRegion2(p: number, h: number): number {
  return refine(newtonStepRegion2, p, temperaturePHRegion2Backward(p, h), h, false, MIN_TEMPERATURE, MAX_TEMPERATURE);
}

/** T(p, s) in region 2 (K), consistent with entropyRegion2 to round-off. */
export function temperaturePSRegion2(p: number, s: number): number {
  return refine(newtonStepRegion2, p, temperaturePSRegion2Backward(p, s), s, true, MIN_TEMPERATURE, MAX_TEMPERATURE);
}
