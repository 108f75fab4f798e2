import { describe, expect, it } from 'vitest';
import { saturationPressureRegion4, saturationTemperatureRegion4 } from '../../src/properties/region4.js';
import { expectClose } from '../helpers/expectClose.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

describe('region 4 saturation line', () => {
  // IAPWS R7-97(2012) Table 35.
  it.each(publishedRows('R7-97 Table 35').map((row) => [describeRow(row), row] as const))(
    'saturationPressureRegion4 matches %s',
    (_label, row) => expectPublished(saturationPressureRegion4(input(row, 'T_K')), row),
  );

  // IAPWS R7-97(2012) Table 36.
  it.each(publishedRows('R7-97 Table 36').map((row) => [describeRow(row), row] as const))(
    'saturationTemperatureRegion4 matches %s',
    (_label, row) => expectPublished(saturationTemperatureRegion4(input(row, 'p_MPa')), row),
  );

  it('starts at 611.213 Pa for 273.15 K (R7-97 section 8.1)', () => {
    expect(Math.abs(saturationPressureRegion4(273.15) - 611.213e-6)).toBeLessThanOrEqual(0.0005e-6);
  });

  it('ends at the critical point, 22.064 MPa and 647.096 K (R7-97 Eqs. 2 and 3)', () => {
    expectClose(saturationPressureRegion4(647.096), 22.064, 1e-8, 'psat(Tc)');
    expectClose(saturationTemperatureRegion4(22.064), 647.096, 1e-8, 'Tsat(pc)');
  });

  it('Eqs. 30 and 31 are inverses of each other', () => {
    for (let T = 273.15; T <= 647; T += 12.5) {
      expectClose(saturationTemperatureRegion4(saturationPressureRegion4(T)), T, 1e-12, `T = ${T} K`);
    }
  });
});
