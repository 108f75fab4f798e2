import { describe, expect, it } from 'vitest';
import {
  subregion2ForPH,
  temperaturePHRegion2Backward,
  temperaturePHRegion2a,
  temperaturePHRegion2b,
  temperaturePHRegion2c,
} from '../../src/properties/region2BackwardPH.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

const bySubregion = { '2a': temperaturePHRegion2a, '2b': temperaturePHRegion2b, '2c': temperaturePHRegion2c };

describe('region 2 backward T(p, h)', () => {
  // IAPWS R7-97(2012) Table 24, three points in each subregion.
  for (const subregion of ['2a', '2b', '2c'] as const) {
    it.each(publishedRows('R7-97 Table 24', `region ${subregion} T(p,h)`).map((row) => [describeRow(row), row] as const))(
      `temperaturePHRegion${subregion} matches %s`,
      (_label, row) => {
        const p = input(row, 'p_MPa');
        const h = input(row, 'h_kJkg');
        expectPublished(bySubregion[subregion](p, h), row);
        // The subregion choice (4 MPa, then the B2bc line) puts the point where the release does.
        expect(subregion2ForPH(p, h)).toBe(subregion);
        expectPublished(temperaturePHRegion2Backward(p, h), row);
      },
    );
  }
});
