import { describe, expect, it } from 'vitest';
import {
  subregion2ForPS,
  temperaturePSRegion2Backward,
  temperaturePSRegion2a,
  temperaturePSRegion2b,
  temperaturePSRegion2c,
} from '../../src/properties/region2BackwardPS.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

const bySubregion = { '2a': temperaturePSRegion2a, '2b': temperaturePSRegion2b, '2c': temperaturePSRegion2c };

describe('region 2 backward T(p, s)', () => {
  // IAPWS R7-97(2012) Table 29, three points in each subregion.
  for (const subregion of ['2a', '2b', '2c'] as const) {
    it.each(publishedRows('R7-97 Table 29', `region ${subregion} T(p,s)`).map((row) => [describeRow(row), row] as const))(
      `temperaturePSRegion${subregion} matches %s`,
      (_label, row) => {
        const p = input(row, 'p_MPa');
        const s = input(row, 's_kJkgK');
        expectPublished(bySubregion[subregion](p, s), row);
        // The subregion choice (4 MPa, then s = 5.85 kJ/(kg K)) puts the point where the release does.
        expect(subregion2ForPS(p, s)).toBe(subregion);
        expectPublished(temperaturePSRegion2Backward(p, s), row);
      },
    );
  }
});
