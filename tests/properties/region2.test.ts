import { describe, expect, it } from 'vitest';
import { enthalpyRegion2, entropyRegion2, propertiesRegion2 } from '../../src/properties/region2.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

type Quantity = 'v' | 'h' | 'u' | 's' | 'cp' | 'w';

describe('region 2 forward equation', () => {
  // IAPWS R7-97(2012) Table 15: v, h, u, s, cp, w at three (p, T) points.
  it.each(publishedRows('R7-97 Table 15').map((row) => [describeRow(row), row] as const))(
    'propertiesRegion2 matches %s',
    (_label, row) => {
      const properties = propertiesRegion2(input(row, 'p_MPa'), input(row, 'T_K'));
      expectPublished(properties[row.quantity as Quantity], row);
    },
  );

  it('enthalpyRegion2 and entropyRegion2 equal the full evaluation to round-off', () => {
    for (const [p, T] of [[0.0035, 300], [0.0035, 700], [30, 700], [1, 1073.15]] as const) {
      const full = propertiesRegion2(p, T);
      expect(Math.abs(enthalpyRegion2(p, T) - full.h)).toBeLessThan(1e-12 * full.h);
      expect(Math.abs(entropyRegion2(p, T) - full.s)).toBeLessThan(1e-12 * full.s);
    }
  });
});
