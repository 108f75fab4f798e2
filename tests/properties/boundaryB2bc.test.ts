import { describe, it } from 'vitest';
import { enthalpyB2bc, pressureB2bc } from '../../src/properties/boundaryB2bc.js';
import { expectClose } from '../helpers/expectClose.js';
import { expectPublished, input, publishedRows } from './publishedRows.js';

describe('B2bc boundary', () => {
  // IAPWS R7-97(2012) Eqs. 20 and 21: h = 3516.004323 kJ/kg at p = 100 MPa and back.
  it('enthalpyB2bc(100 MPa) matches R7-97 Eq. 21', () => {
    const [row] = publishedRows('R7-97 Eq.20/21', 'h_2bc(p) Eq.21');
    expectPublished(enthalpyB2bc(input(row, 'p_MPa')), row);
  });

  it('pressureB2bc(3516.004323 kJ/kg) matches R7-97 Eq. 20', () => {
    const [row] = publishedRows('R7-97 Eq.20/21', 'p_2bc(h) Eq.20');
    expectPublished(pressureB2bc(input(row, 'h_kJkg')), row);
  });

  it('enthalpyB2bc inverts pressureB2bc from 6.546 MPa to 100 MPa', () => {
    // The square root of Eq. 21 is ill-conditioned near the parabola's vertex
    // (n5 = 4.53 MPa), so the lowest point gets a looser tolerance.
    for (const p of [6.546, 10, 25, 50, 75, 100]) {
      expectClose(pressureB2bc(enthalpyB2bc(p)), p, p < 7 ? 1e-10 : 1e-12, `p = ${p} MPa`);
    }
  });
});
