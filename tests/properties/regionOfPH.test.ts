import { describe, expect, it } from 'vitest';
import { PropertyRangeError, statePH, statePS } from '../../src/properties/index.js';
import { regionOfPH, regionOfPS } from '../../src/properties/regionOfPH.js';
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

describe('regionOfPH and regionOfPS', () => {
  it('place the R7-97 backward verification points in their regions (Tables 7, 9, 24, 29)', () => {
    for (const row of publishedRows('R7-97 Table 7')) expect(regionOfPH(input(row, 'p_MPa'), input(row, 'h_kJkg')).region).toBe(1);
    for (const row of publishedRows('R7-97 Table 9')) expect(regionOfPS(input(row, 'p_MPa'), input(row, 's_kJkgK')).region).toBe(1);
    for (const row of publishedRows('R7-97 Table 24')) expect(regionOfPH(input(row, 'p_MPa'), input(row, 'h_kJkg')).region).toBe(2);
    for (const row of publishedRows('R7-97 Table 29')) expect(regionOfPS(input(row, 'p_MPa'), input(row, 's_kJkgK')).region).toBe(2);
  });

  it('find wet steam between the saturated enthalpies', () => {
    const where = regionOfPH(1, 2000);
    expect(where.region).toBe(4);
    if (where.region === 4) expect(where.x).toBeGreaterThan(0);
  });

  // IAPWS SR3-03(2014) verification points are region 3 states by construction.
  it.each(publishedRows('SR3-03 T(p,h) values').map((row) => [describeRow(row), row] as const))(
    'statePH refuses region 3 at %s',
    (_label, row) => {
      const p = input(row, 'p_MPa');
      const h = input(row, 'h_kJkg');
      expect(refusal(() => statePH(p, h))).toBe(
        `state at ${p} MPa, ${h} kJ/kg lies in IF97 region 3 (near the critical point), which steamwright does not implement; ${COVERAGE}`,
      );
    },
  );

  it.each(publishedRows('SR3-03 T(p,s) values').map((row) => [describeRow(row), row] as const))(
    'statePS refuses region 3 at %s',
    (_label, row) => {
      const p = input(row, 'p_MPa');
      const s = input(row, 's_kJkgK');
      expect(refusal(() => statePS(p, s))).toBe(
        `state at ${p} MPa, ${s} kJ/(kg K) lies in IF97 region 3 (near the critical point), which steamwright does not implement; ${COVERAGE}`,
      );
    },
  );

  it('refuse enthalpies and entropies beyond 273.15 K and 1073.15 K on the isobar', () => {
    expect(refusal(() => statePH(1, -100))).toBe(
      'enthalpy -100 kJ/kg at 1 MPa is below the IF97 limit of 0.975816 kJ/kg (273.15 K at this pressure)',
    );
    expect(refusal(() => statePS(1, -1))).toBe(
      'entropy -1 kJ/(kg K) at 1 MPa is below the IF97 limit of -0.0000884226 kJ/(kg K) (273.15 K at this pressure)',
    );
    expect(refusal(() => statePH(1, 5000))).toBe(
      `state at 1 MPa, 5000 kJ/kg lies in IF97 region 5 (above 1073.15 K), which steamwright does not implement; ${COVERAGE}`,
    );
    expect(refusal(() => statePH(60, 4500))).toBe(
      'state at 60 MPa, 4500 kJ/kg lies above 1073.15 K, where IF97 is valid only up to 50 MPa',
    );
    expect(refusal(() => statePH(150, 1000))).toBe('pressure 150 MPa is above the IF97 limit of 100 MPa');
    expect(refusal(() => statePH(1, Number.NaN))).toBe('enthalpy must be a finite number in kJ/kg, found NaN');
  });
});
