import { describe, expect, it } from 'vitest';
import { enthalpyRegion1, entropyRegion1, propertiesRegion1 } from '../../src/properties/region1.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

type Quantity = 'v' | 'h' | 'u' | 's' | 'cp' | 'w';

describe('region 1 forward equation', () => {
  // IAPWS R7-97(2012) Table 5: v, h, u, s, cp, w at three (p, T) points.
  it.each(publishedRows('R7-97 Table 5').map((row) => [describeRow(row), row] as const))(
    'propertiesRegion1 matches %s',
    (_label, row) => {
      const properties = propertiesRegion1(input(row, 'p_MPa'), input(row, 'T_K'));
      expectPublished(properties[row.quantity as Quantity], row);
    },
  );

  it('enthalpyRegion1 and entropyRegion1 equal the full evaluation to round-off', () => {
    for (const [p, T] of [[3, 300], [80, 300], [3, 500], [50, 600]] as const) {
      const full = propertiesRegion1(p, T);
      expect(Math.abs(enthalpyRegion1(p, T) - full.h)).toBeLessThan(1e-12 * full.h);
      expect(Math.abs(entropyRegion1(p, T) - full.s)).toBeLessThan(1e-12 * full.s);
    }
  });
});
