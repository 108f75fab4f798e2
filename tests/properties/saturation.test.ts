import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  PropertyRangeError,
  saturatedLiquid,
  saturatedVapour,
  saturationPressure,
  saturationTemperature,
  stateTX,
} from '../../src/properties/index.js';
import { expectClose } from '../helpers/expectClose.js';

function refusal(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(PropertyRangeError);
    return (error as Error).message;
  }
  throw new Error('expected a PropertyRangeError, but the call returned');
}

const saturationTemperatureArbitrary = fc.double({ min: 274, max: 622, noNaN: true });

describe('saturation', () => {
  // IAPWS R7-97(2012) Eq. 31 at one standard atmosphere: 372.7559 K at 0.1 MPa (Table 36)
  // and 373.1243 K at 0.101325 MPa; on ITS-90 water boils at 99.97 degC, not 100 degC
  // (a handbook fact, e.g. IAPWS R7-97 and the steam tables based on it).
  it('water boils at 99.97 degC (373.124 K) at 101.325 kPa', () => {
    const T = saturationTemperature(0.101325);
    expect(Math.abs(T - 373.124)).toBeLessThan(0.0005);
    expect((T - 273.15).toFixed(2)).toBe('99.97');
  });

  it('refuses temperatures and pressures off the saturation line', () => {
    expect(refusal(() => saturationPressure(250))).toBe('temperature 250 K is below the IF97 limit of 273.15 K');
    expect(refusal(() => saturationPressure(650))).toBe(
      'temperature 650 K is above the critical temperature of 647.096 K, where no saturation pressure exists',
    );
    expect(refusal(() => saturationTemperature(0.0001))).toBe(
      'pressure 0.0001 MPa is below the IF97 saturation limit of 0.000611213 MPa (273.15 K)',
    );
    expect(refusal(() => saturationTemperature(25))).toBe(
      'pressure 25 MPa is above the critical pressure of 22.064 MPa, where no saturation temperature exists',
    );
    expect(refusal(() => saturatedVapour(18))).toBe(
      'saturated states at 18 MPa lie in IF97 region 3, which steamwright does not implement; saturation is available from 273.15 K to 623.15 K (16.5292 MPa)',
    );
    expect(refusal(() => stateTX(630, 0.5))).toBe(
      'saturated states at 630 K lie in IF97 region 3, which steamwright does not implement; saturation is available from 273.15 K to 623.15 K (16.5292 MPa)',
    );
  });

  // h_fg = h_g - h_f = T (s_g - s_f) holds where the phases have equal Gibbs energy.
  // IF97's regions 1 and 2 meet the saturation equation only to the fit's accuracy
  // (measured here: at most 6e-6 relative), so the tolerance is 2e-5.
  it('h_g - h_f = Tsat (s_g - s_f) along the saturation line', () => {
    fc.assert(
      fc.property(saturationTemperatureArbitrary, (T) => {
        const liquid = stateTX(T, 0);
        const vapour = stateTX(T, 1);
        expectClose(vapour.h - liquid.h, T * (vapour.s - liquid.s), 2e-5, `h_fg at ${T} K`);
      }),
      { numRuns: 300 },
    );
  });

  // Clausius-Clapeyron: dpsat/dT = (s_g - s_f) / (v_g - v_f). The derivative of Eq. 30 is
  // taken by central difference; the agreement reflects the same fit consistency
  // (measured: at most 1.6e-4 relative, largest near 623 K), so the tolerance is 5e-4.
  it('dpsat/dT = (s_g - s_f) / (v_g - v_f) (Clausius-Clapeyron)', () => {
    fc.assert(
      fc.property(saturationTemperatureArbitrary, (T) => {
        const step = 1e-4 * T;
        const slope = (saturationPressure(T + step) - saturationPressure(T - step)) / (2 * step); // MPa/K
        const liquid = stateTX(T, 0);
        const vapour = stateTX(T, 1);
        // kJ/(m3 K) = kPa/K, so divide by 1000 for MPa/K.
        const clapeyron = (vapour.s - liquid.s) / (vapour.v - liquid.v) / 1000;
        expectClose(slope, clapeyron, 5e-4, `dpsat/dT at ${T} K`);
      }),
      { numRuns: 300 },
    );
  });

  it('saturated liquid and vapour share p and Tsat, with x = 0 and 1', () => {
    const liquid = saturatedLiquid(1);
    const vapour = saturatedVapour(1);
    expect([liquid.region, liquid.x, vapour.region, vapour.x]).toEqual([4, 0, 4, 1]);
    expect(liquid.T).toBe(vapour.T);
    expect(liquid.Tsat).toBe(liquid.T);
    expect(vapour.superheat).toBeNull();
    // IAPWS R7-97(2012) Table 36: Tsat(1 MPa) = 453.035632 K.
    expect(Math.abs(liquid.T - 453.035632)).toBeLessThanOrEqual(0.5e-6);
    // At x = 0 and 1 cp is the saturated phase's own (documented in SteamState).
    expect(liquid.cp).toBeGreaterThan(4);
    expect(vapour.cp).toBeGreaterThan(2);
  });
});
