import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  PropertyRangeError,
  enthalpyPT,
  entropyPT,
  saturatedLiquid,
  saturatedVapour,
  statePH,
  statePS,
  statePT,
  statePX,
  stateTX,
  temperaturePH,
  temperaturePS,
} from '../../src/properties/index.js';
import { pressureB23, temperatureB23 } from '../../src/properties/boundaryB23.js';
import { propertiesRegion1 } from '../../src/properties/region1.js';
import { propertiesRegion2 } from '../../src/properties/region2.js';
import { saturationPressureRegion4, saturationTemperatureRegion4 } from '../../src/properties/region4.js';
import { expectClose } from '../helpers/expectClose.js';
import { describeRow, expectPublished, input, publishedRows } from './publishedRows.js';

// Any (p, T) in regions 1 and 2: log-uniform pressure, then a temperature above
// 273.15 K that stays out of region 3 (R7-97 Figure 1).
const singlePhaseState = fc
  .record({
    logP: fc.double({ min: Math.log(1e-4), max: Math.log(100), noNaN: true }),
    fraction: fc.double({ min: 0, max: 1, noNaN: true }),
    liquid: fc.boolean(),
  })
  .map(({ logP, fraction, liquid }) => {
    // exp(log(100)) is a hair above 100 MPa.
    const p = Math.min(100, Math.exp(logP));
    const hasLiquid = p >= saturationPressureRegion4(273.15);
    if (liquid && hasLiquid) {
      const hottest = p <= pressureB23(623.15) ? saturationTemperatureRegion4(p) : 623.15;
      return { p, T: 273.15 + fraction * (hottest - 273.15) };
    }
    let coldest = 273.15;
    if (hasLiquid) coldest = p <= pressureB23(623.15) ? saturationTemperatureRegion4(p) : temperatureB23(p);
    return { p, T: coldest + fraction * (1073.15 - coldest) };
  })
  .filter(({ p, T }) => Math.abs(p - saturationPressureRegion4(Math.min(T, 647))) > 1e-9 * p || T > 623.15);

const wetSteam = fc.record({
  p: fc.double({ min: 0.001, max: 16.5, noNaN: true }),
  x: fc.double({ min: 0, max: 1, noNaN: true }),
});

describe('states', () => {
  it.each(publishedRows('R7-97 Table 5', 'region 1 g(p,T) Eq.7').filter((row) => row.quantity === 'h').map((row) => [describeRow(row), row] as const))(
    'statePT and enthalpyPT match %s',
    (_label, row) => {
      const p = input(row, 'p_MPa');
      const T = input(row, 'T_K');
      expectPublished(statePT(p, T).h, row);
      expectPublished(enthalpyPT(p, T), row);
    },
  );

  it.each(publishedRows('R7-97 Table 15').filter((row) => row.quantity === 's').map((row) => [describeRow(row), row] as const))(
    'statePT and entropyPT match %s',
    (_label, row) => {
      const p = input(row, 'p_MPa');
      const T = input(row, 'T_K');
      expectPublished(statePT(p, T).s, row);
      expectPublished(entropyPT(p, T), row);
    },
  );

  it('statePT reports superheat and Tsat for steam below the critical pressure', () => {
    const steam = statePT(1, 500);
    expect(steam.region).toBe(2);
    // IAPWS R7-97(2012) Table 36: Tsat(1 MPa) = 453.035632 K.
    expect(Math.abs((steam.Tsat ?? Number.NaN) - 453.035632)).toBeLessThanOrEqual(0.5e-6);
    expectClose(steam.superheat ?? Number.NaN, 500 - 453.035632, 1e-8, 'superheat at 1 MPa, 500 K');
    expect(steam.x).toBeNull();
    const supercritical = statePT(30, 900);
    expect([supercritical.region, supercritical.Tsat, supercritical.superheat]).toEqual([2, null, null]);
    const water = statePT(1, 300);
    expect([water.region, water.superheat, water.x]).toEqual([1, null, null]);
  });

  it('T(p, h(p, T)) = T and T(p, s(p, T)) = T over regions 1 and 2', () => {
    fc.assert(
      fc.property(singlePhaseState, ({ p, T }) => {
        const label = `${p} MPa, ${T} K`;
        expectClose(temperaturePH(p, enthalpyPT(p, T)), T, 1e-9, `T(p,h) at ${label}`);
        expectClose(temperaturePS(p, entropyPT(p, T)), T, 1e-9, `T(p,s) at ${label}`);
        const byEnthalpy = statePH(p, enthalpyPT(p, T));
        expect(byEnthalpy.region, label).toBe(statePT(p, T).region);
        expectClose(byEnthalpy.s, entropyPT(p, T), 1e-9, `s from statePH at ${label}`);
        expectClose(statePS(p, entropyPT(p, T)).h, enthalpyPT(p, T), 1e-9, `h from statePS at ${label}`);
      }),
      { numRuns: 500 },
    );
  });

  it('statePX then statePH (and statePS) return the same x', () => {
    fc.assert(
      fc.property(wetSteam, ({ p, x }) => {
        const wet = statePX(p, x);
        const byEnthalpy = statePH(p, wet.h);
        const byEntropy = statePS(p, wet.s);
        expect(Math.abs((byEnthalpy.x ?? Number.NaN) - x), `x from h at ${p} MPa`).toBeLessThan(1e-9);
        expect(Math.abs((byEntropy.x ?? Number.NaN) - x), `x from s at ${p} MPa`).toBeLessThan(1e-9);
        expect(byEnthalpy.T).toBe(wet.T);
      }),
      { numRuns: 300 },
    );
  });

  it('wet steam mixes saturated liquid and vapour by quality, with cp null', () => {
    fc.assert(
      fc.property(wetSteam, ({ p, x }) => {
        const wet = statePX(p, x);
        const liquid = saturatedLiquid(p);
        const vapour = saturatedVapour(p);
        expectClose(wet.h, liquid.h + x * (vapour.h - liquid.h), 1e-12, `h at ${p} MPa, x = ${x}`);
        expectClose(wet.v, liquid.v + x * (vapour.v - liquid.v), 1e-12, `v at ${p} MPa, x = ${x}`);
        expect(wet.region).toBe(4);
        if (x > 0 && x < 1) expect(wet.cp).toBeNull();
      }),
      { numRuns: 200 },
    );
  });

  it('saturated liquid and vapour are the region 1 and 2 states at (p, Tsat)', () => {
    const p = 1;
    const T = saturationTemperatureRegion4(p);
    expect(saturatedLiquid(p).h).toBe(propertiesRegion1(p, T).h);
    expect(saturatedVapour(p).h).toBe(propertiesRegion2(p, T).h);
  });

  it('stateTX at 300 K lies at the saturation pressure of R7-97 Table 35', () => {
    const [row] = publishedRows('R7-97 Table 35').filter((r) => r.inputs.T_K === 300);
    expectPublished(stateTX(300, 0.5).p, row);
  });

  it('refuses a quality outside 0 to 1', () => {
    expect(() => statePX(1, 1.2)).toThrow(new PropertyRangeError('vapour quality 1.2 is outside the range 0 to 1'));
    expect(() => stateTX(400, -0.1)).toThrow(new PropertyRangeError('vapour quality -0.1 is outside the range 0 to 1'));
  });
});

describe('states on the saturation line', () => {
  it('statePH at the saturated liquid and vapour enthalpies returns x = 0 and x = 1', () => {
    for (const p of [0.001, 0.101325, 1, 10, 16.5]) {
      expect(statePH(p, saturatedLiquid(p).h).x, `liquid at ${p} MPa`).toBe(0);
      expect(statePH(p, saturatedVapour(p).h).x, `vapour at ${p} MPa`).toBe(1);
      expect(statePS(p, saturatedVapour(p).s).x, `vapour at ${p} MPa`).toBe(1);
    }
  });
});
