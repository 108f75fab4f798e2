// Region 4: the saturation line, IAPWS R7-97(2012) section 8.
// Valid from 273.15 K (611.213 Pa) to the critical point 647.096 K (22.064 MPa).

// IAPWS R7-97(2012) Table 34: n1 ... n10 of Eqs. 28-31.
const TABLE_34 = [
  1167.0521452767, // n1
  -724213.16703206, // n2
  -17.073846940092, // n3
  12020.82470247, // n4
  -3232555.0322333, // n5
  14.91510861353, // n6
  -4823.2657361591, // n7
  405113.40542057, // n8
  -0.23855557567849, // n9
  650.17534844798, // n10
] as const;
const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = TABLE_34;

/** Saturation pressure at T (K), MPa, without range checks. Eq. 30. */
export function saturationPressureRegion4(T: number): number {
  const theta = T + n9 / (T - n10); // Eq. 29b
  const A = theta * theta + n1 * theta + n2;
  const B = n3 * theta * theta + n4 * theta + n5;
  const C = n6 * theta * theta + n7 * theta + n8;
  const root = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  const squared = root * root;
  return squared * squared;
}

/** Saturation temperature at p (MPa), K, without range checks. Eq. 31. */
export function saturationTemperatureRegion4(p: number): number {
  const beta = Math.sqrt(Math.sqrt(p)); // Eq. 29a
  const E = beta * beta + n3 * beta + n6;
  const F = n1 * beta * beta + n4 * beta + n7;
  const G = n2 * beta * beta + n5 * beta + n8;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  const sum = n10 + D;
  return (sum - Math.sqrt(sum * sum - 4 * (n9 + n10 * D))) / 2;
}
