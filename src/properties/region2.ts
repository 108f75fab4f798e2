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

// Region 2: superheated vapour (and saturated vapour below 623.15 K).
// IAPWS R7-97(2012) section 6.1; gamma = gamma0 (ideal) + gammar (residual).

const REDUCING_PRESSURE = 1; // MPa
const REDUCING_TEMPERATURE = 540; // K

// IAPWS R7-97(2012) Table 10: gamma0 = ln pi + sum n0 tau^J0, Eq. 16.
// Rows are [J0, n0].
const TABLE_10: readonly (readonly [number, number])[] = [
  [0, -9.6927686500217],
  [1, 10.086655968018],
  [-5, -0.005608791128302],
  [-4, 0.071452738081455],
  [-3, -0.40710498223928],
  [-2, 1.4240819171444],
  [-1, -4.383951131945],
  [2, -0.28408632460772],
  [3, 0.021268463753307],
];

// IAPWS R7-97(2012) Table 11: gammar = sum n pi^I (tau - 0.5)^J, Eq. 17.
// Rows are [I, J, n].
const TABLE_11: readonly CoefficientRow[] = [
  [1, 0, -0.0017731742473213],
  [1, 1, -0.017834862292358],
  [1, 2, -0.045996013696365],
  [1, 3, -0.057581259083432],
  [1, 6, -0.05032527872793],
  [2, 1, -3.3032641670203e-5],
  [2, 2, -0.00018948987516315],
  [2, 4, -0.0039392777243355],
  [2, 7, -0.043797295650573],
  [2, 36, -2.6674547914087e-5],
  [3, 0, 2.0481737692309e-8],
  [3, 1, 4.3870667284435e-7],
  [3, 3, -3.227767723857e-5],
  [3, 6, -0.0015033924542148],
  [3, 35, -0.040668253562649],
  [4, 1, -7.8847309559367e-10],
  [4, 2, 1.2790717852285e-8],
  [4, 3, 4.8225372718507e-7],
  [5, 7, 2.2922076337661e-6],
  [6, 3, -1.6714766451061e-11],
  [6, 16, -0.0021171472321355],
  [6, 35, -23.895741934104],
  [7, 0, -5.905956432427e-18],
  [7, 11, -1.2621808899101e-6],
  [7, 25, -0.038946842435739],
  [8, 8, 1.1256211360459e-11],
  [8, 36, -8.2311340897998],
  [9, 13, 1.9809712802088e-8],
  [10, 4, 1.0406965210174e-19],
  [10, 10, -1.0234747095929e-13],
  [10, 14, -1.0018179379511e-9],
  [16, 29, -8.0882908646985e-11],
  [16, 50, 0.10693031879409],
  [18, 57, -0.33662250574171],
  [20, 20, 8.9185845355421e-25],
  [20, 35, 3.0629316876232e-13],
  [20, 48, -4.2002467698208e-6],
  [21, 21, -5.9056029685639e-26],
  [22, 53, 3.7826947613457e-6],
  [23, 39, -1.2768608934681e-15],
  [24, 26, 7.3087610595061e-29],
  [24, 40, 5.5414715350778e-17],
  [24, 58, -9.436970724121e-7],
];

// The ideal part is a series in tau alone: written as pi^0 tau^J0.
const idealRows = TABLE_10.map(([J0, n0]) => [0, J0, n0] as const);
const ideal = createPowerSeries(idealRows, 2);
const residual = createPowerSeries(TABLE_11, 2);
// gamma0_tau and gammar_tau as series of their own (with their tau-derivatives),
// for the hot paths that need only h and cp.
const idealSlope = createPowerSeries(derivativeRowsInY(idealRows), 1);
const residualSlope = createPowerSeries(derivativeRowsInY(TABLE_11), 1);
// The same without room for a further derivative: its powers of (tau - 0.5)
// are all non-negative, so h(p, T) needs no division for them.
const residualSlopeOnly = createPowerSeries(derivativeRowsInY(TABLE_11), 0);
const idealScratch = emptyDerivatives();
const residualScratch = emptyDerivatives();
const idealSlopeScratch = emptyValueAndSlope();
const residualSlopeScratch = emptyValueAndSlope();
const scratchGibbs = emptyReducedGibbs();

/** Reduced Gibbs function of region 2 (ideal + residual) and its derivatives. */
export function gibbsRegion2(p: number, T: number, out: ReducedGibbs = emptyReducedGibbs()): ReducedGibbs {
  const pi = p / REDUCING_PRESSURE;
  const tau = REDUCING_TEMPERATURE / T;
  const i = seriesDerivatives(ideal, 1, tau, idealScratch);
  const r = seriesDerivatives(residual, pi, tau - 0.5, residualScratch);
  out.gamma = Math.log(pi) + i.value + r.value;
  out.gammaPi = 1 / pi + r.dx;
  out.gammaPiPi = -1 / (pi * pi) + r.dxx;
  out.gammaTau = i.dy + r.dy;
  out.gammaTauTau = i.dyy + r.dyy;
  out.gammaPiTau = r.dxy;
  return out;
}

/** v, h, u, s, cp, w of region 2 at (p MPa, T K); Table 12 relations. */
export function propertiesRegion2(p: number, T: number): PhaseProperties {
  const gibbs = gibbsRegion2(p, T);
  return propertiesFromGibbs(p, T, p / REDUCING_PRESSURE, REDUCING_TEMPERATURE / T, gibbs);
}

/** Specific enthalpy in region 2, kJ/kg: h = R T tau (gamma0_tau + gammar_tau). Allocation-free. */
export function enthalpyRegion2(p: number, T: number): number {
  const tau = REDUCING_TEMPERATURE / T;
  const gammaTau = seriesValue(idealSlope, 1, tau) + seriesValue(residualSlopeOnly, p / REDUCING_PRESSURE, tau - 0.5);
  return GAS_CONSTANT * REDUCING_TEMPERATURE * gammaTau;
}

/** Specific entropy in region 2, kJ/(kg K). */
export function entropyRegion2(p: number, T: number): number {
  const gibbs = gibbsRegion2(p, T, scratchGibbs);
  return GAS_CONSTANT * ((REDUCING_TEMPERATURE / T) * gibbs.gammaTau - gibbs.gamma);
}

/**
 * One Newton step on temperature for a target enthalpy or entropy:
 * dT = (h - h_target) / cp, or (s - s_target) T / cp.
 */
export function newtonStepRegion2(p: number, T: number, target: number, onEntropy: boolean): number {
  const tau = REDUCING_TEMPERATURE / T;
  if (onEntropy) {
    const gibbs = gibbsRegion2(p, T, scratchGibbs);
    const s = GAS_CONSTANT * (tau * gibbs.gammaTau - gibbs.gamma);
    return ((s - target) * T) / (-GAS_CONSTANT * tau * tau * gibbs.gammaTauTau);
  }
  const i = seriesValueAndDy(idealSlope, 1, tau, idealSlopeScratch);
  const r = seriesValueAndDy(residualSlope, p / REDUCING_PRESSURE, tau - 0.5, residualSlopeScratch);
  const h = GAS_CONSTANT * REDUCING_TEMPERATURE * (i.value + r.value);
  return (h - target) / (-GAS_CONSTANT * tau * tau * (i.dy + r.dy));
}
