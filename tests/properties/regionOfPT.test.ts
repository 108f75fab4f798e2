import { describe, expect, it } from 'vitest';
import { PropertyRangeError, statePT } from '../../src/properties/index.js';
import { saturationPressureRegion4 } from '../../src/properties/region4.js';
import { regionOfPT } from '../../src/properties/regionOfPT.js';
import { describeRow, input, publishedRows } from './publishedRows.js';

const COVERAGE = 'it covers p <= 100 MPa, 273.15 K <= T <= 1073.15 K outside region 3';

function refusal(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(PropertyRangeError);
    return (error as Error).message;
  }
  throw new Error('expected a PropertyRangeError, but the call returned');
}

describe('regionOfPT', () => {
  it('places the R7-97 verification points in their regions (Tables 5 and 15)', () => {
    for (const row of publishedRows('R7-97 Table 5')) expect(regionOfPT(input(row, 'p_MPa'), input(row, 'T_K'))).toBe(1);
    for (const row of publishedRows('R7-97 Table 15')) expect(regionOfPT(input(row, 'p_MPa'), input(row, 'T_K'))).toBe(2);
  });

  it('takes a state exactly on the saturation line as liquid', () => {
    const T = 450;
    expect(regionOfPT(saturationPressureRegion4(T), T)).toBe(1);
    expect(regionOfPT(saturationPressureRegion4(T) * (1 - 1e-12), T)).toBe(2);
  });

  it('puts the region 2/3 boundary on the B23 line (R7-97 section 4)', () => {
    expect(regionOfPT(16.5, 623.16)).toBe(2);
    expect(() => regionOfPT(16.6, 623.16)).toThrow(PropertyRangeError);
    expect(regionOfPT(100, 863.16)).toBe(2);
  });

  // IAPWS R7-97(2012) Table 33 (region 3): the published p at each (rho, T) point is
  // a (p, T) state in region 3, which must be refused by name.
  it.each(publishedRows('R7-97 Table 33', 'region 3 f(rho,T) Eq.28').filter((row) => row.quantity === 'p').map((row) => [describeRow(row), row] as const))(
    'refuses region 3 at %s',
    (_label, row) => {
      const p = row.published_value;
      const T = input(row, 'T_K');
      expect(refusal(() => statePT(p, T))).toBe(
        `state at ${Number(p.toPrecision(6))} MPa, ${T} K lies in IF97 region 3 (near the critical point), which steamwright does not implement; ${COVERAGE}`,
      );
    },
  );

  // IAPWS R7-97(2012) Table 42 (region 5, 2007 revision).
  it.each(publishedRows('R7-97 Table 42').filter((row) => row.quantity === 'h').map((row) => [describeRow(row), row] as const))(
    'refuses region 5 at %s',
    (_label, row) => {
      const p = input(row, 'p_MPa');
      const T = input(row, 'T_K');
      expect(refusal(() => statePT(p, T))).toBe(
        `state at ${p} MPa, ${T} K lies in IF97 region 5 (above 1073.15 K), which steamwright does not implement; ${COVERAGE}`,
      );
    },
  );

  it('refuses the example near-critical state with the full message', () => {
    expect(refusal(() => statePT(25, 650))).toBe(
      'state at 25 MPa, 650 K lies in IF97 region 3 (near the critical point), which steamwright does not implement; it covers p <= 100 MPa, 273.15 K <= T <= 1073.15 K outside region 3',
    );
  });

  it('refuses states outside IF97 naming the value, the limit and the unit', () => {
    expect(refusal(() => statePT(120, 500))).toBe('pressure 120 MPa is above the IF97 limit of 100 MPa');
    expect(refusal(() => statePT(1, 250))).toBe('temperature 250 K is below the IF97 limit of 273.15 K');
    expect(refusal(() => statePT(1, 2500))).toBe('temperature 2500 K is above the IF97 limit of 2273.15 K');
    expect(refusal(() => statePT(60, 1200))).toBe(
      'state at 60 MPa, 1200 K lies above 1073.15 K, where IF97 is valid only up to 50 MPa',
    );
    expect(refusal(() => statePT(0, 300))).toBe(
      'pressure 0 MPa is not above zero; IF97 needs an absolute pressure above 0 MPa',
    );
    expect(refusal(() => statePT(-0.1, 300))).toBe(
      'pressure -0.1 MPa is not above zero; IF97 needs an absolute pressure above 0 MPa',
    );
    expect(refusal(() => statePT(Number.NaN, 300))).toBe('pressure must be a finite number in MPa, found NaN');
    expect(refusal(() => statePT(1, Number.POSITIVE_INFINITY))).toBe(
      'temperature must be a finite number in K, found Infinity',
    );
  });
});
