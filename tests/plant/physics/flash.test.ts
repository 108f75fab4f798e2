import { describe, expect, it } from 'vitest';
import { flashSplit } from '../../../src/plant/physics/flash.js';
import { saturatedLiquid } from '../../../src/properties/index.js';

// 1 psi = 6.894757293168 kPa; gauge pressures on a 14.696 psia (101.325 kPa) atmosphere.
const psig = (value: number): number => (value * 6.894757293168 + 101.325) / 1000;

describe('flashSplit(h_in, p)', () => {
  it('saturated condensate at 150 psig flashed to 30 psig gives 10.3 % steam (US DOE Steam Tip Sheet #12)', () => {
    const split = flashSplit(saturatedLiquid(psig(150)).h, psig(30));
    // The tip sheet's older steam tables print one decimal: allow +-0.1 point.
    expect(Math.abs(split.vapourFraction * 100 - 10.3)).toBeLessThan(0.1);
    // 5,000 lb/h of condensate makes about 515 lb/h of flash steam.
    expect(Math.abs(5000 * split.vapourFraction - 515)).toBeLessThan(6);
  });

  it('saturated blowdown at 150 psig flashed to 5 psig releases about 15 % as steam (US DOE Steam Tip Sheet #10)', () => {
    const split = flashSplit(saturatedLiquid(psig(150)).h, psig(5));
    // "about 15 %": the sheet rounds to the whole percent.
    expect(Math.abs(split.vapourFraction * 100 - 15)).toBeLessThan(0.6);
  });

  it('saturated condensate at 10 barg flashed to atmosphere gives about 16 % (common practice, handbook flash tables)', () => {
    const split = flashSplit(saturatedLiquid(1.101325).h, 0.101325);
    expect(Math.abs(split.vapourFraction * 100 - 16)).toBeLessThan(0.5);
  });

  it('subcooled liquid does not flash', () => {
    const split = flashSplit(300, 0.2);
    expect(split.vapourFraction).toBe(0);
  });

  it('vapour and liquid enthalpies conserve the inlet energy', () => {
    const inlet = saturatedLiquid(2).h;
    const split = flashSplit(inlet, 0.3);
    const mixed = split.vapourFraction * split.vapourEnthalpy + (1 - split.vapourFraction) * split.liquidEnthalpy;
    expect(mixed).toBeCloseTo(inlet, 9);
  });
});
