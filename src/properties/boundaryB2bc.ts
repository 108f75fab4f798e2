// Boundary between subregions 2b and 2c for the backward equation T(p,h),
// IAPWS R7-97(2012) section 6.3.1 (Eqs. 20 and 21); it runs from the
// saturation line at 6.546 MPa up to 100 MPa.

// IAPWS R7-97(2012) Table 19: n1 ... n5, with pi = p / 1 MPa and eta = h / 1 kJ/kg.
const TABLE_19 = [905.84278514723, -0.67955786399241, 0.00012809002730136, 2652.6571908428, 4.5257578905948] as const;
const [n1, n2, n3, n4, n5] = TABLE_19;

/** Pressure on the 2b/2c line at enthalpy h (kJ/kg), MPa. Eq. 20. */
export function pressureB2bc(h: number): number {
  return n1 + n2 * h + n3 * h * h;
}

/** Enthalpy on the 2b/2c line at pressure p (MPa), kJ/kg. Eq. 21. */
export function enthalpyB2bc(p: number): number {
  return n4 + Math.sqrt((p - n5) / n3);
}
