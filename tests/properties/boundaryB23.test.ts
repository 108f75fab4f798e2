import { describe, it } from 'vitest';
import { pressureB23, temperatureB23 } from '../../src/properties/boundaryB23.js';
import { expectClose } from '../helpers/expectClose.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

describe('B23 boundary', () => {
  // IAPWS R7-97(2012) section 4: p = 16.5291643 MPa at T = 623.15 K and back.
  it('pressureB23(623.15 K) matches R7-97 section 4', () => {
    const [row] = publishedRows('R7-97 sec.4', 'p_B23(T) Eq.5');
    expectPublished(pressureB23(input(row, 'T_K')), row);
  });

  it('temperatureB23(16.5291643 MPa) matches R7-97 section 4', () => {
    const [row] = publishedRows('R7-97 sec.4', 'T_B23(p) Eq.6');
    expectPublished(temperatureB23(input(row, 'p_MPa')), row);
  });

  it('ends at 100 MPa, 863.15 K (R7-97 section 4)', () => {
    expectClose(pressureB23(863.15), 100, 1e-6, describeRow(publishedRows('R7-97 sec.4')[0]) + ' upper end');
  });

  it('temperatureB23 inverts pressureB23 along the line', () => {
    for (let T = 623.15; T <= 863.15; T += 20) expectClose(temperatureB23(pressureB23(T)), T, 1e-12, `T = ${T} K`);
  });
});
