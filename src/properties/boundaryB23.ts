// Boundary between regions 2 and 3, IAPWS R7-97(2012) section 4 (Eqs. 5 and 6):
// a quadratic p(T) from 623.15 K, 16.5292 MPa to 863.15 K, 100 MPa.

// IAPWS R7-97(2012) Table 1: n1 ... n5, with pi = p / 1 MPa and theta = T / 1 K.
const TABLE_1 = [348.05185628969, -1.1671859879975, 0.0010192970039326, 572.54459862746, 13.91883977887] as const;
const [n1, n2, n3, n4, n5] = TABLE_1;

/** Pressure on the B23 line at temperature T (K), MPa. Eq. 5. */
export function pressureB23(T: number): number {
  return n1 + n2 * T + n3 * T * T;
}

/** Temperature on the B23 line at pressure p (MPa), K. Eq. 6. */
export function temperatureB23(p: number): number {
  return n4 + Math.sqrt((p - n5) / n3);
}
