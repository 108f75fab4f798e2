import { describe, it } from 'vitest';
import { temperaturePHRegion1Backward, temperaturePSRegion1Backward } from '../../src/properties/region1Backward.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

// The raw backward equations, digit for digit; the refined inverse is tested in inverse.test.ts.
describe('region 1 backward equations', () => {
  // IAPWS R7-97(2012) Table 7.
  it.each(publishedRows('R7-97 Table 7').map((row) => [describeRow(row), row] as const))(
    'temperaturePHRegion1Backward matches %s',
    (_label, row) => expectPublished(temperaturePHRegion1Backward(input(row, 'p_MPa'), input(row, 'h_kJkg')), row),
  );

  // IAPWS R7-97(2012) Table 9.
  it.each(publishedRows('R7-97 Table 9').map((row) => [describeRow(row), row] as const))(
    'temperaturePSRegion1Backward matches %s',
    (_label, row) => expectPublished(temperaturePSRegion1Backward(input(row, 'p_MPa'), input(row, 's_kJkgK')), row),
  );
});
