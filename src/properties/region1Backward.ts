import { createPowerSeries, seriesValue, type CoefficientRow } from './powerSeries.js';

// Region 1 backward equations, IAPWS R7-97(2012) section 5.2. They give
// T within 25 mK of the forward equation (Eq. 7) and serve as the starting
// point that inverse.ts refines.

// IAPWS R7-97(2012) Table 6: theta = sum n pi^I (eta + 1)^J, Eq. 11,
// with pi = p / 1 MPa, eta = h / 2500 kJ/kg, theta = T / 1 K. Rows are [I, J, n].
const TABLE_6: readonly CoefficientRow[] = [
  [0, 0, -238.72489924521],
  [0, 1, 404.21188637945],
  [0, 2, 113.49746881718],
  [0, 6, -5.8457616048039],
  [0, 22, -0.0001528548241314],
  [0, 32, -1.0866707695377e-6],
  [1, 0, -13.391744872602],
  [1, 1, 43.211039183559],
  [1, 2, -54.010067170506],
  [1, 3, 30.535892203916],
  [1, 4, -6.5964749423638],
  [1, 10, 0.0093965400878363],
  [1, 32, 1.157364750534e-7],
  [2, 10, -2.5858641282073e-5],
  [2, 32, -4.0644363084799e-9],
  [3, 10, 6.6456186191635e-8],
  [3, 32, 8.0670734103027e-11],
  [4, 32, -9.3477771213947e-13],
  [5, 32, 5.8265442020601e-15],
  [6, 32, -1.5020185953503e-17],
];

// IAPWS R7-97(2012) Table 8: theta = sum n pi^I (sigma + 2)^J, Eq. 13,
// with pi = p / 1 MPa, sigma = s / 1 kJ/(kg K), theta = T / 1 K. Rows are [I, J, n].
const TABLE_8: readonly CoefficientRow[] = [
  [0, 0, 174.78268058307],
  [0, 1, 34.806930892873],
  [0, 2, 6.5292584978455],
  [0, 3, 0.33039981775489],
  [0, 11, -1.9281382923196e-7],
  [0, 31, -2.4909197244573e-23],
  [1, 0, -0.26107636489332],
  [1, 1, 0.22592965981586],
  [1, 2, -0.064256463395226],
  [1, 3, 0.0078876289270526],
  [1, 12, 3.5672110607366e-10],
  [1, 31, 1.7332496994895e-24],
  [2, 0, 0.00056608900654837],
  [2, 1, -0.00032635483139717],
  [2, 2, 4.4778286690632e-5],
  [2, 9, -5.1322156908507e-10],
  [2, 31, -4.2522657042207e-26],
  [3, 10, 2.6400441360689e-13],
  [3, 32, 7.8124600459723e-29],
  [4, 32, -3.0732199903668e-31],
];

const byEnthalpy = createPowerSeries(TABLE_6, 0);
const byEntropy = createPowerSeries(TABLE_8, 0);

/** Raw backward T(p, h) of region 1, Eq. 11: p in MPa, h in kJ/kg, T in K. */
export function temperaturePHRegion1Backward(p: number, h: number): number {
  return seriesValue(byEnthalpy, p, h / 2500 + 1);
}

/** Raw backward T(p, s) of region 1, Eq. 13: p in MPa, s in kJ/(kg K), T in K. */
export function temperaturePSRegion1Backward(p: number, s: number): number {
  return seriesValue(byEntropy, p, s + 2);
}
