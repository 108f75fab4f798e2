import { newtonStepRegion1 } from './region1.js';
import { temperaturePHRegion1Backward, temperaturePSRegion1Backward } from './region1Backward.js';
import { newtonStepRegion2 } from './region2.js';
import { temperaturePHRegion2Backward } from './region2BackwardPH.js';
import { temperaturePSRegion2Backward } from './region2BackwardPS.js';

// The backward equations agree with the forward ones to about 25 mK
// (IAPWS R7-97(2012) sections 5.2 and 6.3). Newton on the forward equation
// from there converges quadratically: two or three steps reach round-off.

const MAX_STEPS = 8;
const RELATIVE_STEP_TOLERANCE = 1e-13;

type NewtonStep = (p: number, T: number, target: number, onEntropy: boolean) => number;

function refine(step: NewtonStep, p: number, start: number, target: number, onEntropy: boolean): number {
  let T = start;
  for (let k = 0; k < MAX_STEPS; k++) {
    const dT = step(p, T, target, onEntropy);
    T -= dT;
    if (Math.abs(dT) <= RELATIVE_STEP_TOLERANCE * T) break;
  }
  return T;
}

/** T(p, h) in region 1 (K), consistent with enthalpyRegion1 to round-off. Allocation-free. */
export function temperaturePHRegion1(p: number, h: number): number {
  return refine(newtonStepRegion1, p, temperaturePHRegion1Backward(p, h), h, false);
}

/** T(p, s) in region 1 (K), consistent with entropyRegion1 to round-off. */
export function temperaturePSRegion1(p: number, s: number): number {
  return refine(newtonStepRegion1, p, temperaturePSRegion1Backward(p, s), s, true);
}

/** T(p, h) in region 2 (K), consistent with enthalpyRegion2 to round-off. Allocation-free. */
export function temperaturePHRegion2(p: number, h: number): number {
  return refine(newtonStepRegion2, p, temperaturePHRegion2Backward(p, h), h, false);
}

/** T(p, s) in region 2 (K), consistent with entropyRegion2 to round-off. */
export function temperaturePSRegion2(p: number, s: number): number {
  return refine(newtonStepRegion2, p, temperaturePSRegion2Backward(p, s), s, true);
}
