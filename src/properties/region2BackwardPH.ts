import { REGION2A_MAX_PRESSURE } from './constants.js';
import { pressureB2bc } from './boundaryB2bc.js';
import { createPowerSeries, seriesValue, type CoefficientRow } from './powerSeries.js';

// Region 2 backward equations T(p, h), IAPWS R7-97(2012) section 6.3.1.
// Subregion 2a below 4 MPa; above it 2b or 2c on either side of the B2bc
// line. Reducing constants: p* = 1 MPa, h* = 2000 kJ/kg, T* = 1 K.

// IAPWS R7-97(2012) Table 20: theta = sum n pi^I (eta - 2.1)^J, Eq. 22. Rows are [I, J, n].
const TABLE_20: readonly CoefficientRow[] = [
  [0, 0, 1089.8952318288],
  [0, 1, 849.51654495535],
  [0, 2, -107.81748091826],
  [0, 3, 33.153654801263],
  [0, 7, -7.4232016790248],
  [0, 20, 11.765048724356],
  [1, 0, 1.844574935579],
  [1, 1, -4.1792700549624],
  [1, 2, 6.2478196935812],
  [1, 3, -17.344563108114],
  [1, 7, -200.58176862096],
  [1, 9, 271.96065473796],
  [1, 11, -455.11318285818],
  [1, 18, 3091.9688604755],
  [1, 44, 252266.40357872],
  [2, 0, -0.0061707422868339],
  [2, 2, -0.31078046629583],
  [2, 7, 11.670873077107],
  [2, 36, 128127984.04046],
  [2, 38, -985549096.23276],
  [2, 40, 2822454697.3002],
  [2, 42, -3594897141.0703],
  [2, 44, 1722734991.3197],
  [3, 24, -13551.334240775],
  [3, 44, 12848734.66465],
  [4, 12, 1.3865724283226],
  [4, 32, 235988.32556514],
  [4, 44, -13105236.545054],
  [5, 32, 7399.9835474766],
  [5, 36, -551966.9703006],
  [5, 42, 3715408.5996233],
  [6, 34, 19127.72923966],
  [6, 44, -415351.64835634],
  [7, 28, -62.459855192507],
];

// IAPWS R7-97(2012) Table 21: theta = sum n (pi - 2)^I (eta - 2.6)^J, Eq. 23. Rows are [I, J, n].
const TABLE_21: readonly CoefficientRow[] = [
  [0, 0, 1489.5041079516],
  [0, 1, 743.07798314034],
  [0, 2, -97.708318797837],
  [0, 12, 2.4742464705674],
  [0, 18, -0.63281320016026],
  [0, 24, 1.1385952129658],
  [0, 28, -0.47811863648625],
  [0, 40, 0.0085208123431544],
  [1, 0, 0.93747147377932],
  [1, 2, 3.3593118604916],
  [1, 6, 3.3809355601454],
  [1, 12, 0.16844539671904],
  [1, 18, 0.73875745236695],
  [1, 24, -0.47128737436186],
  [1, 28, 0.15020273139707],
  [1, 40, -0.002176411421975],
  [2, 2, -0.021810755324761],
  [2, 8, -0.10829784403677],
  [2, 18, -0.046333324635812],
  [2, 40, 7.1280351959551e-5],
  [3, 1, 0.00011032831789999],
  [3, 2, 0.00018955248387902],
  [3, 12, 0.0030891541160537],
  [3, 24, 0.0013555504554949],
  [4, 2, 2.8640237477456e-7],
  [4, 12, -1.0779857357512e-5],
  [4, 18, -7.6462712454814e-5],
  [4, 24, 1.4052392818316e-5],
  [4, 28, -3.1083814331434e-5],
  [4, 40, -1.0302738212103e-6],
  [5, 18, 2.821728163504e-7],
  [5, 24, 1.2704902271945e-6],
  [5, 40, 7.3803353468292e-8],
  [6, 28, -1.1030139238909e-8],
  [7, 2, -8.1456365207833e-14],
  [7, 28, -2.5180545682962e-11],
  [9, 1, -1.7565233969407e-18],
  [9, 40, 8.6934156344163e-15],
];

// IAPWS R7-97(2012) Table 22: theta = sum n (pi + 25)^I (eta - 1.8)^J, Eq. 24. Rows are [I, J, n].
const TABLE_22: readonly CoefficientRow[] = [
  [-7, 0, -3236839855524.2],
  [-7, 4, 7326335090218.1],
  [-6, 0, 358250899454.47],
  [-6, 2, -583401318515.9],
  [-5, 0, -10783068217.47],
  [-5, 2, 20825544563.171],
  [-2, 0, 610747.83564516],
  [-2, 1, 859777.2253558],
  [-1, 0, -25745.72360417],
  [-1, 2, 31081.088422714],
  [0, 0, 1208.2315865936],
  [0, 1, 482.19755109255],
  [1, 4, 3.7966001272486],
  [1, 8, -10.842984880077],
  [2, 4, -0.04536417267666],
  [6, 0, 1.4559115658698e-13],
  [6, 1, 1.126159740723e-12],
  [6, 4, -1.7804982240686e-11],
  [6, 10, 1.2324579690832e-7],
  [6, 12, -1.1606921130984e-6],
  [6, 16, 2.7846367088554e-5],
  [6, 20, -0.00059270038474176],
  [6, 22, 0.0012918582991878],
];

const subregion2a = createPowerSeries(TABLE_20, 0);
const subregion2b = createPowerSeries(TABLE_21, 0);
const subregion2c = createPowerSeries(TABLE_22, 0);

/** Raw backward T(p, h) of subregion 2a, Eq. 22 (K from MPa, kJ/kg). */
export function temperaturePHRegion2a(p: number, h: number): number {
  return seriesValue(subregion2a, p, h / 2000 - 2.1);
}

/** Raw backward T(p, h) of subregion 2b, Eq. 23. */
export function temperaturePHRegion2b(p: number, h: number): number {
  return seriesValue(subregion2b, p - 2, h / 2000 - 2.6);
}

/** Raw backward T(p, h) of subregion 2c, Eq. 24. */
export function temperaturePHRegion2c(p: number, h: number): number {
  return seriesValue(subregion2c, p + 25, h / 2000 - 1.8);
}

/** Which subregion's T(p, h) applies: 2a up to 4 MPa, then 2c above the B2bc pressure. */
export function subregion2ForPH(p: number, h: number): '2a' | '2b' | '2c' {
  if (p <= REGION2A_MAX_PRESSURE) return '2a';
  return p > pressureB2bc(h) ? '2c' : '2b';
}

/** Raw backward T(p, h) of region 2, subregion chosen by subregion2ForPH. */
export function temperaturePHRegion2Backward(p: number, h: number): number {
  if (p <= REGION2A_MAX_PRESSURE) return temperaturePHRegion2a(p, h);
  return p > pressureB2bc(h) ? temperaturePHRegion2c(p, h) : temperaturePHRegion2b(p, h);
}
