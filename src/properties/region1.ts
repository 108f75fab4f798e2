import { GAS_CONSTANT } from './constants.js';
import { emptyReducedGibbs, propertiesFromGibbs, type PhaseProperties, type ReducedGibbs } from './gibbsProperties.js';
import {
  createPowerSeries,
  derivativeRowsInY,
  emptyDerivatives,
  emptyValueAndSlope,
  seriesDerivatives,
  seriesValue,
  seriesValueAndDy,
  type CoefficientRow,
} from './powerSeries.js';

// Region 1: compressed and saturated liquid water. IAPWS R7-97(2012) section 5.1.

const REDUCING_PRESSURE = 16.53; // MPa
const REDUCING_TEMPERATURE = 1386; // K

// IAPWS R7-97(2012) Table 2: gamma = sum n (7.1 - pi)^I (tau - 1.222)^J, Eq. 7.
// Rows are [I, J, n].
const TABLE_2: readonly CoefficientRow[] = [
  [0, -2, 0.14632971213167],
  [0, -1, -0.84548187169114],
  [0, 0, -3.756360367204],
  [0, 1, 3.3855169168385],
  [0, 2, -0.95791963387872],
  [0, 3, 0.15772038513228],
  [0, 4, -0.016616417199501],
  [0, 5, 0.00081214629983568],
  [1, -9, 0.00028319080123804],
  [1, -7, -0.00060706301565874],
  [1, -1, -0.018990068218419],
  [1, 0, -0.032529748770505],
  [1, 1, -0.021841717175414],
  [1, 3, -5.283835796993e-5],
  [2, -3, -0.00047184321073267],
  [2, 0, -0.00030001780793026],
  [2, 1, 4.7661393906987e-5],
  [2, 3, -4.4141845330846e-6],
  [2, 17, -7.2694996297594e-16],
  [3, -4, -3.1679644845054e-5],
  [3, 0, -2.8270797985312e-6],
  [3, 6, -8.5205128120103e-10],
  [4, -5, -2.2425281908e-6],
  [4, -2, -6.5171222895601e-7],
  [4, 10, -1.4341729937924e-13],
  [5, -8, -4.0516996860117e-7],
  [8, -11, -1.2734301741641e-9],
  [8, -6, -1.7424871230634e-10],
  [21, -29, -6.8762131295531e-19],
  [23, -31, 1.4478307828521e-20],
  [29, -38, 2.6335781662795e-23],
  [30, -39, -1.1947622640071e-23],
  [31, -40, 1.8228094581404e-24],
  [32, -41, -9.3537087292458e-26],
];

const series = createPowerSeries(TABLE_2, 2);
// gamma_tau as a series of its own (with its tau-derivative gamma_tautau), for
// the hot paths that need only h and cp.
const slope = createPowerSeries(derivativeRowsInY(TABLE_2), 1);
const scratch = emptyDerivatives();
const slopeScratch = emptyValueAndSlope();
const scratchGibbs = emptyReducedGibbs();

/** Reduced Gibbs function of region 1 and its derivatives, written into `out`. */
export function gibbsRegion1(p: number, T: number, out: ReducedGibbs = emptyReducedGibbs()): ReducedGibbs {
  const pi = p / REDUCING_PRESSURE;
  const tau = REDUCING_TEMPERATURE / T;
  // The series is in x = 7.1 - pi, so each derivative by pi changes sign.
  const d = seriesDerivatives(series, 7.1 - pi, tau - 1.222, scratch);
  out.gamma = d.value;
  out.gammaPi = -d.dx;
  out.gammaPiPi = d.dxx;
  out.gammaTau = d.dy;
  out.gammaTauTau = d.dyy;
  out.gammaPiTau = -d.dxy;
  return out;
}

/** v, h, u, s, cp, w of region 1 at (p MPa, T K); Table 3 relations. */
export function propertiesRegion1(p: number, T: number): PhaseProperties {
  const gibbs = gibbsRegion1(p, T);
  return propertiesFromGibbs(p, T, p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / T, gibbs);
}

/** Specific enthalpy in region 1, kJ/kg: h = R T tau gamma_tau. Allocation-free. */
export function enthalpyRegion1(p: number, T: number): number {
  const tau = REDUCING_TEMPERATURE / T;
  return GAS_CONSTANT * REDUCING_TEMPERATURE * seriesValue(slope, 7.1 - p / REDUCING_PRESSURE, tau - 1.222);
}

/** Specific entropy in region 1, kJ/(kg K). */
export function entropyRegion1(p: number, T: number): number {
  const gibbs = gibbsRegion1(p, T, scratchGibbs);
  return GAS_CONSTANT * ((REDUCING_TEMPERATURE / T) * gibbs.gammaTau - gibbs.gamma);
}

/**
 * One Newton step on temperature for a target enthalpy or entropy, from a
 * single evaluation: dT = (h - h_target) / cp, or (s - s_target) T / cp.
 */
export function newtonStepRegion1(p: number, T: number, target: number, onEntropy: boolean): number {
  const tau = REDUCING_TEMPERATURE / T;
  const x = 7.1 - p / REDUCING_PRESSURE;
  if (onEntropy) {
    const d = seriesDerivatives(series, x, tau - 1.222, scratch);
    const s = GAS_CONSTANT * (tau * d.dy - d.value);
    return ((s - target) * T) / (-GAS_CONSTANT * tau * tau * d.dyy);
  }
  const d = seriesValueAndDy(slope, x, tau - 1.222, slopeScratch);
  const h = GAS_CONSTANT * REDUCING_TEMPERATURE * d.value;
  return (h - target) / (-GAS_CONSTANT * tau * tau * d.dy);
}
